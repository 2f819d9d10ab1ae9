import type { TDutyCycleInput, TMachineInput, TSteering, TTurnInput } from "@/lib/scrub";

/** Invented test machine: a plain two-axle front-steer tractor, free rolling (2WD). */
export function testMachine(
  steering: TSteering | Record<string, unknown> = { layout: "ideal", maxLock: 55 },
  overrides: { wheelbase?: number; track?: number; pivotTrack?: number } = {},
): TMachineInput {
  const track = overrides.track ?? 1.8;
  return {
    name: "Test tractor",
    wheelbase: overrides.wheelbase ?? 2.6,
    axles: {
      front: {
        track,
        pivotTrack: overrides.pivotTrack ?? track,
        load: 2500,
        tyre: { designation: "380/85R28", treadDepthNew: 40, treadDepthReplace: 10, price: 900 },
      },
      rear: {
        track,
        load: 3500,
        tyre: { designation: "460/85R38", treadDepthNew: 55, treadDepthReplace: 14, price: 1900 },
      },
    },
    steering: steering as TSteering,
    drive: { type: "2wd", drivenAxle: "rear" },
  };
}

/** One-turn-kind duty cycle with no straight travel unless given. */
export function oneTurn(turn: TTurnInput, perHour = 10, straightMetres = 0): TDutyCycleInput {
  return {
    name: "test cycle",
    turns: [{ turn, perHour }],
    straight: {
      distancePerHour: straightMetres,
      speed: 2,
      surfaceShares: { "concrete-asphalt": 1 },
    },
  };
}

export const lowSpeedTurn = (radius: number, extra: Partial<TTurnInput> = {}): TTurnInput => ({
  direction: "left",
  radius,
  headingChange: 180,
  speed: 0,
  surface: "concrete-asphalt",
  ...extra,
});
