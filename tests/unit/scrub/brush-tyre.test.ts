import { describe, expect, it } from "vitest";
import { brushTyre } from "@/lib/scrub";

const deg = (r: number) => (r * 180) / Math.PI;

// Brush model with parabolic pressure: Pacejka, Tire and Vehicle Dynamics, ch. 3 [from memory]:
// F = μFz(3θσ − 3θ²σ² + θ³σ³), θ = Cα/(3μFz), σ = tan α; full sliding beyond tan α_sl = 3μFz/Cα.
describe("brush tyre", () => {
  const load = 20_000;
  const C = 100_000;
  const mu = 0.8;

  it("has slope Cα at zero slip", () => {
    const small = brushTyre({ load, corneringStiffness: C, friction: mu, slip: 0.01 });
    expect(small.lateralForce / Math.tan((0.01 * Math.PI) / 180)).toBeCloseTo(C, -2);
  });

  it("saturates at μFz at and beyond tan α_sl = 3μFz/Cα", () => {
    const alphaSl = deg(Math.atan((3 * mu * load) / C));
    for (const slip of [alphaSl, alphaSl + 5, 60]) {
      const r = brushTyre({ load, corneringStiffness: C, friction: mu, slip });
      expect(r.lateralForce).toBeCloseTo(mu * load, 6);
      expect(r.slidingFraction).toBe(1);
    }
  });

  it("at θσ = 1/2 gives 0.875 μFz with half the contact sliding", () => {
    const slip = deg(Math.atan((0.5 * 3 * mu * load) / C));
    const r = brushTyre({ load, corneringStiffness: C, friction: mu, slip });
    expect(r.lateralForce / (mu * load)).toBeCloseTo(0.875, 10);
    expect(r.slidingFraction).toBeCloseTo(0.5, 10);
  });

  it("energy per metre ≈ F²/Cα at small slip (Schallamach & Turner 1960 form [from memory])", () => {
    const r = brushTyre({ load, corneringStiffness: C, friction: mu, slip: 0.02 });
    expect(r.energyPerMetre / ((r.lateralForce * r.lateralForce) / C)).toBeCloseTo(1, 2);
  });

  it("is odd in slip and rejects out-of-range input", () => {
    const a = brushTyre({ load, corneringStiffness: C, friction: mu, slip: 3 });
    const b = brushTyre({ load, corneringStiffness: C, friction: mu, slip: -3 });
    expect(b.lateralForce).toBeCloseTo(-a.lateralForce, 10);
    expect(() => brushTyre({ load, corneringStiffness: C, friction: mu, slip: 95 })).toThrow(
      /slip/,
    );
  });
});
