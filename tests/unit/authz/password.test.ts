import { describe, expect, it } from "vitest";
import { scryptSync } from "node:crypto";
import { hashPassword, verifyPassword } from "@/lib/authz/password";

describe("scrypt password hashing", () => {
  it("matches the RFC 7914 §12 test vector for the underlying primitive", () => {
    // RFC 7914 section 12, second vector: P="password", S="NaCl", N=1024, r=8, p=16, dkLen=64.
    const key = scryptSync("password", "NaCl", 64, { N: 1024, r: 8, p: 16 });
    expect(key.toString("hex")).toBe(
      "fdbabe1c9d3472007856e7190d01e9fe7c6ad7cbc8237830e77376634b373162" +
        "2eaf30d92e22a3886ff109279d9830dac727afb94a83ee6d8360cbdfa2cc0640",
    );
  });

  it("verifies the right password and refuses a wrong one", async () => {
    const stored = await hashPassword("hedge trimmer at dawn");
    expect(stored).toMatch(/^scrypt\$32768\$8\$3\$[\w-]+\$[\w-]+$/);
    expect(await verifyPassword("hedge trimmer at dawn", stored)).toBe(true);
    expect(await verifyPassword("hedge trimmer at dusk", stored)).toBe(false);
  });

  it("salts each hash, so equal passwords give different hashes", async () => {
    expect(await hashPassword("same password")).not.toBe(await hashPassword("same password"));
  });

  it("refuses a missing or malformed stored hash", async () => {
    expect(await verifyPassword("x", null)).toBe(false);
    expect(await verifyPassword("x", "plain")).toBe(false);
    expect(await verifyPassword("x", "scrypt$1$2")).toBe(false);
  });
});
