import { describe, expect, it } from "vitest";
import { tyreDimensions } from "@/lib/scrub";

// Designation convention: ISO 4251-1 (agricultural tyre designation, section width / aspect
// ratio, construction, rim code); nominal D = 25.4·rim + 2·S·AR/100.
describe("tyre designations", () => {
  it("metric 480/80R46: H = 384 mm, D = 1168.4 + 768 = 1936.4 mm", () => {
    const d = tyreDimensions("480/80R46");
    expect(d).toMatchObject({
      sectionWidth: 480,
      aspectRatio: 80,
      rimDiameter: 46,
      construction: "radial",
    });
    expect(d.overallDiameter).toBeCloseTo(1936.4, 9);
  });

  it("IF and VF prefixes do not change dimensions (common practice, no source)", () => {
    const base = tyreDimensions("710/70R42");
    expect(tyreDimensions("IF710/70R42")).toMatchObject({ ...base, flexion: "IF" });
    expect(tyreDimensions("VF 710/70R42 173D")).toMatchObject({ ...base, flexion: "VF" });
  });

  it("code-inch 18.4-38 and 14.9R24 read as 85 % series (common practice, no source)", () => {
    const a = tyreDimensions("18.4-38");
    expect(a.sectionWidth).toBeCloseTo(18.4 * 25.4, 9);
    expect(a.overallDiameter).toBeCloseTo(38 * 25.4 + 2 * 0.85 * 18.4 * 25.4, 9);
    expect(a.construction).toBe("bias");
    const b = tyreDimensions("14.9R24");
    expect(b.sectionWidth).toBeCloseTo(378.46, 9);
    expect(b.construction).toBe("radial");
    // [from memory] metric equivalent 14.9R24 ≈ 380/85R24: within 1 % in diameter.
    const metric = tyreDimensions("380/85R24");
    expect(Math.abs(b.overallDiameter / metric.overallDiameter - 1)).toBeLessThan(0.01);
  });

  it("flotation 31x15.50-15 keeps its printed diameter and width", () => {
    const d = tyreDimensions("31x15.50-15");
    expect(d.overallDiameter).toBeCloseTo(31 * 25.4, 9);
    expect(d.sectionWidth).toBeCloseTo(15.5 * 25.4, 9);
    expect(d.family).toBe("flotation");
  });

  it("industrial 12-16.5 is recognised by its .5 rim code", () => {
    const d = tyreDimensions("12-16.5");
    expect(d.family).toBe("industrial");
    expect(d.rimDiameter).toBe(16.5);
    expect(d.sectionWidth).toBeCloseTo(304.8, 9);
  });

  it.each([
    ["480/8R46", /aspect ratio "8"/],
    ["48/80R46", /section width "48"/],
    ["480/80X46", /construction "X"/],
    ["480/80R99", /rim diameter "99"/],
    ["17.5L-24", /low-section/],
    ["tractor", /not a recognised size/],
    ["480/80R46 extra words", /unexpected text/],
    ["", /empty/],
  ])("%j throws an error naming the wrong part", (input, message) => {
    expect(() => tyreDimensions(input)).toThrow(message);
  });
});
