import { describe, expect, it } from "vitest";
import config from "@/tailwind.config";

/**
 * WCAG 2.1 relative luminance and contrast ratio (W3C, "Web Content Accessibility Guidelines
 * 2.1", definitions of relative luminance and contrast ratio; success criterion 1.4.3 asks
 * 4.5:1 for body text).
 */
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const [r, g, b] = channels.map((c) =>
    c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4,
  ) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

const colors = config.theme?.extend?.colors as Record<string, Record<string, string>>;
const c = (name: string, shade: number) => {
  const value = colors[name]?.[String(shade)];
  if (!value) throw new Error(`missing colour ${name}-${shade}`);
  return value;
};

describe("palette contrast (WCAG 2.1 AA, 4.5:1 for text)", () => {
  it("checks the formula against the WCAG extremes: black on white is 21:1", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
  });

  const pairs: [string, string, string][] = [
    ["body text on page", c("ink", 900), c("ink", 50)],
    ["secondary text on white", c("ink", 600), "#ffffff"],
    ["hint text on page", c("ink", 600), c("ink", 50)],
    ["button label on primary", "#ffffff", c("furrow", 600)],
    ["button label on primary hover", "#ffffff", c("furrow", 700)],
    ["link on white", c("furrow", 700), "#ffffff"],
    ["caution text on caution tint", c("caution", 800), c("caution", 50)],
    ["error text on white", c("danger", 700), "#ffffff"],
    ["error text on danger tint", c("danger", 700), c("danger", 50)],
    ["danger button label", "#ffffff", c("danger", 600)],
    ["success text on tint", c("ok", 700), c("ok", 50)],
    ["info text on tint", c("furrow", 800), c("furrow", 50)],
    ["table header text", c("ink", 700), c("ink", 100)],
  ];
  it.each(pairs)("%s reaches 4.5:1", (_label, fg, bg) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
