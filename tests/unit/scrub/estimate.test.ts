import { describe, expect, it } from "vitest";
import { ENGINE_VERSION, estimate, STANDING_CAUTIONS } from "@/lib/scrub";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { lowSpeedTurn, oneTurn, testMachine } from "./fixtures";

const tractor = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine;

describe("estimate warnings and cautions", () => {
  it("reports a radius tighter than the lock as infeasible, unclamped and without wear", () => {
    const machine = testMachine({ layout: "ideal", maxLock: 45 });
    const result = estimate(machine, oneTurn(lowSpeedTurn(2)));
    const turn = result.turns[0]!;
    expect(turn.feasible).toBe(false);
    expect(turn.radius).toBe(2);
    expect(turn.energy).toBe(0);
    expect(result.warnings).toContainEqual(
      expect.objectContaining({ code: "radius-infeasible", severity: "error", turnIndex: 0 }),
    );
    expect(result.positions.every((p) => p.wearPer100h.total === 0)).toBe(true);
  });

  it("honours the machine's minimum turning radius (outer tyre path)", () => {
    const machine = {
      ...testMachine({ layout: "ideal", maxLock: 55 }),
      limits: { minTurningRadius: 9 },
    };
    const result = estimate(machine, oneTurn(lowSpeedTurn(6)));
    expect(result.turns[0]!.feasible).toBe(false);
    expect(result.warnings[0]?.message).toMatch(/minimum turning radius 9 m/);
  });

  it("flags front-axle lead outside the common 1–5 % band (common practice, no source)", () => {
    const low = { ...tractor, drive: { type: "front-assist" as const, gearRatio: 1.27 } };
    const ok = estimate(tractor, oneTurn(lowSpeedTurn(8)));
    expect(ok.lead).toBeGreaterThan(0.01);
    expect(ok.warnings.find((w) => w.code === "lead-out-of-range")).toBeUndefined();
    const bad = estimate(low, oneTurn(lowSpeedTurn(8)));
    expect(bad.lead).toBeLessThan(0.01);
    expect(bad.warnings).toContainEqual(expect.objectContaining({ code: "lead-out-of-range" }));
  });

  it("flags loads beyond the declared tyre capacity", () => {
    const result = estimate(tractor, oneTurn(lowSpeedTurn(8)));
    // Demo front axle: 2600 kg unladen → 1300 kg per tyre (fine); 3400 kg laden → 1700 kg;
    // rear 3900 kg → 1950 kg per tyre; capacities 2500 / 3650 kg: no warning.
    expect(result.warnings.find((w) => w.code === "load-over-capacity")).toBeUndefined();
    const heavy = structuredClone(tractor);
    heavy.axles.front.ladenLoad = 5600;
    const over = estimate(heavy, oneTurn(lowSpeedTurn(8)));
    expect(over.warnings).toContainEqual(
      expect.objectContaining({ code: "load-over-capacity", severity: "error" }),
    );
  });

  it("rejects invalid input with a message naming the field", () => {
    const bad = { ...testMachine(), wheelbase: -1 };
    expect(() => estimate(bad, oneTurn(lowSpeedTurn(8)))).toThrow(
      /Machine is invalid[\s\S]*wheelbase/,
    );
    expect(() =>
      estimate(testMachine(), oneTurn({ direction: "left", headingChange: 90, surface: "gravel" })),
    ).toThrow(/radius or steerInput/);
    const unparsed = structuredClone(testMachine());
    unparsed.axles.front.tyre.designation = "480/8R46";
    expect(() => estimate(unparsed, oneTurn(lowSpeedTurn(8)))).toThrow(/front axle.*aspect ratio/);
  });

  it("names every invalid turn kind by its index and loses nothing else", () => {
    const cycle = oneTurn(lowSpeedTurn(8));
    const turns = [...cycle.turns, { turn: { ...lowSpeedTurn(8), surface: "ice" }, perHour: 1 }];
    turns.push({ turn: lowSpeedTurn(6), perHour: -2 });
    expect(() => estimate(testMachine(), { ...cycle, turns } as typeof cycle)).toThrow(
      /turns\[1\][\s\S]*surface[\s\S]*turns\[2\][\s\S]*perHour/,
    );
  });

  it("an empty duty cycle predicts no wear, no life and no cost", () => {
    const result = estimate(testMachine(), { ...oneTurn(lowSpeedTurn(8)), turns: [] });
    expect(result.turns).toEqual([]);
    expect(result.firstToWear).toBeNull();
    expect(result.costPerHour).toBe(0);
    expect(result.positions.every((p) => p.hoursToReplacement === null)).toBe(true);
  });

  it("reports a steering mode the machine lacks", () => {
    const result = estimate(testMachine(), oneTurn(lowSpeedTurn(8, { steeringMode: "crab" })));
    expect(result.turns[0]!.feasible).toBe(false);
    expect(result.warnings[0]?.code).toBe("steering-mode-missing");
  });

  it("carries the engine version and the standing cautions", () => {
    const result = estimate(testMachine(), oneTurn(lowSpeedTurn(8)));
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    const always = STANDING_CAUTIONS.filter(
      (c) => !["stability", "lead-matching"].includes(c.code),
    );
    for (const c of always) expect(result.cautions).toContainEqual(c);
    expect(result.cautions.map((c) => c.code)).toContain("load-speed-pressure");
  });

  // Common practice, no source: frame-steer, rear-steer and skid machines carry the stability
  // caution (tipping with a raised load, tail swing); a front-steer tractor does not.
  it("shows cautions by layout: stability only for layouts it concerns", () => {
    const byLayout = (layout: string) => {
      const m = DEMO_MACHINES.find((d) => d.machine.steering.layout === layout)!;
      return estimate(m.machine, DEMO_DUTY_CYCLES[m.id]!).cautions.map((c) => c.code);
    };
    expect(byLayout("trapezoid")).not.toContain("stability");
    expect(byLayout("articulated")).toContain("stability");
    expect(byLayout("skid")).toContain("stability");
    expect(byLayout("rear")).toContain("stability");
    for (const layout of ["trapezoid", "articulated", "skid", "rear"]) {
      expect(byLayout(layout)).toContain("estimate-only");
      expect(byLayout(layout)).toContain("mounting-hazard");
    }
  });
});

