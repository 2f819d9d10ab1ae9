// Tread readings, calibration and the tyre plan through the real route handlers on PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as getEstimate } from "@/app/api/v1/estimates/[id]/route";
import {
  GET as listReadings,
  POST as postReading,
} from "@/app/api/v1/machines/[id]/readings/route";
import { POST as importReadings } from "@/app/api/v1/machines/[id]/readings/import/route";
import {
  GET as getCalibration,
  POST as postCalibrated,
} from "@/app/api/v1/machines/[id]/calibration/route";
import { DELETE as deleteReading } from "@/app/api/v1/readings/[id]/route";
import { GET as getPhoto } from "@/app/api/v1/reading-photos/[id]/route";
import { GET as getPlan } from "@/app/api/v1/tyre-plan/route";
import { GET as getPlanCsv } from "@/app/api/v1/tyre-plan/csv/route";
import { createTestMember } from "@/tests/support/session";
import {
  BASE,
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
} from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
let machineId: string;
let estimateId: string;

/** A PNG's 8-byte signature followed by filler: enough for a content check (RFC 2083 §3.1). */
const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);

const reading = (over: Record<string, unknown> = {}) => ({
  position: "front-left",
  measuredOn: "2026-01-05",
  hourMeter: 100,
  depthCentre: 40,
  depthInner: 40,
  depthOuter: 40,
  measuredBy: "Workshop tester",
  ...over,
});

beforeAll(async () => {
  team = await makeDealership();
  customerId = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Larkrise Test Farm" },
    })
  ).body.id;
  machineId = (
    await call(createMachine, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: { customerId, kind: "tractor", spec: testTractorSpec() },
    })
  ).body.id;
  const cycle = await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId });
  estimateId = (
    await call(createEstimate, team.estimator.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: cycle.id },
    })
  ).body.id;
});

