import { describe, expect, it } from "vitest";
import {
  brushTyre,
  equilibriumTurn,
  idealSteerAngles,
  type TEquilibriumWheelInput,
} from "@/lib/scrub";
import { fmin } from "./fmin";

const rad = (d: number) => (d * Math.PI) / 180;
const L = 2.6;
const T = 1.8;

function wheels(front: { inner: number; outer: number }): TEquilibriumWheelInput[] {
  const w = (x: number, y: number, steer: number, load: number) => ({
    x,
    y,
    steer,
    load,
    corneringStiffness: 5 * load,
    friction: 0.8,
  });
  return [
    w(L, T / 2, front.inner, 20_000),
    w(L, -T / 2, front.outer, 20_000),
    w(0, T / 2, 0, 30_000),
    w(0, -T / 2, 0, 30_000),
  ];
}

/** Independent residual of the force and yaw balance (linear tyres) for a trial centre. */
function balance(input: TEquilibriumWheelInput[], cx: number, cy: number): [number, number] {
  let fy = 0;
  let mz = 0;
  for (const wh of input) {
    // Travel direction of a point turning about (cx, cy) counter-clockwise.
    const heading = Math.atan2(wh.x - cx, cy - wh.y);
    const slip = rad(wh.steer) - heading;
    const f = wh.corneringStiffness * Math.tan(slip);
    fy += f * Math.cos(rad(wh.steer));
    mz += wh.x * f * Math.cos(rad(wh.steer)) + wh.y * f * Math.sin(rad(wh.steer));
  }
  return [fy, mz];
}

describe("equilibrium turning centre", () => {
  it("ideal geometry: centre on the rear-axle line at R, zero slip (Wikipedia, Ackermann)", () => {
    const R = 7;
    const r = equilibriumTurn({
      wheels: wheels(idealSteerAngles({ wheelbase: L, pivotTrack: T, radius: R })),
      tyre: "linear",
      headingChange: 90,
    });
    expect(r.centre.x).toBeCloseTo(0, 9);
    expect(r.centre.y).toBeCloseTo(R, 9);
    for (const w of r.wheels) expect(Math.abs(w.slip) + w.scrub + w.energy).toBeLessThan(1e-9);
  });

  it("parallel steer: Newton agrees with an independent Nelder–Mead solve (fmin) of the same balance", () => {
    const angle = idealSteerAngles({ wheelbase: L, pivotTrack: T, radius: 6 }).inner;
    const input = wheels({ inner: angle, outer: angle });
    const r = equilibriumTurn({ wheels: input, tyre: "linear", headingChange: 90 });
    const objective = ([cx = 0, cy = 0]: number[]) => {
      const [fy, mz] = balance(input, cx, cy);
      return (fy / 1e4) ** 2 + (mz / 1e4) ** 2;
    };
    const numeric = fmin.nelderMead(objective, [0.5, 5], {
      maxIterations: 5000,
      minErrorDelta: 1e-16,
    });
    expect(numeric.x[0]).toBeCloseTo(r.centre.x, 3);
    expect(numeric.x[1]).toBeCloseTo(r.centre.y, 3);
    const [fy, mz] = balance(input, r.centre.x, r.centre.y);
    expect(Math.abs(fy)).toBeLessThan(1e-6);
    expect(Math.abs(mz)).toBeLessThan(1e-6);
  });

  it("the solver's tyre forces are the brush law at the solved slip angles (Pacejka [from memory])", () => {
    const input = wheels({ inner: 35, outer: 35 });
    const r = equilibriumTurn({ wheels: input, tyre: "brush", headingChange: 90 });
    r.wheels.forEach((w, i) => {
      const wheel = input[i]!;
      const ref = brushTyre({
        load: wheel.load,
        corneringStiffness: wheel.corneringStiffness,
        friction: wheel.friction,
        slip: w.slip,
      });
      expect(w.lateralForce).toBeCloseTo(ref.lateralForce, 6);
    });
  });

  it("scrub and energy per wheel follow s = ρ|sin α|Δψ and E = |F|·s", () => {
    const angle = 30;
    const r = equilibriumTurn({
      wheels: wheels({ inner: angle, outer: angle }),
      tyre: "brush",
      headingChange: 180,
    });
    for (const w of r.wheels) {
      expect(w.scrub).toBeCloseTo(w.pathRadius * Math.abs(Math.sin(rad(w.slip))) * Math.PI, 9);
      expect(w.energy).toBeCloseTo(Math.abs(w.lateralForce) * w.scrub, 6);
    }
  });
});
