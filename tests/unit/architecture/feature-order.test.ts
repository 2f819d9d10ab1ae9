import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";
import FEATURE_ORDER from "@/features/order.json";

// Lints one probe file placed (virtually) inside a feature, with the project's own ESLint
// config, and returns the messages of the boundary rule. import/no-cycle is off for the probe
// only: it needs the file on disk.
async function boundaryErrors(inFeature: string, importLine: string): Promise<string[]> {
  const eslint = new ESLint({
    cwd: process.cwd(),
    overrideConfig: { rules: { "import/no-cycle": "off" } },
  });
  const [result] = await eslint.lintText(`${importLine}\nexport const probe = used;\n`, {
    filePath: `features/${inFeature}/probe.ts`,
  });
  return (result?.messages ?? [])
    .filter((m) => m.ruleId === "import/no-restricted-paths")
    .map((m) => m.message);
}

describe("the declared feature order (features/order.json, enforced by eslint.config.mjs)", () => {
  it("lists every lower feature before the ones that build on it", () => {
    const rank = (name: string) => FEATURE_ORDER.indexOf(name);
    expect(rank("customers")).toBeLessThan(rank("machines"));
    expect(rank("machines")).toBeLessThan(rank("estimates"));
    expect(rank("estimates")).toBeLessThan(rank("options"));
    expect(rank("billing")).toBeLessThan(rank("reports"));
  });

  it("fails lint when a lower feature imports a higher one (machines → estimates)", async () => {
    const errors = await boundaryErrors(
      "machines",
      'import { EstimatesTable as used } from "@/features/estimates/client";',
    );
    expect(errors.join("\n")).toMatch(/features\/machines sits below features\/estimates/);
  }, 120_000);

  it("fails lint when a feature reaches past a lower feature's entries", async () => {
    const errors = await boundaryErrors(
      "estimates",
      'import { getMachine as used } from "@/features/machines/server/get-machine";',
    );
    expect(errors.join("\n")).toMatch(/only through its public entries/);
  }, 120_000);

  it("lets a higher feature import a lower one through its entry", async () => {
    const errors = await boundaryErrors(
      "estimates",
      'import { getMachine as used } from "@/features/machines";',
    );
    expect(errors).toEqual([]);
  }, 120_000);
});
