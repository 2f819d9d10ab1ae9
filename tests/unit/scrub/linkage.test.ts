import { fmin } from "./fmin";
import { describe, expect, it } from "vitest";
import { idealSteerAngles, linkageOuterAngle } from "@/lib/scrub";

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

/**
 * Independent loop-closure residual written from the four-bar geometry (pivots at (0, ±T/2),
 * arms of length r at angle β inboard, tie rod joining the arm ends): |P_R − P_L| − l.
 */
function closureResidual(
  T: number,
  r: number,
  betaDeg: number,
  tieRod: "behind" | "ahead",
  innerDeg: number,
  outerDeg: number,
): number {
  const dir = tieRod === "behind" ? -1 : 1; // arms point rearward (behind) or forward (ahead)
  const arm = (side: 1 | -1, steer: number) => {
    // Straight-ahead arm vector for the left (side = 1) or right (side = −1) wheel.
    const ax = dir * r * Math.cos(rad(betaDeg));
    const ay = dir * side * r * Math.sin(rad(betaDeg));
    const c = Math.cos(rad(steer));
    const s = Math.sin(rad(steer));
    return { x: ax * c - ay * s, y: side * (T / 2) + ax * s + ay * c };
  };
  const l0 = Math.hypot(arm(1, 0).x - arm(-1, 0).x, arm(1, 0).y - arm(-1, 0).y);
  const pl = arm(1, innerDeg);
  const pr = arm(-1, outerDeg);
  return Math.hypot(pr.x - pl.x, pr.y - pl.y) - l0;
}

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