describe("readings", () => {
  it("stores a reading with a photo checked by its bytes, and serves the photo back", async () => {
    const form = new FormData();
    form.set("reading", JSON.stringify(reading({ hourMeter: 50, measuredOn: "2026-01-01" })));
    form.append("photos", new Blob([PNG], { type: "application/octet-stream" }), "tread.png");
    const res = await postReading(
      new Request(`${BASE}/api/v1/machines/${machineId}/readings`, {
        method: "POST",
        headers: { cookie: team.estimator.cookie },
        body: form,
      }),
      { params: Promise.resolve({ id: machineId }) },
    );
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.photoIds).toHaveLength(1);
    const photo = await getPhoto(
      new Request(`${BASE}/x`, { headers: { cookie: team.admin.cookie } }),
      {
        params: Promise.resolve({ id: body.photoIds[0] }),
      },
    );
    expect(photo.headers.get("content-type")).toBe("image/png");
    expect(new Uint8Array(await photo.arrayBuffer())).toEqual(PNG);
    await call(deleteReading, team.admin.cookie, `/api/v1/readings/${body.id}`, {
      method: "DELETE",
      params: { id: body.id },
    });
  });

  it("refuses a file named .jpg that is not a picture, and stores nothing", async () => {
    const form = new FormData();
    form.set("reading", JSON.stringify(reading({ measuredOn: "2026-01-02", hourMeter: 60 })));
    form.append(
      "photos",
      new Blob(["<html>not a photo</html>"], { type: "image/jpeg" }),
      "tread.jpg",
    );
    const res = await postReading(
      new Request(`${BASE}/api/v1/machines/${machineId}/readings`, {
        method: "POST",
        headers: { cookie: team.estimator.cookie },
        body: form,
      }),
      { params: Promise.resolve({ id: machineId }) },
    );
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/tread\.jpg is not a JPEG or PNG/);
    const list = await call(listReadings, team.admin.cookie, "x", { params: { id: machineId } });
    expect(list.body).toEqual([]);
  });

  it("says what to fix for a bad depth and an hour meter that went backwards", async () => {
    const bad = await call(postReading, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
      body: reading({ depthCentre: -3 }),
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors.depthCentre[0]).toMatch(/negative/);
    expect(
      (
        await call(postReading, team.estimator.cookie, "x", {
          method: "POST",
          params: { id: machineId },
          body: reading(),
        })
      ).status,
    ).toBe(201);
    const back = await call(postReading, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
      body: reading({ measuredOn: "2026-02-01", hourMeter: 90 }),
    });
    expect(back.status).toBe(400);
    expect(back.body.error.fieldErrors.hourMeter[0]).toMatch(/100 h on 2026-01-05/);
  });

  it("refuses a whole CSV with one bad row, listing the line, then imports the corrected file", async () => {
    const header =
      "position,date,hour meter,centre mm,inner shoulder mm,outer shoulder mm,measured by\r\n";
    const bad = `${header}FR,2026-01-05,100,50,50,50,Tester\r\nfront-middle,2026-02-05,300,47,47,47,Tester\r\n`;
    const refused = await call(importReadings, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
      body: { csv: bad },
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(
      /1 row error; nothing was imported. First: line 3, position/,
    );
    expect(
      (await call(listReadings, team.admin.cookie, "x", { params: { id: machineId } })).body,
    ).toHaveLength(1);

    // Front 40 mm new tyres (front-assist tractor), rear 50 mm; 5 readings 200 h apart.
    const rows: string[] = [];
    const fl = [40, 37.2, 34.5, 31.6, 28.9];
    const rl = [50, 48.3, 46.4, 44.7, 42.9];
    fl.forEach((d, i) => {
      const date = `2026-0${i + 1}-05`;
      const h = 100 + 200 * i;
      if (i > 0) rows.push(`front-left,${date},${h},${d},${d},${d},Tester`);
      rows.push(`front-right,${date},${h},${d + 0.1},${d},${d},Tester`);
      rows.push(`rear-left,${date},${h},${rl[i]},${rl[i]},${rl[i]},Tester`);
      rows.push(`rear-right,${date},${h},${rl[i]! - 0.1},${rl[i]},${rl[i]},Tester`);
    });
    const ok = await call(importReadings, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
      body: { csv: header + rows.join("\r\n") },
    });
    expect(ok.status).toBe(201);
    expect(ok.body.imported).toBe(rows.length);
  });

  it("calibrates the machine from the readings and reports the fit behind it", async () => {
    const res = await call(getCalibration, team.admin.cookie, "x", { params: { id: machineId } });
    expect(res.status).toBe(200);
    expect(res.body.basis.estimateId).toBe(estimateId);
    const cal = res.body.fleet.calibration;
    expect(cal.source).toBe("machine");
    expect(cal.fit.quality.n).toBe(16);
    expect(cal.fit.quality.hoursCovered).toBe(16 * 200);
    expect(cal.multipliers.base).toBeGreaterThanOrEqual(0);
    expect(cal.multipliers.scrub).toBeGreaterThanOrEqual(0);
    // Measured loss ~1.4 mm/100 h front: the calibrated prediction moves towards it.
    const front = res.body.fleet.predicted.find(
      (p: { position: string }) => p.position === "front-left",
    );
    const before = res.body.fleet.uncalibrated.find(
      (p: { position: string }) => p.position === "front-left",
    );
    expect(Math.abs(front.wearPer100h.total - 1.4)).toBeLessThan(
      Math.abs(before.wearPer100h.total - 1.4),
    );
  });

  it("stores a calibrated estimate that says so and carries the data behind it", async () => {
    const res = await call(postCalibrated, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
    });
    expect(res.status).toBe(201);
    const stored = await call(getEstimate, team.admin.cookie, "x", { params: { id: res.body.id } });
    expect(stored.body.title).toMatch(/calibrated$/);
    const cal = await call(getCalibration, team.admin.cookie, "x", { params: { id: machineId } });
    const predictedFront = cal.body.fleet.predicted.find(
      (p: { position: string }) => p.position === "front-left",
    );
    const engineFront = stored.body.result.positions.find(
      (p: { position: string }) => p.position === "front-left",
    );
    // The engine's calibrated run equals the scaled split (both terms are linear in the coefficients).
    expect(engineFront.wearPer100h.total).toBeCloseTo(predictedFront.wearPer100h.total, 6);
    // The calibrated run never becomes the basis of the next calibration.
    expect(cal.body.basis.estimateId).toBe(estimateId);
    expect(res.body.calibration).toMatchObject({
      source: "machine",
      n: 16,
      basisEstimateId: estimateId,
    });
  });

  it("refuses a readings write from a billing admin and a rival dealership", async () => {
    expect(
      (
        await call(postReading, team.billing.cookie, "x", {
          method: "POST",
          params: { id: machineId },
          body: reading(),
        })
      ).status,
    ).toBe(403);
    const rival = await createTestMember({ db, roles: ["dealer_admin"] });
    expect(
      (await call(listReadings, rival.cookie, "x", { params: { id: machineId } })).status,
    ).toBe(404);
  });
});

