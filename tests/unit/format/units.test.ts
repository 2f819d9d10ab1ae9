import { describe, expect, it } from "vitest";
import { formatQuantity, fromSi, toSi, unitLabel } from "@/lib/format/units";
import { machineFromSi, machineToSi, quantityOf } from "@/features/machines/lib/machine-units";
import { DEMO_MACHINES } from "@/lib/demo/machines";

// Conversion factors are exact by definition: NIST SP 811 (2008), Appendix B.8/B.9:
// 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lb (avoirdupois) = 0.45359237 kg.
describe("display units", () => {
  it("converts lengths and masses with the NIST SP 811 exact factors", () => {
    expect(fromSi("imperial", "length-m", 2.54)).toBeCloseTo(100, 10);
    expect(fromSi("imperial", "length-mm", 25.4)).toBeCloseTo(1, 10);
    expect(fromSi("imperial", "distance-m", 3.048)).toBeCloseTo(10, 10);
    expect(fromSi("imperial", "mass-kg", 0.45359237)).toBeCloseTo(1, 12);
    expect(toSi("imperial", "mass-kg", 1000)).toBeCloseTo(453.59237, 9);
  });

  it("converts inflation pressure to psi (NIST SP 811, B.8: 1 psi = 6.894 757 E+03 Pa)", () => {
    expect(toSi("imperial", "pressure-kpa", 1)).toBeCloseTo(6.894757, 6);
    expect(fromSi("imperial", "pressure-kpa", 160)).toBeCloseTo(23.206, 3);
    expect([unitLabel("metric", "pressure-kpa"), unitLabel("imperial", "pressure-kpa")]).toEqual([
      "kPa",
      "psi",
    ]);
  });

  it("leaves metric values and unit-less quantities alone", () => {
    expect(fromSi("metric", "length-m", 2.7)).toBe(2.7);
    expect(toSi("imperial", "none", 52)).toBe(52);
    expect(unitLabel("imperial", "none")).toBe("");
  });

  it("labels units per system", () => {
    expect([unitLabel("metric", "length-m"), unitLabel("imperial", "length-m")]).toEqual([
      "m",
      "in",
    ]);
    expect([unitLabel("metric", "mass-kg"), unitLabel("imperial", "mass-kg")]).toEqual([
      "kg",
      "lb",
    ]);
    expect(formatQuantity("imperial", "distance-m", 3.048, 1)).toBe("10 ft");
  });

  it("knows which machine fields carry which quantity", () => {
    expect(quantityOf("wheelbase")).toBe("length-m");
    expect(quantityOf("axles.front.tyre.treadDepthNew")).toBe("length-mm");
    expect(quantityOf("axles.rear.load")).toBe("mass-kg");
    expect(quantityOf("steering.maxLock")).toBe("none");
    expect(quantityOf("axles.front.tyre.price")).toBe("none");
  });

  it("round-trips every demo machine through imperial display units", () => {
    for (const { machine } of DEMO_MACHINES) {
      const back = machineToSi(machineFromSi(machine, "imperial"), "imperial");
      expect(back.wheelbase / machine.wheelbase).toBeCloseTo(1, 5);
      expect(back.axles.front.load / machine.axles.front.load).toBeCloseTo(1, 5);
      expect(back.axles.rear.tyre.treadDepthNew).toBeCloseTo(
        machine.axles.rear.tyre.treadDepthNew,
        3,
      );
      expect(back.steering).toMatchObject({ layout: machine.steering.layout });
    }
  });

  it("turns an empty number input (NaN) into a missing value", () => {
    const spec = machineFromSi(DEMO_MACHINES[0]!.machine, "metric");
    spec.axles.front.pivotTrack = Number.NaN;
    expect(machineToSi(spec, "metric").axles.front).not.toHaveProperty("pivotTrack");
  });
});
