import { describe, expect, it } from "vitest";
import { fitTangentArc, type TTangentArc } from "@/lib/scrub/fit-tangent-arc";
import { gaussian, seededRandom } from "@/lib/duty-cycles/synthetic-path";

/**
 * Known answers from plane geometry: fixes laid exactly on a straight–arc–straight path of
 * known centre, radius and tangent points (the circle and its tangent lines), then the fit is
 * started away from the answer and must come back to it.
 */
function pathFixes(p: TTangentArc, straight: number, step: number, offset = 0) {
  const { cx, cy, radius: r, theta0, sweep, dir } = p;
  const theta1 = theta0 + dir * sweep;
  const arc = r * sweep;
  const x: number[] = [];
  const y: number[] = [];
  for (let s = offset; s < 2 * straight + arc; s += step) {
    if (s < straight || s >= straight + arc) {
      const th = s < straight ? theta0 : theta1;
      const u = s < straight ? s - straight : s - straight - arc;
      // Tangent point plus u along the direction of travel there.
      x.push(cx + r * Math.cos(th) - dir * u * Math.sin(th));
      y.push(cy + r * Math.sin(th) + dir * u * Math.cos(th));
    } else {
      const a = theta0 + (dir * (s - straight)) / r;
      x.push(cx + r * Math.cos(a));
      y.push(cy + r * Math.sin(a));
    }
  }
  return { x, y, length: x.length };
}

const DEG = Math.PI / 180;

describe("fitTangentArc: geometric least-squares straight–arc–straight fit", () => {
  it("recovers an exact right turn of 120° and 7 m from a start 20 % and 10° away", () => {
    const truth: TTangentArc = {
      cx: 3,
      cy: -4,
      radius: 7,
      theta0: 40 * DEG,
      sweep: 120 * DEG,
      dir: -1,
    };
    const fixes = pathFixes(truth, 20, 0.5, 0.2);
    const fit = fitTangentArc(fixes, {
      ...truth,
      cx: truth.cx + 0.8,
      cy: truth.cy - 0.5,
      radius: truth.radius * 1.2,
      theta0: truth.theta0 + 5 * DEG,
      sweep: truth.sweep - 10 * DEG,
    });
    expect(fit).toBeDefined();
    expect(fit!.radius).toBeCloseTo(7, 6);
    expect(fit!.sweep / DEG).toBeCloseTo(120, 5);
    expect(fit!.cx).toBeCloseTo(3, 5);
    expect(fit!.cy).toBeCloseTo(-4, 5);
    expect(fit!.rms).toBeLessThan(1e-6);
    // The entry tangent point is 20 m along: between fix 39 (19.7 m) and fix 40 (20.2 m).
    expect(fit!.entryAt).toBeCloseTo(39 + 0.3 / 0.5, 4);
    expect(fit!.entryCount).toBe(40);
  });

  it("holds a turn of more than 180°, where the straights cross, and a left turn", () => {
    const truth: TTangentArc = {
      cx: 0,
      cy: 0,
      radius: 5,
      theta0: -90 * DEG,
      sweep: 250 * DEG,
      dir: 1,
    };
    const fit = fitTangentArc(pathFixes(truth, 25, 0.3), {
      ...truth,
      radius: 4.2,
      sweep: 235 * DEG,
      cx: 0.4,
    });
    expect(fit!.radius).toBeCloseTo(5, 6);
    expect(fit!.sweep / DEG).toBeCloseTo(250, 5);
  });

  it("is unbiased under noise: the mean radius of 100 noisy fits is within 0.5 % of the truth", () => {
    const truth: TTangentArc = {
      cx: 0,
      cy: 0,
      radius: 6,
      theta0: -90 * DEG,
      sweep: 90 * DEG,
      dir: 1,
    };
    const exact = pathFixes(truth, 30, 0.2);
    const random = seededRandom(3);
    let sum = 0;
    for (let k = 0; k < 100; k++) {
      const x = exact.x.map((v) => v + 0.08 * gaussian(random));
      const y = exact.y.map((v) => v + 0.08 * gaussian(random));
      sum += fitTangentArc({ x, y, length: x.length }, { ...truth, radius: 5 })!.radius;
    }
    expect(Math.abs(sum / 100 - 6) / 6).toBeLessThan(0.005);
  });

  it("refuses fixes that end on the arc: without an exit straight the arc's end is a guess", () => {
    const truth: TTangentArc = {
      cx: 0,
      cy: 0,
      radius: 6,
      theta0: -90 * DEG,
      sweep: 90 * DEG,
      dir: 1,
    };
    const all = pathFixes(truth, 20, 0.5);
    const cut = Math.floor((20 + (6 * Math.PI) / 4) / 0.5); // up to the exit tangent point
    const fixes = { x: all.x.slice(0, cut), y: all.y.slice(0, cut), length: cut };
    expect(fitTangentArc(fixes, truth)).toBeUndefined();
  });
});
