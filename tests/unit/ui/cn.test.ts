import { describe, expect, it } from "vitest";
import { cn } from "@/lib/ui/cn";

describe("cn", () => {
  it("lets a caller's width replace the control's default full width", () => {
    expect(cn("block w-full", "w-40").split(" ")).toEqual(["block", "w-40"]);
  });

  it("keeps a font size and a palette colour together: they do not conflict", () => {
    const classes = cn("text-sm", "text-ink-700").split(" ");
    expect(classes).toContain("text-sm");
    expect(classes).toContain("text-ink-700");
  });

  it("drops falsy values", () => {
    expect(cn("a", false, undefined, null, "b")).toBe("a b");
  });
});
