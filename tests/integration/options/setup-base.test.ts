// What the "try another setup" and sweep screens read, and the study lists' title search:
// real server code and route handlers on real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as listComparisons, POST as createComparison } from "@/app/api/v1/comparisons/route";
import { readSetupBase } from "@/features/options/server/read-setup-base";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
} from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let stranger: Awaited<ReturnType<typeof makeDealership>>;
let estimateId: string;

beforeAll(async () => {
  team = await makeDealership();
  stranger = await makeDealership();
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, team.admin.cookie, path, { method: "POST", body });
  const customer = (await post(createCustomer, "/api/v1/customers", { name: "Fellside Farm" })).body
    .id;
  const machine = (
    await post(createMachine, "/api/v1/machines", {
      customerId: customer,
      kind: "tractor",
      spec: testTractorSpec(),
    })
  ).body.id;
  const dutyCycle = (
    await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId: customer })
  ).id;
  estimateId = (
    await post(createEstimate, "/api/v1/estimates", { machineId: machine, dutyCycleId: dutyCycle })
  ).body.id;
});

describe("setup base of an estimate", () => {
  it("gives an estimator the estimate's frozen machine, so the offered changes fit its layout", async () => {
    const actor = team.estimator.actor;
    const base = await readSetupBase({ db, actor, estimateId });
    expect(base).toMatchObject({ estimateId, machineName: "Test row-crop tractor" });
    expect(base.machine.steering).toMatchObject({ layout: "trapezoid", armAngle: 17 });
    expect(base.machine.axles.front.track).toBe(1.9);
    expect(base.costPerHour).toBeGreaterThan(0);
    expect(base.cautions.length).toBeGreaterThan(0);
  });

  it("answers 404 for another dealership's estimate and 403 for a role that may not run studies", async () => {
    const other = stranger.admin.actor;
    await expect(readSetupBase({ db, actor: other, estimateId })).rejects.toMatchObject({
      status: 404,
    });
    const billing = team.billing.actor;
    await expect(readSetupBase({ db, actor: billing, estimateId })).rejects.toMatchObject({
      status: 403,
    });
  });
});

describe("study list search", () => {
  it("finds comparisons by words in their title", async () => {
    const options = [
      {
        name: "Wider front",
        changes: [{ kind: "parameter", parameter: "frontTrack", value: 2 }],
        oneOffCost: 500,
      },
    ];
    for (const title of ["Headland plan for spring", "Narrow rear for rows"]) {
      const res = await call(createComparison, team.admin.cookie, "/api/v1/comparisons", {
        method: "POST",
        body: { estimateId, title, options },
      });
      expect(res.status).toBe(201);
    }
    const found = await call(listComparisons, team.admin.cookie, "/api/v1/comparisons?q=narrow");
    expect(found.status).toBe(200);
    expect(found.body.items.map((r: { title: string }) => r.title)).toEqual([
      "Narrow rear for rows",
    ]);
    const none = await call(listComparisons, team.admin.cookie, "/api/v1/comparisons?q=100%25");
    expect(none.body.total).toBe(0);
  });
});
