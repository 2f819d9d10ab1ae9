import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { toMappingTemplate } from "@/features/duty-cycles/server/mapping-template-dto";
import {
  loadTemplate,
  requireTemplateRead,
} from "@/features/duty-cycles/server/mapping-template-access";

export async function getMappingTemplate({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}) {
  requireTemplateRead(actor);
  return toMappingTemplate(await loadTemplate(db, actor, id));
}
