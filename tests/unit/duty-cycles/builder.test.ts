// The builder's headland geometry is checked by driving the arcs it returns (plane geometry:
// an arc of radius r through angle θ moves the machine along a chord 2r·sin(θ/2)) and seeing that
// the machine ends on the next pass, one working width over, heading back the other way.
import { describe, expect, it } from "vitest";
import { buildDutyCycle, headlandTurnArcs, type TFieldBlock } from "@/lib/duty-cycles/builder";
import { BUILDER_PRESETS } from "@/lib/duty-cycles/builder-presets";
import { toEngineDutyCycle } from "@/lib/duty-cycles/to-engine-duty-cycle";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";

const DEG = Math.PI / 180;

/** Drives a headland turn: arcs to the right unless `flip`, a straight between quarter turns. */
function drive(turn: ReturnType<typeof headlandTurnArcs>) {
  let x = 0;
  let y = 0;
  let h = 90; // heading north, counter-clockwise from east
  turn.arcs.forEach((a, i) => {
    const sign = a.flip ? 1 : -1; // the pass change is to the right (+x)
    const c = {
      x: x - sign * a.radius * Math.sin(h * DEG),
      y: y + sign * a.radius * Math.cos(h * DEG),
    };
    h += sign * a.headingChange;
    x = c.x + sign * a.radius * Math.sin(h * DEG);
    y = c.y - sign * a.radius * Math.cos(h * DEG);
    if (i === 0 && turn.arcs.length === 2) {
      const s = turn.straight - turn.reverseStraight;
      x += s * Math.cos(h * DEG);
      y += s * Math.sin(h * DEG);
    }
  });
  return { x, y, h: ((h % 360) + 360) % 360 };
}

describe("headland turns close onto the next pass", () => {
  it.each([
    ["loop", 12, 5],
    ["bulb", 6, 5.5],
    ["bulb", 3, 4],
    ["three-point", 6, 5],
    ["three-point", 14, 5],
  ] as const)("%s turn, pass spacing %d m, radius %d m", (type, w, r) => {
    const notes: string[] = [];
    const turn = headlandTurnArcs(type, w, r, notes, "test");
    const end = drive(turn);
    expect(end.x).toBeCloseTo(w, 6);
    expect(end.y).toBeCloseTo(0, 6);
    expect(end.h).toBeCloseTo(270, 6);
    for (const a of turn.arcs) expect(a.radius).toBeGreaterThanOrEqual(Math.min(r, w / 2) - 1e-9);
    expect(notes).toEqual([]);
  });

  it("switches a loop that does not fit to a bulb, and says so", () => {
    const notes: string[] = [];
    const turn = headlandTurnArcs("loop", 6, 5.5, notes, "Cultivating");
    expect(turn.arcs).toHaveLength(3);
    expect(notes[0]).toMatch(/Cultivating: a loop turn needs/);
  });

  // Three equal circles mutually tangent: their centres form an equilateral triangle, so 60°.
  it("an omega at zero spacing is the 60°-300°-60° turn of three tangent circles", () => {
    const turn = headlandTurnArcs("bulb", 0, 5, [], "t");
    expect(turn.arcs.map((a) => a.headingChange)).toEqual([
      expect.closeTo(60, 9),
      expect.closeTo(300, 9),
      expect.closeTo(60, 9),
    ]);
  });
});

