import { describe, expect, it } from "vitest";
import { safeCallbackPath } from "@/features/auth/schemas/callback-url";

// Open-redirect cases follow the OWASP Unvalidated Redirects and Forwards Cheat Sheet.
describe("safeCallbackPath", () => {
  it.each([
    ["/team", "/team"],
    ["/customers?page=2", "/customers?page=2"],
    ["http://localhost:3000/team", "/team"],
    ["https://evil.example/steal", "/steal"],
    ["//evil.example/x", "/dashboard"],
    ["/\\evil.example", "/dashboard"],
    ["javascript:alert(1)", "/dashboard"],
    ["/sign-in?x=1", "/dashboard"],
    ["/api/auth/signout", "/dashboard"],
    ["", "/dashboard"],
    [undefined, "/dashboard"],
  ])("%s → %s", (input, expected) => {
    expect(safeCallbackPath(input)).toBe(expected);
  });
});
