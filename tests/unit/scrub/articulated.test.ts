import { describe, expect, it } from "vitest";
import { articulatedRadii } from "@/lib/scrub";

const rad = (d: number) => (d * Math.PI) / 180;

/**
 * Independent construction: rear frame along x with its axle at the origin and hinge at
 * (L_r, 0); front frame rotated by γ about the hinge. The turning centre is where the two axle
 * lines (perpendicular to each frame) meet.
 */
function radiiByIntersection(Lf: number, Lr: number, gammaDeg: number) {
  const g = rad(gammaDeg);
  const hinge = { x: Lr, y: 0 };
  const front = { x: hinge.x + Lf * Math.cos(g), y: hinge.y + Lf * Math.sin(g) };
  // Rear axle line: x = 0. Front axle line through `front` with direction (−sin γ, cos γ).
  const t = -front.x / -Math.sin(g);
  const centre = { x: 0, y: front.y + t * Math.cos(g) };
  return {
    rear: Math.hypot(centre.x, centre.y),
    front: Math.hypot(centre.x - front.x, centre.y - front.y),
  };
}

describe("articulated radii (Hellström 2011 [from memory]; geometry cross-check)", () => {
  it.each([
    [1.55, 1.75, 30],
    [1.6, 1.6, 20],
    [2.1, 1.4, 42],
  ])("L_f=%s, L_r=%s, γ=%s° matches the axle-line intersection", (Lf, Lr, g) => {
    const got = articulatedRadii({ frontLength: Lf, rearLength: Lr, articulation: g });
    const ref = radiiByIntersection(Lf, Lr, g);
    expect(got.front).toBeCloseTo(ref.front, 9);
    expect(got.rear).toBeCloseTo(ref.rear, 9);
  });

  it("equal halves run on one radius h·cot(γ/2); an off-centre hinge off-tracks", () => {
    const equal = articulatedRadii({ frontLength: 1.6, rearLength: 1.6, articulation: 35 });
    expect(equal.front).toBeCloseTo(1.6 / Math.tan(rad(17.5)), 10);
    expect(equal.rear).toBeCloseTo(equal.front, 10);
    const offset = articulatedRadii({ frontLength: 1.4, rearLength: 1.9, articulation: 35 });
    expect(offset.front).toBeGreaterThan(offset.rear);
  });
});
