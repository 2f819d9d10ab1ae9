import { describe, expect, it } from "vitest";
import { minimumTurningDiameter, ZMachine, type TMachine, type TMachineInput } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { idealOuter, lockCurve, planView } from "@/features/machines/lib/steer-geometry";

const RAD = Math.PI / 180;
const demo = (id: string) => DEMO_MACHINES.find((m) => m.id === id)!.machine;
const machine = (input: TMachineInput): TMachine => ZMachine.parse(input);
const withSteering = (base: TMachineInput, steering: TMachineInput["steering"]) =>
  machine({ ...base, steering });

/** Distance from point (cx, cy) to the spin axis of a wheel at (x, y) heading h. */
function offAxis(w: { x: number; y: number; heading: number }, c: { x: number; y: number }) {
  // Spin axis direction (−sin h, cos h); the heading vector (cos h, sin h) is its normal.
  return Math.abs(
    (c.x - w.x) * Math.cos(w.heading * RAD) + (c.y - w.y) * Math.sin(w.heading * RAD),
  );
}

describe("plan-view geometry", () => {
  it("ideal front steer: both front spin axes meet the rear-axle line at one point (Ackermann condition, Wikipedia 'Ackermann steering geometry')", () => {
    const m = withSteering(demo("row-crop-tractor"), { layout: "ideal", maxLock: 52 });
    for (const inner of [5, 20, 40, 52]) {
      const v = planView(m, inner);
      expect(v.centres).toHaveLength(1);
      // cot δo − cot δi = T_k / L
      const outer = v.wheels.find((w) => w.position === "front-right")!.heading;
      const Tk = m.axles.front.pivotTrack ?? m.axles.front.track;
      expect(1 / Math.tan(outer * RAD) - 1 / Math.tan(inner * RAD)).toBeCloseTo(
        Tk / m.wheelbase,
        9,
      );
    }
  });

  it("turning diameter follows the SAE J695 form TD = 2(L / sin δo + r_s)", () => {
    const m = withSteering(demo("row-crop-tractor"), { layout: "ideal", maxLock: 52 });
    const v = planView(m, 52);
    const L = m.wheelbase;
    const Tk = m.axles.front.pivotTrack!;
    const rs = (m.axles.front.track - Tk) / 2;
    const outer = idealOuter(L, Tk, 52);
    expect(v.turningDiameter).toBeCloseTo(2 * (L / Math.sin(outer * RAD) + rs), 9);
  });

  it("for ideal geometry the plan view's full-lock diameter matches the engine's solved one", () => {
    const m = withSteering(demo("row-crop-tractor"), { layout: "ideal", maxLock: 50 });
    const engine = minimumTurningDiameter({ machine: m });
    expect(engine).not.toBeNull();
    expect(planView(m, 50).turningDiameter!).toBeCloseTo(engine!, 2);
  });

  it("parallel steer: the two front wheels give two different centres", () => {
    const m = withSteering(demo("row-crop-tractor"), { layout: "parallel", maxLock: 45 });
    const v = planView(m, 30);
    expect(v.centres).toHaveLength(2);
    expect(v.wheels[0]!.heading).toBe(v.wheels[1]!.heading);
  });

  it.each(["articulated-loader", "turntable-wagon", "wheeled-skid-steer"])(
    "%s: every wheel's spin axis passes through the one turning centre (no-slip kinematics)",
    (id) => {
      const m = machine(demo(id));
      const input = id === "wheeled-skid-steer" ? 3 : 25;
      const v = planView(m, input);
      expect(v.centres).toHaveLength(1);
      for (const w of v.wheels) {
        if (id === "wheeled-skid-steer" && Math.abs(w.x) > 1e-9) continue; // skid wheels slip by design
        expect(offAxis(w, v.centres[0]!), w.position).toBeLessThan(1e-9);
      }
    },
  );

  it("four-wheel Ackermann steer: all four spin axes meet at one centre, rear wheels steer opposite", () => {
    const m = withSteering(demo("telehandler"), {
      layout: "four-wheel",
      maxLock: 40,
      rearRatio: 1,
      wheelAngles: "ackermann",
    });
    const v = planView(m, 30);
    // The wheels steer about their pivots, so the check uses the pivot points.
    const kf = (m.axles.front.pivotTrack ?? m.axles.front.track) / 2;
    const kr = (m.axles.rear.pivotTrack ?? m.axles.rear.track) / 2;
    for (const w of v.wheels) {
      const pivotY =
        (w.position.startsWith("front") ? kf : kr) * (w.position.endsWith("left") ? 1 : -1);
      expect(offAxis({ ...w, y: pivotY }, v.centres[0]!), w.position).toBeLessThan(1e-9);
    }
    expect(v.wheels.find((w) => w.position === "rear-left")!.heading).toBeLessThan(0);
  });

  it("turntable: centre on the rear-axle line at L / tan θ (fifth-wheel geometry, PHYSICS.md §1.4)", () => {
    const m = machine(demo("turntable-wagon"));
    const v = planView(m, 30);
    expect(v.centres[0]!.y).toBeCloseTo(m.wheelbase / Math.tan(30 * RAD), 9);
  });

  it("crab steer has no turning centre and no turning diameter", () => {
    const m = withSteering(demo("telehandler"), {
      layout: "crab",
      maxLock: 30,
      wheelAngles: "parallel",
    });
    const v = planView(m, 20);
    expect(v.centres).toEqual([]);
    expect(v.turningDiameter).toBeNull();
    expect(v.wheels.every((w) => w.heading === 20)).toBe(true);
  });
});

describe("lock-range curve and percent Ackermann (toe-out-difference definition, Milliken & Milliken RCVD, from memory)", () => {
  it("ideal gives 100 %, parallel 0 %", () => {
    expect(
      lockCurve(withSteering(demo("row-crop-tractor"), { layout: "ideal", maxLock: 50 }))!
        .percentAckermannAtFullLock,
    ).toBeCloseTo(100, 9);
    expect(
      lockCurve(withSteering(demo("row-crop-tractor"), { layout: "parallel", maxLock: 50 }))!
        .percentAckermannAtFullLock,
    ).toBeCloseTo(0, 9);
  });

  it("a trapezoid linkage sits between parallel and ideal over the lock range", () => {
    const curve = lockCurve(machine(demo("row-crop-tractor")))!;
    expect(curve.points).toHaveLength(41);
    for (const p of curve.points.slice(1)) {
      expect(p.outer).not.toBeNull();
      expect(p.outer!).toBeLessThan(p.inner);
    }
    expect(curve.percentAckermannAtFullLock!).toBeGreaterThan(0);
  });

  it("layouts without an inner/outer pair have no lock curve", () => {
    expect(lockCurve(machine(demo("articulated-loader")))).toBeNull();
    expect(lockCurve(machine(demo("turntable-wagon")))).toBeNull();
    expect(lockCurve(machine(demo("wheeled-skid-steer")))).toBeNull();
  });
});
