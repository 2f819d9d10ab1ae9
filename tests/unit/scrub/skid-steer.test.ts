import { describe, expect, it } from "vitest";
import { estimate, type TMachineInput } from "@/lib/scrub";
import { oneTurn } from "./fixtures";

function skidMachine(opts: {
  running: "wheeled" | "tracked";
  front: number;
  rear: number;
  contactLength?: number;
}): TMachineInput {
  const tyre = { designation: "12-16.5", treadDepthNew: 22, treadDepthReplace: 4, price: 260 };
  return {
    name: "Test skid steer",
    wheelbase: 1.1,
    axles: {
      front: { track: 1.5, load: opts.front, tyre },
      rear: { track: 1.5, load: opts.rear, tyre },
    },
    steering: { layout: "skid", running: opts.running, contactLength: opts.contactLength },
    drive: { type: "4wd", interAxleRatio: 1 },
  };
}

const pivot = {
  direction: "left",
  radius: 0,
  headingChange: 360,
  speed: 0,
  surface: "concrete-asphalt",
} as const;
const MU = 0.8; // default concrete/asphalt friction
const G = 9.80665;

describe("skid-steer turning resistance", () => {
  it("tracked pivot turn: M = μ·W·l/4 (Wong, Theory of Ground Vehicles [from memory])", () => {
    const l = 1.6;
    const result = estimate(
      skidMachine({ running: "tracked", front: 1500, rear: 1500, contactLength: l }),
      oneTurn(pivot),
    );
    const W = 3000 * G;
    expect(result.turns[0]?.turningMoment).toBeCloseTo((MU * W * l) / 4, 0);
  });

  it("four equal wheels at ±a: M = μ·W·a (the track formula with l = 4a)", () => {
    const result = estimate(
      skidMachine({ running: "wheeled", front: 1500, rear: 1500 }),
      oneTurn(pivot),
    );
    expect(result.turns[0]?.turningMoment).toBeCloseTo(MU * 3000 * G * 0.55, 0);
  });

  it("lateral energy per 360° pivot is 2π·M_r; the turning centre moves to the heavier axle", () => {
    const result = estimate(
      skidMachine({ running: "wheeled", front: 1200, rear: 1800 }),
      oneTurn(pivot),
    );
    const turn = result.turns[0]!;
    const lateral = turn.wheels.reduce((s, w) => s + w.lateralEnergy, 0);
    expect(lateral).toBeCloseTo(2 * Math.PI * turn.turningMoment!, -1);
    expect(turn.turningCentre!.x).toBeLessThan(0);
    // Rigid-Coulomb limit: M_r = 2a·μ·min(W_front, W_rear) (derived, see docs/engine.md).
    expect(turn.turningMoment!).toBeGreaterThan(2 * 0.55 * MU * 1200 * G * 0.98);
    expect(turn.turningMoment!).toBeLessThan(MU * 3000 * G * 0.55);
  });

  it("side slip per radian is independent of the turn radius for wheels at ±a", () => {
    const a = estimate(
      skidMachine({ running: "wheeled", front: 1500, rear: 1500 }),
      oneTurn({ ...pivot, radius: 0 }),
    );
    const b = estimate(
      skidMachine({ running: "wheeled", front: 1500, rear: 1500 }),
      oneTurn({ ...pivot, radius: 1.5 }),
    );
    for (let i = 0; i < 4; i++) {
      expect(b.turns[0]!.wheels[i]!.longitudinalScrub).toBeCloseTo(
        a.turns[0]!.wheels[i]!.longitudinalScrub,
        9,
      );
    }
    const slide = a.turns[0]!.wheels.reduce((s, w) => s + w.lateralScrub, 0);
    expect(slide).toBeCloseTo(4 * 0.55 * 2 * Math.PI, 6);
  });
});
