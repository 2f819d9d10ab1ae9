import { describe, expect, it } from "vitest";
import { ZMachineRecordInput } from "@/features/machines/schemas/machine";
import { toNestedErrors } from "@/features/machines/lib/form-errors";
import { DEMO_MACHINES } from "@/lib/demo/machines";

const base = DEMO_MACHINES[0]!.machine;

function errorsFor(spec: object, system: "metric" | "imperial") {
  const parsed = ZMachineRecordInput.safeParse({ customerId: null, kind: "tractor", spec });
  if (parsed.success) throw new Error("expected a validation error");
  return toNestedErrors(parsed.error, system) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
}

describe("machine form messages", () => {
  it("states engine limits in the user's units (15 m wheelbase limit = 590.55 in, NIST SP 811 factor)", () => {
    const e = errorsFor({ ...base, wheelbase: 40 }, "imperial");
    expect(e.spec.wheelbase.message).toBe("Must be at most 590.55 in.");
    const m = errorsFor({ ...base, wheelbase: 40 }, "metric");
    expect(m.spec.wheelbase.message).toBe("Must be at most 15 m.");
  });

  it("says a missing number is required and a zero one must be positive", () => {
    const missing = errorsFor({ ...base, wheelbase: undefined }, "metric");
    expect(missing.spec.wheelbase.message).toBe("Required: enter a value.");
    const zero = errorsFor(
      { ...base, axles: { ...base.axles, rear: { ...base.axles.rear, track: 0 } } },
      "metric",
    );
    expect(zero.spec.axles.rear.track.message).toBe("Must be more than 0.");
  });
});
