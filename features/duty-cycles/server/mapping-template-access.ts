import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { mappingTemplates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import {
  DutyCycleError,
  forbiddenError,
  notFoundError,
} from "@/features/duty-cycles/server/errors";

// Templates are the dealership's working tools: staff read them, those who write duty cycles
// change them; customer accounts have no use for them.

export function requireTemplateRead(actor: TActor) {
  if (!can(actor, "duty-cycle:write")) throw forbiddenError("mapping templates");
}
export function requireTemplateWrite(actor: TActor) {
  if (!can(actor, "mapping-template:write")) throw forbiddenError("mapping templates");
}

export const duplicateName = (name: string) =>
  new DutyCycleError(
    409,
    "conflict",
    `A template called "${name}" already exists. Choose another name.`,
    {
      name: ["A template with this name already exists."],
    },
  );

export function isUniqueViolation(e: unknown): boolean {
  const code =
    (e as { code?: string; cause?: { code?: string } }).code ??
    (e as { cause?: { code?: string } }).cause?.code;
  return code === "23505";
}

export async function loadTemplate(db: DbOrTx, actor: TActor, id: string) {
  const [row] = await db
    .select()
    .from(mappingTemplates)
    .where(and(eq(mappingTemplates.id, id), eq(mappingTemplates.dealershipId, actor.dealershipId)));
  if (!row) throw notFoundError("mapping template");
  return row;
}