describe("buildDutyCycle", () => {
  const field: TFieldBlock = {
    kind: "field",
    label: "Drilling",
    share: 1,
    surface: "loose-soil",
    runLength: 400,
    workingWidth: 12,
    workingSpeed: 10 / 3.6,
    turnSpeed: 2,
    headlandTurn: "loop",
    laden: false,
  };

  it("counts headland turns per hour from pass time and turn time", () => {
    const built = buildDutyCycle({ minTurningRadius: 5, blocks: [field] });
    // Pass 400 m at 10 km/h = 144 s; loop of radius 6 m = 6π m at 2 m/s = 9.42 s.
    const expected = 3600 / (144 + (6 * Math.PI) / 2);
    const perHour = built.turns.reduce((s, t) => s + t.perHour, 0);
    expect(perHour).toBeCloseTo(expected, 6);
    expect(built.turns.every((t) => t.radius === 6 && t.headingChange === 180)).toBe(true);
    expect(built.turns.filter((t) => t.direction === "left")).toHaveLength(1);
    expect(built.straight.distancePerHour).toBeCloseTo(expected * 400, 6);
    expect(built.straight.surfaceShares).toEqual({ "loose-soil": 1 });
  });

  it("bends on the road: share of distance over arc length", () => {
    const built = buildDutyCycle({
      minTurningRadius: 5,
      blocks: [
        {
          kind: "road",
          label: "Road",
          share: 1,
          surface: "concrete-asphalt",
          speed: 30 / 3.6,
          bendShare: 0.1,
          bendRadius: 40,
          bendAngle: 60,
          laden: true,
        },
      ],
    });
    const bends = built.turns.reduce((s, t) => s + t.perHour, 0);
    expect(bends).toBeCloseTo((0.1 * 30_000) / (40 * (Math.PI / 3)), 6);
    expect(built.straight.distancePerHour).toBeCloseTo(27_000, 6);
    expect(built.straight.ladenShare).toBeCloseTo(1, 6);
  });

  it("mixes blocks by share of hours", () => {
    const yard = BUILDER_PRESETS.find((p) => p.key === "yard-loader")!.input.blocks[0]!;
    const alone = buildDutyCycle({ minTurningRadius: 4, blocks: [yard] });
    expect(alone.turns.every((t) => t.perHour === 40)).toBe(true);
    const mixed = buildDutyCycle({
      minTurningRadius: 4,
      blocks: [
        { ...yard, share: 3 },
        { ...field, share: 1 },
      ],
    });
    const yardTurns = mixed.turns.filter((t) => t.label?.startsWith("Loading"));
    expect(yardTurns.every((t) => Math.abs(t.perHour - 30) < 1e-9)).toBe(true);
  });

  it("never goes tighter than the machine can turn", () => {
    const built = buildDutyCycle({
      minTurningRadius: 7,
      blocks: [{ ...field, workingWidth: 3, headlandTurn: "bulb" }],
    });
    expect(Math.min(...built.turns.map((t) => t.radius!))).toBeGreaterThanOrEqual(7);
  });

  it("every preset gives an engine duty cycle the engine's schema accepts", () => {
    for (const preset of BUILDER_PRESETS) {
      const built = buildDutyCycle(preset.input);
      const engine = toEngineDutyCycle({
        name: preset.name,
        turns: built.turns,
        straight: built.straight,
        mergeKinds: false,
      });
      expect(engine.turns.length).toBe(built.turns.length);
      const summary = summariseDutyCycle({
        turns: built.turns,
        straight: built.straight,
        operatingHours: null,
      });
      expect(summary.turnsPerHour).toBeGreaterThan(0);
      expect(summary.turningShare).toBeGreaterThan(0);
      expect(summary.turningShare).toBeLessThan(1);
      expect(summary.speedDistribution.reduce((s, b) => s + b.share, 0)).toBeCloseTo(1, 9);
    }
  });

  it("refuses a mix with no hours", () => {
    expect(() => buildDutyCycle({ minTurningRadius: 5, blocks: [{ ...field, share: 0 }] })).toThrow(
      /share/,
    );
  });
});

describe("share of moving time by speed from the builder", () => {
  // Plain arithmetic on the example: time at a speed = distance / speed (no source needed).
  const example = BUILDER_PRESETS.find((p) => p.key === "row-crop-cultivating")!.input;
  const withRoadShare = (road: number) => ({
    ...example,
    blocks: [
      { ...example.blocks[0]!, share: 1 - road },
      { ...example.blocks[1]!, share: road },
    ],
  });
  const bands = (road: number) => {
    const built = buildDutyCycle(withRoadShare(road));
    const summary = summariseDutyCycle({
      turns: built.turns,
      straight: built.straight,
      operatingHours: null,
      speedSeconds: built.speedSeconds,
    });
    const shareKmh = (from: number, to: number) =>
      summary.speedDistribution
        .filter((b) => b.from * 3.6 >= from - 1e-9 && b.from * 3.6 < to - 1e-9)
        .reduce((s, b) => s + b.share, 0);
    return { field: shareKmh(10, 15), road: shareKmh(25, 35) };
  };

  it("keeps 12 km/h field work in the 10–15 km/h band whatever the road share", () => {
    for (const road of [0.05, 0.15, 0.3]) expect(bands(road).field).toBeGreaterThan(0.5);
  });

  it("shows road transport at 15 % of the hours as about 15 % of moving time", () => {
    // Both blocks move all the time, so time shares follow the hour shares: 15 % on the road,
    // most of the other 85 % on the passes at 12 km/h (the headland turns are slower).
    const { road, field } = bands(0.15);
    expect(road).toBeGreaterThan(0.14);
    expect(road).toBeLessThan(0.16);
    expect(field).toBeGreaterThan(0.6);
  });
});

describe("the blocks' shares of the hours", () => {
  it("are refused unless they add up to 100 %, with the sum in the message", async () => {
    const { ZBuilderInput } = await import("@/features/duty-cycles/schemas/builder");
    const example = BUILDER_PRESETS.find((p) => p.key === "row-crop-cultivating")!.input;
    const over = {
      ...example,
      blocks: [
        { ...example.blocks[0]!, share: 0.85 },
        { ...example.blocks[1]!, share: 0.3 },
      ],
    };
    const result = ZBuilderInput.safeParse(over);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toContain("115 %");
    expect(result.error?.issues[0]?.message).toContain("100 %");
    for (const preset of BUILDER_PRESETS)
      expect(ZBuilderInput.safeParse(preset.input).success, preset.key).toBe(true);
  });
});
