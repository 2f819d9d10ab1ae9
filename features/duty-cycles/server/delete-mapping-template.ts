import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { mappingTemplates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import {
  loadTemplate,
  requireTemplateWrite,
} from "@/features/duty-cycles/server/mapping-template-access";

/** Duty cycles keep their own copy of the mapping they used, so deleting a template orphans nothing. */
export async function deleteMappingTemplate({
  db,
  actor,
  id,
  confirmed,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  confirmed: boolean;
}) {
  requireTemplateWrite(actor);
  const row = await loadTemplate(db, actor, id);
  if (!confirmed)
    throw new DutyCycleError(
      400,
      "confirm_required",
      `Send confirm=true to delete the template "${row.name}".`,
    );
  await db.delete(mappingTemplates).where(eq(mappingTemplates.id, id));
  return { deleted: true as const, id };
}