describe("tyre plan", () => {
  it("dates each position from the last reading, the usage rate and the calibrated wear", async () => {
    const res = await call(getPlan, team.admin.cookie, "/api/v1/tyre-plan?today=2026-05-06", {});
    expect(res.status).toBe(200);
    const fl = res.body.items.find(
      (i: { machineId: string; position: string }) =>
        i.machineId === machineId && i.position === "front-left",
    );
    expect(fl.status).toBe("planned");
    expect(fl.calibrated).toBe(true);
    expect(fl.lastHourMeter).toBe(900);
    // 800 h over Jan 5 → May 5 (120 days) ≈ 46.7 h/week; due date after the last reading.
    const m = res.body.machines.find((x: { machineId: string }) => x.machineId === machineId);
    expect(m.hoursPerWeek).toBeGreaterThan(40);
    expect(fl.dueOn > "2026-05-05").toBe(true);
    expect(res.body.currency).toMatch(/^[A-Z]{3}$/);
    expect(
      res.body.orders.reduce((s: number, o: { count: number }) => s + o.count, 0),
    ).toBeGreaterThan(0);
  });

  it("exports the plan as CSV with units and currency in the header", async () => {
    const res = await call(getPlanCsv, team.admin.cookie, "/api/v1/tyre-plan/csv", {});
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    expect(res.body.split("\r\n")[0]).toMatch(
      /^customer,machine,position,tyre size,.*due on,tyre price \([A-Z]{3}\)$/,
    );
    expect(res.body).toContain("Larkrise Test Farm");
  });

  it("shows a customer account only its own machines", async () => {
    const own = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    const other = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
    });
    const mine = await call(getPlan, own.cookie, "/api/v1/tyre-plan", {});
    expect(mine.body.items.every((i: { customerId: string }) => i.customerId === customerId)).toBe(
      true,
    );
    expect(mine.body.items.length).toBe(4);
    const theirs = await call(getPlan, other.cookie, "/api/v1/tyre-plan", {});
    expect(JSON.stringify(theirs.body)).not.toContain("Larkrise Test Farm");
    expect(
      (
        await call(postReading, own.cookie, "x", {
          method: "POST",
          params: { id: machineId },
          body: reading(),
        })
      ).status,
    ).toBe(403);
  });

  it("deleting a reading moves the plan, and a tyre change starts the position again", async () => {
    const list = (await call(listReadings, team.admin.cookie, "x", { params: { id: machineId } }))
      .body;
    const before = (
      await call(getPlan, team.admin.cookie, "/api/v1/tyre-plan?today=2026-05-06", {})
    ).body;
    const fitted = await call(postReading, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: machineId },
      body: reading({
        kind: "fitted",
        measuredOn: "2026-05-06",
        hourMeter: 910,
        depthCentre: 40,
        depthInner: 40,
        depthOuter: 40,
        designation: "480/70R28",
      }),
    });
    expect(fitted.status).toBe(201);
    const after = (await call(getPlan, team.admin.cookie, "/api/v1/tyre-plan?today=2026-05-06", {}))
      .body;
    const pick = (p: { items: { machineId: string; position: string; hoursLeft: number }[] }) =>
      p.items.find((i) => i.machineId === machineId && i.position === "front-left")!;
    expect(pick(after).hoursLeft).toBeGreaterThan(pick(before).hoursLeft);
    expect(list.length).toBeGreaterThan(0);
  });
});
