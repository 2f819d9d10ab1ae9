/**
 * Golden dataset: the full estimate of each invented demo machine over its demo duty cycle is
 * stored in tests/golden/<id>.json, so any change in results is deliberate.
 * Regenerate on purpose (and bump ENGINE_VERSION when results change):
 *   UPDATE_GOLDEN=1 npx vitest run --project unit tests/unit/scrub/golden.test.ts
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { estimate } from "@/lib/scrub";
import { UPDATE_GOLDEN } from "../../support/update-golden";

const GOLDEN_DIR = path.resolve(__dirname, "../../golden");

/** Round to 10 significant digits (last-bit differences of Math.* across platforms) and keep
 * NaN / ±Infinity visible, which JSON would otherwise turn into null. */
function normalise(value: unknown): unknown {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) return String(value);
    return value === 0 ? 0 : Number(value.toPrecision(10));
  }
  if (Array.isArray(value)) return value.map(normalise);
  if (value && typeof value === "object") {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, normalise(v)]));
  }
  return value;
}

describe("golden estimates of the demo machines", () => {
  it.each(DEMO_MACHINES.map((d) => [d.id, d] as const))("%s", (id, demo) => {
    const dutyCycle = DEMO_DUTY_CYCLES[id];
    expect(dutyCycle, `demo duty cycle for ${id}`).toBeDefined();
    const actual = normalise({
      machine: demo.machine,
      dutyCycle,
      estimate: estimate(demo.machine, dutyCycle!),
    });
    const file = path.join(GOLDEN_DIR, `${id}.json`);
    if (UPDATE_GOLDEN) {
      mkdirSync(GOLDEN_DIR, { recursive: true });
      writeFileSync(file, `${JSON.stringify(actual, null, 2)}\n`);
    }
    expect(existsSync(file), `${file} missing: run with UPDATE_GOLDEN=1`).toBe(true);
    expect(actual).toEqual(JSON.parse(readFileSync(file, "utf8")));
  });
});