describe("wear, life and rotation", () => {
  it("a calibrated wear coefficient k_h replaces the placeholder for that position only", () => {
    const machine = testMachine({ layout: "parallel", maxLock: 55 });
    const plain = estimate(machine, oneTurn(lowSpeedTurn(6), 30));
    const calibrated = estimate(
      { ...machine, wearCoefficients: { "front-left": 0.1 } },
      oneTurn(lowSpeedTurn(6), 30),
    );
    const fl = calibrated.positions[0]!;
    expect(fl.wearCoefficient).toEqual({ value: 0.1, calibrated: true });
    expect(fl.wearPer100h.scrub).toBeCloseTo((0.1 * fl.energyPerHour.total * 100) / 1e6, 12);
    expect({ ...calibrated.positions[1], wearsFirst: null }).toEqual({
      ...plain.positions[1],
      wearsFirst: null,
    });
  });

  it("hours to replacement = usable depth / wear rate; cost per hour = price / hours", () => {
    const result = estimate(
      testMachine({ layout: "parallel", maxLock: 55 }),
      oneTurn(lowSpeedTurn(6), 30, 5000),
    );
    for (const p of result.positions) {
      const usable = p.position.startsWith("front") ? 30 : 41;
      const price = p.position.startsWith("front") ? 900 : 1900;
      expect(p.hoursToReplacement).toBeCloseTo(usable / (p.wearPer100h.total / 100), 6);
      expect(p.costPerHour).toBeCloseTo(price / p.hoursToReplacement!, 9);
    }
    const first = result.positions.filter((p) => p.wearsFirst);
    expect(first).toHaveLength(1);
    expect(result.firstToWear).toBe(first[0]!.position);
  });

  it("suggests swapping same-size positions whose wear differs", () => {
    const skid = DEMO_MACHINES.find((d) => d.id === "wheeled-skid-steer")!;
    const result = estimate(skid.machine, DEMO_DUTY_CYCLES[skid.id]!);
    expect(result.rotation.length).toBeGreaterThan(0);
    for (const r of result.rotation) {
      expect(r.lifeWith).toBeGreaterThan(r.lifeWithout);
      expect(r.atHours).toBeCloseTo(r.lifeWith / 2, 9);
    }
  });

  it("front-wheel assist engaged in a tight turn adds longitudinal (wind-up) scrub", () => {
    const off = estimate(tractor, oneTurn({ ...lowSpeedTurn(6), frontDrive: "disengaged" }));
    const on = estimate(tractor, oneTurn(lowSpeedTurn(6)));
    expect(on.turns[0]!.effectiveLead).toBeLessThan(0);
    expect(off.turns[0]!.effectiveLead).toBeNull();
    const lon = (r: typeof on) => r.turns[0]!.wheels.reduce((s, w) => s + w.longitudinalEnergy, 0);
    expect(lon(off)).toBe(0);
    expect(lon(on)).toBeGreaterThan(0);
  });
});
