import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { mappingTemplates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZUpdateMappingTemplate } from "@/features/duty-cycles/schemas/mapping-template";
import { parseInput } from "@/features/duty-cycles/server/errors";
import { toMappingTemplate } from "@/features/duty-cycles/server/mapping-template-dto";
import {
  duplicateName,
  isUniqueViolation,
  loadTemplate,
  requireTemplateWrite,
} from "@/features/duty-cycles/server/mapping-template-access";

export async function updateMappingTemplate({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}) {
  requireTemplateWrite(actor);
  await loadTemplate(db, actor, id);
  const body = parseInput(ZUpdateMappingTemplate, input);
  try {
    const [row] = await db
      .update(mappingTemplates)
      .set({
        ...(body.name ? { name: body.name } : {}),
        ...(body.mapping ? { mapping: body.mapping, kind: body.mapping.kind } : {}),
        updatedAt: new Date(),
      })
      .where(
        and(eq(mappingTemplates.id, id), eq(mappingTemplates.dealershipId, actor.dealershipId)),
      )
      .returning();
    return toMappingTemplate(row!);
  } catch (e) {
    if (isUniqueViolation(e)) throw duplicateName(body.name ?? "");
    throw e;
  }
}
