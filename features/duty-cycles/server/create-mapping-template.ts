import "server-only";
import type { DbOrTx } from "@/db/client";
import { mappingTemplates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZCreateMappingTemplate } from "@/features/duty-cycles/schemas/mapping-template";
import { parseInput } from "@/features/duty-cycles/server/errors";
import { toMappingTemplate } from "@/features/duty-cycles/server/mapping-template-dto";
import {
  duplicateName,
  isUniqueViolation,
  requireTemplateWrite,
} from "@/features/duty-cycles/server/mapping-template-access";

export async function createMappingTemplate({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}) {
  requireTemplateWrite(actor);
  const body = parseInput(ZCreateMappingTemplate, input);
  try {
    const [row] = await db
      .insert(mappingTemplates)
      .values({
        dealershipId: actor.dealershipId,
        name: body.name,
        kind: body.mapping.kind,
        mapping: body.mapping,
        createdById: actor.userId,
      })
      .returning();
    return toMappingTemplate(row!);
  } catch (e) {
    if (isUniqueViolation(e)) throw duplicateName(body.name);
    throw e;
  }
}
