import { describe, expect, it } from "vitest";
import { estimate, profileChecks, type TMachineInput } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";

const frontAssist = { type: "front-assist", gearRatio: 1.3 };

describe("live machine-profile checks", () => {
  it("gives the lead from data-book rolling circumferences as soon as both tyres are known", () => {
    // Lead definition (common practice, no source): λ = (RC_front · ratio − RC_rear)/RC_rear.
    // Worked by hand: (3,900 mm × 1.3 − 5,300 mm)/5,300 mm = −0.0434 (−4.3 %).
    const checks = profileChecks({
      drive: frontAssist,
      axles: {
        // Loads, prices and depths not entered yet: the lead does not need them.
        front: { load: Number.NaN, tyre: { rollingCircumference: 3900 } },
        rear: { tyre: { rollingCircumference: 5300 } },
      },
    });
    expect(checks.lead).toBeCloseTo((3900 * 1.3 - 5300) / 5300, 12);
    expect(checks.leadWarning?.code).toBe("lead-out-of-range");
    expect(checks.leadWarning?.message).toMatch(
      /^Front-axle lead is -4\.3 %, outside the common 1–5 % band/,
    );
    expect(checks.capacity).toEqual({ front: [], rear: [] });
  });

  it("says nothing while the tyres or drive are missing, and nothing for a lead within the band", () => {
    expect(profileChecks({})).toEqual({
      lead: null,
      leadWarning: null,
      capacity: { front: [], rear: [] },
    });
    expect(
      profileChecks({
        drive: frontAssist,
        axles: { front: { tyre: { designation: "380/85R24" } } },
      }).lead,
    ).toBeNull();
    // (3,900 × 1.38 − 5,200)/5,200 = +3.5 %: inside 1–5 %.
    const inBand = profileChecks({
      drive: { type: "front-assist", gearRatio: 1.38 },
      axles: {
        front: { tyre: { rollingCircumference: 3900 } },
        rear: { tyre: { rollingCircumference: 5200 } },
      },
    });
    expect(inBand.lead).toBeCloseTo(0.035, 3);
    expect(inBand.leadWarning).toBeNull();
    // Two-wheel drive: the axles are not coupled, so there is no lead at all.
    expect(
      profileChecks({
        drive: { type: "2wd", drivenAxle: "rear" },
        axles: {
          front: { tyre: { rollingCircumference: 3900 } },
          rear: { tyre: { rollingCircumference: 5300 } },
        },
      }).lead,
    ).toBeNull();
  });

  it("warns of 1,800 kg per tyre on tyres declared for 1,500 kg (half a 3,600 kg axle each)", () => {
    const checks = profileChecks({
      axles: { front: { load: 3600, tyre: { loadCapacity: 1500 } }, rear: { load: 2000 } },
    });
    expect(checks.capacity.rear).toEqual([]);
    expect(checks.capacity.front).toHaveLength(1);
    expect(checks.capacity.front[0]!.message).toMatch(
      /^front axle \(unladen\): 1,800 kg per tyre exceeds the declared 1,500 kg capacity\./,
    );
    // A laden load over capacity is reported as well, with the heavier wheel of an uneven split.
    const laden = profileChecks({
      axles: {
        rear: { load: 2000, ladenLoad: 4000, leftShare: 0.55, tyre: { loadCapacity: 2000 } },
      },
    });
    expect(laden.capacity.rear.map((w) => w.message.slice(0, 36))).toEqual([
      "rear axle (laden): 2,200 kg per tyre",
    ]);
  });

  it("agrees with the checks the estimate itself runs on a complete machine", () => {
    const demo = DEMO_MACHINES.find((m) => m.id === "row-crop-tractor")!;
    const machine: TMachineInput = structuredClone(demo.machine) as TMachineInput;
    machine.drive = { type: "front-assist", gearRatio: 1.2 };
    machine.axles.front.tyre.loadCapacity = 1000;
    const result = estimate(machine, DEMO_DUTY_CYCLES[demo.id]!);
    const checks = profileChecks(machine);
    expect(checks.lead).toBe(result.lead);
    const fromEstimate = result.warnings.filter(
      (w) => w.code === "lead-out-of-range" || w.code === "load-over-capacity",
    );
    expect([checks.leadWarning, ...checks.capacity.front, ...checks.capacity.rear]).toEqual(
      fromEstimate,
    );
    expect(fromEstimate.length).toBeGreaterThanOrEqual(2);
  });
});
