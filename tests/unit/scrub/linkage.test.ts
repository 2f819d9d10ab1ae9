import { fmin } from "./fmin";
import { describe, expect, it } from "vitest";
import { idealSteerAngles, linkageOuterAngle } from "@/lib/scrub";

import { closureResidual, deg, rad } from "./four-bar";

describe("trapezoid linkage loop closure", () => {
  const T = 1.7;
  const L = 2.75;
  const r = 0.2;
  // Classic rule (Wikipedia, "Ackermann steering geometry"): arm extensions meet at the
  // rear-axle centre, tan β = (T/2)/L.
  const classic = deg(Math.atan(T / 2 / L));

  it.each([
    ["behind", 5],
    ["behind", 20],
    ["behind", 40],
    ["behind", 50],
    ["ahead", 15],
    ["ahead", 35],
  ] as const)(
    "tie rod %s, inner %s°: closed form equals an independent bisection (fmin)",
    (tieRod, inner) => {
      const outer = linkageOuterAngle({
        pivotTrack: T,
        armLength: r,
        armAngle: classic,
        tieRod,
        inner,
      });
      // Independent numeric solve with the general-purpose `fmin` library's bisection.
      const numeric = fmin.bisect(
        (o) => closureResidual(T, r, classic, tieRod, inner, o),
        0.2 * inner,
        inner + 1e-9,
        { tolerance: 1e-13, maxIterations: 200 },
      );
      expect(outer).toBeCloseTo(numeric, 8);
      expect(Math.abs(closureResidual(T, r, classic, tieRod, inner, outer))).toBeLessThan(1e-12);
    },
  );

  it("is zero at straight ahead and steers the outer wheel less than the inner", () => {
    expect(
      linkageOuterAngle({
        pivotTrack: T,
        armLength: r,
        armAngle: classic,
        tieRod: "behind",
        inner: 0,
      }),
    ).toBeCloseTo(0, 12);
    const outer = linkageOuterAngle({
      pivotTrack: T,
      armLength: r,
      armAngle: classic,
      tieRod: "behind",
      inner: 30,
    });
    expect(outer).toBeLessThan(30);
  });

  it("classic-rule trapezoid approximates Ackermann only: within 2.5° of ideal up to 50° (Wikipedia: an approximation)", () => {
    for (const inner of [10, 20, 30, 40, 50]) {
      const outer = linkageOuterAngle({
        pivotTrack: T,
        armLength: r,
        armAngle: classic,
        tieRod: "behind",
        inner,
      });
      const radius = L / Math.tan(rad(inner)) + T / 2;
      const ideal = idealSteerAngles({ wheelbase: L, pivotTrack: T, radius }).outer;
      expect(Math.abs(outer - ideal)).toBeLessThan(2.5);
      expect(outer).not.toBeCloseTo(ideal, 3);
    }
  });

  it("reports a lock the linkage cannot reach instead of returning a wrong angle", () => {
    expect(() =>
      linkageOuterAngle({
        pivotTrack: 1.0,
        armLength: 0.3,
        armAngle: 40,
        tieRod: "behind",
        inner: 80,
      }),
    ).toThrow(/cannot reach/);
  });
});
