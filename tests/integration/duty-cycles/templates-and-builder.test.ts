// Mapping templates and builder duty cycles through the real route handlers and PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { count, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { customers, dutyCycleTurns } from "@/db/schema";
import { createTestMember } from "@/tests/support/session";
import { BUILDER_PRESETS } from "@/lib/duty-cycles/builder-presets";
import { GET as listTemplates, POST as createTemplate } from "@/app/api/v1/mapping-templates/route";
import {
  GET as getTemplate,
  PATCH as patchTemplate,
  DELETE as deleteTemplate,
} from "@/app/api/v1/mapping-templates/[id]/route";
import { POST as createCycle } from "@/app/api/v1/duty-cycles/route";
import { GET as getCycle, PATCH as patchCycle } from "@/app/api/v1/duty-cycles/[id]/route";
import { TELEMATICS_MAPPING, callRoute } from "./support";

const db = getDb();
let estimator: Awaited<ReturnType<typeof createTestMember>>;
let outsider: Awaited<ReturnType<typeof createTestMember>>;
let customerAccount: Awaited<ReturnType<typeof createTestMember>>;
let customerId: string;

beforeAll(async () => {
  estimator = await createTestMember({ db, roles: ["estimator"] });
  outsider = await createTestMember({ db, roles: ["estimator"] });
  const [c] = await db
    .insert(customers)
    .values({ dealershipId: estimator.dealership.id, name: "Quillbrook Orchards" })
    .returning();
  customerId = c!.id;
  customerAccount = await createTestMember({
    db,
    roles: ["customer"],
    dealershipId: estimator.dealership.id,
    customerId,
  });
});

describe("mapping templates", () => {
  it("saves, lists, renames and deletes a dealership's template", async () => {
    const created = await callRoute(createTemplate, estimator.cookie, "/api/v1/mapping-templates", {
      method: "POST",
      json: { name: "Orchard loader logger", mapping: TELEMATICS_MAPPING },
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: "Orchard loader logger", kind: "telematics" });
    const id = created.body.id as string;

    const again = await callRoute(createTemplate, estimator.cookie, "/api/v1/mapping-templates", {
      method: "POST",
      json: { name: "Orchard loader logger", mapping: TELEMATICS_MAPPING },
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toContain("already exists");

    const listed = await callRoute(
      listTemplates,
      estimator.cookie,
      "/api/v1/mapping-templates?kind=telematics",
    );
    expect(listed.body.items.map((t: { id: string }) => t.id)).toEqual([id]);
    expect(
      (await callRoute(listTemplates, outsider.cookie, "/api/v1/mapping-templates")).body.items,
    ).toEqual([]);
    expect(
      (await callRoute(getTemplate, outsider.cookie, `/x/${id}`, { params: { id } })).status,
    ).toBe(404);
    expect(
      (await callRoute(listTemplates, customerAccount.cookie, "/api/v1/mapping-templates")).status,
    ).toBe(403);

    const renamed = await callRoute(patchTemplate, estimator.cookie, `/x/${id}`, {
      method: "PATCH",
      params: { id },
      json: { name: "Orchard loader logger v2" },
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body.name).toBe("Orchard loader logger v2");

    expect(
      (
        await callRoute(deleteTemplate, estimator.cookie, `/x/${id}`, {
          method: "DELETE",
          params: { id },
        })
      ).status,
    ).toBe(400);
    const gone = await callRoute(deleteTemplate, estimator.cookie, `/x/${id}?confirm=true`, {
      method: "DELETE",
      params: { id },
    });
    expect(gone.status).toBe(200);
    expect(
      (await callRoute(getTemplate, estimator.cookie, `/x/${id}`, { params: { id } })).status,
    ).toBe(404);
  });

  it("refuses an incomplete mapping and says what to choose", async () => {
    const res = await callRoute(createTemplate, estimator.cookie, "/api/v1/mapping-templates", {
      method: "POST",
      json: {
        name: "Broken",
        mapping: { ...TELEMATICS_MAPPING, columns: { time: TELEMATICS_MAPPING.columns.time } },
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors["mapping.columns"]).toEqual(
      expect.arrayContaining([
        "Choose the column that holds the ground speed.",
        expect.stringContaining("Choose at least one heading source"),
      ]),
    );
  });
});

describe("builder duty cycles", () => {
  it("creates a ready duty cycle from a preset and rebuilds it, guarding against lost updates", async () => {
    const preset = BUILDER_PRESETS.find((p) => p.key === "yard-loader")!;
    const created = await callRoute(createCycle, estimator.cookie, "/api/v1/duty-cycles", {
      method: "POST",
      json: { source: "builder", name: "Packhouse loading", customerId, builder: preset.input },
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ status: "ready", source: "builder", turnsPerHour: 160 });
    const id = created.body.id as string;
    const [n] = await db
      .select({ n: count() })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, id));
    expect(n!.n).toBe(4);

    // Duty cycles are the dealer's working material: the customer account neither sees nor
    // changes its own (it reads the reports shared with it).
    expect(
      (await callRoute(getCycle, customerAccount.cookie, `/x/${id}`, { params: { id } })).status,
    ).toBe(404);
    const refused = await callRoute(patchCycle, customerAccount.cookie, `/x/${id}`, {
      method: "PATCH",
      params: { id },
      json: { name: "Mine now", version: 1 },
    });
    expect(refused.status).toBe(404);

    const input = structuredClone(preset.input);
    const yard = input.blocks[0]!;
    if (yard.kind === "yard") yard.cyclesPerHour = 20;
    const rebuilt = await callRoute(patchCycle, estimator.cookie, `/x/${id}`, {
      method: "PATCH",
      params: { id },
      json: { builder: input, version: 1 },
    });
    expect(rebuilt.status).toBe(200);
    expect(rebuilt.body.turnsPerHour).toBe(80);
    const stale = await callRoute(patchCycle, estimator.cookie, `/x/${id}`, {
      method: "PATCH",
      params: { id },
      json: { name: "Stale edit", version: 1 },
    });
    expect(stale.status).toBe(409);
  });

  it("refuses a builder input with no hours and another dealership's customer", async () => {
    const preset = BUILDER_PRESETS[0]!;
    const noHours = structuredClone(preset.input);
    for (const b of noHours.blocks) b.share = 0;
    const res = await callRoute(createCycle, estimator.cookie, "/api/v1/duty-cycles", {
      method: "POST",
      json: { source: "builder", name: "Nothing", customerId, builder: noHours },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("add up to 0 %; make them add up to 100 %");
    // Field work 85 % plus road 30 %: 115 % of the hour is refused too, and nothing is stored.
    const over = structuredClone(preset.input);
    over.blocks[0]!.share = 0.85;
    over.blocks[1]!.share = 0.3;
    const tooMuch = await callRoute(createCycle, estimator.cookie, "/api/v1/duty-cycles", {
      method: "POST",
      json: { source: "builder", name: "Too many hours", customerId, builder: over },
    });
    expect(tooMuch.status).toBe(400);
    expect(tooMuch.body.error.message).toContain("add up to 115 %");
    const foreign = await callRoute(createCycle, outsider.cookie, "/api/v1/duty-cycles", {
      method: "POST",
      json: { source: "builder", name: "Not yours", customerId, builder: preset.input },
    });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fieldErrors.customerId).toBeDefined();
  });
});
