import { describe, expect, it } from "vitest";
import { applyChanges, ZMachine } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import {
  applicableParameters,
  describeChange,
  readChange,
  setupChoices,
} from "@/features/options/lib/setup-choices";
import { evenlySpaced, readSweepForm } from "@/features/options/lib/sweep-range";

const demo = (id: string) => ZMachine.parse(DEMO_MACHINES.find((m) => m.id === id)!.machine);
const keys = (id: string) => setupChoices(demo(id), "metric").map((c) => c.key);

describe("changes offered for a machine's layout", () => {
  it("offers linkage, lead and assist-in-turns on a front-assist tractor with a trapezoid linkage", () => {
    const k = keys("row-crop-tractor");
    expect(k).toEqual(
      expect.arrayContaining([
        "parameter:armAngle",
        "parameter:frontTrack",
        "parameter:rearTrack",
        "parameter:lead",
        "steering",
        "tyres:front",
        "inflation:rear",
        "ballast",
        "front-assist-in-turns",
      ]),
    );
    expect(k).not.toContain("parameter:hingePosition");
    expect(k).not.toContain("parameter:rearSteerRatio");
  });

  it("offers the hinge on an articulated loader and no arm angle", () => {
    const k = keys("articulated-loader");
    expect(k).toContain("parameter:hingePosition");
    expect(k).not.toContain("parameter:armAngle");
    expect(k).not.toContain("front-assist-in-turns");
  });

  it("offers no steering linkage or arm angle on a skid steer", () => {
    const k = keys("wheeled-skid-steer");
    expect(k).not.toContain("steering");
    expect(k).not.toContain("parameter:armAngle");
    expect(k).not.toContain("parameter:hingePosition");
  });

  it("offers the rear-steer ratio on a four-wheel-steer telehandler", () => {
    expect(keys("telehandler")).toContain("parameter:rearSteerRatio");
  });

  it("offers no lead where the front axle is not driven from the rear (rear-steer combine)", () => {
    expect(keys("rear-steer-combine")).not.toContain("parameter:lead");
  });

  it("every offered change, left at today's values, applies cleanly in the engine", () => {
    for (const d of DEMO_MACHINES) {
      const machine = ZMachine.parse(d.machine);
      for (const choice of setupChoices(machine, "imperial")) {
        const values = Object.fromEntries(choice.fields.map((f) => [f.name, f.initial]));
        const read = readChange(machine, "imperial", choice.key, values);
        if (!read.ok && choice.key.startsWith("inflation:")) continue; // no pressure entered yet
        expect(read, `${d.id} ${choice.key}`).toMatchObject({ ok: true });
        if (read.ok)
          expect(() => applyChanges(machine, { turns: [] } as never, [read.change])).not.toThrow();
      }
    }
  });
});

describe("reading a change in the user's units", () => {
  const tractor = demo("row-crop-tractor");

  it("converts a track entered in inches to metres (NIST SP 811: 1 in = 0.0254 m exactly)", () => {
    const read = readChange(tractor, "imperial", "parameter:frontTrack", { value: "75" });
    expect(read).toEqual({
      ok: true,
      change: { kind: "parameter", parameter: "frontTrack", value: expect.closeTo(1.905, 9) },
    });
  });

  it("converts psi and pounds to kPa and kg (NIST SP 811: 1 psi = 6.894 757 kPa, 1 lb = 0.453 592 37 kg)", () => {
    const read = readChange(tractor, "imperial", "inflation:front", {
      pressure: "16",
      ratedLoad: "4000",
    });
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.change).toMatchObject({ kind: "inflation", axle: "front" });
    const c = read.change as { pressure: number; ratedLoad: number };
    expect(c.pressure).toBeCloseTo(110.316, 2);
    expect(c.ratedLoad).toBeCloseTo(1814.37, 1);
  });

  it("says per field what to fix", () => {
    const read = readChange(tractor, "metric", "tyres:rear", {
      designation: "",
      price: "abc",
      treadDepthNew: "40",
      treadDepthReplace: "45",
    });
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(Object.keys(read.errors).sort()).toEqual(["designation", "price", "treadDepthReplace"]);
    expect(read.errors.treadDepthReplace).toMatch(/less than the new tread depth/);
  });

  it("refuses a change that does not fit the layout", () => {
    const read = readChange(demo("wheeled-skid-steer"), "metric", "parameter:armAngle", {
      value: "10",
    });
    expect(read).toEqual({
      ok: false,
      errors: { key: expect.stringMatching(/fits this machine/) },
    });
  });

  it("describes a change with its value in the user's units", () => {
    const change = { kind: "parameter", parameter: "frontTrack", value: 1.905 } as const;
    expect(describeChange(change, "imperial")).toBe("Front track 75 in");
    expect(describeChange(change, "metric")).toBe("Front track 1.905 m");
  });

  it("lists today's setting of each applicable parameter", () => {
    const p = applicableParameters(tractor);
    expect(p.find((x) => x.parameter === "armAngle")?.current).toBe(
      tractor.steering.layout === "trapezoid" ? tractor.steering.armAngle : NaN,
    );
  });
});

describe("sweep range", () => {
  it("spaces values evenly with both ends included", () => {
    expect(evenlySpaced(1.5, 2.5, 5)).toEqual([1.5, 1.75, 2, 2.25, 2.5]);
  });

  it("reads a 41-point range and limits into SI", () => {
    const read = readSweepForm(
      { parameter: "frontTrack", axle: "", from: "60", to: "80", points: "41", min: "64", max: "" },
      (_p, v) => v * 0.0254,
    );
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.sweep.values).toHaveLength(41);
    expect(read.sweep.values[0]).toBeCloseTo(1.524, 9);
    expect(read.sweep.limits).toEqual({ min: expect.closeTo(1.6256, 9) });
  });

  it("refuses a range that runs backwards or too many points", () => {
    const read = readSweepForm(
      { parameter: "lead", axle: "", from: "3", to: "1", points: "500", min: "", max: "" },
      (_p, v) => v,
    );
    expect(read).toEqual({
      ok: false,
      errors: { to: expect.any(String), points: expect.any(String) },
    });
  });
});
