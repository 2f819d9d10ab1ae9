import { describe, expect, it } from "vitest";
import { detectEncoding } from "@/lib/duty-cycles/detect-encoding";

// Byte values from the ISO/IEC 8859-1 and Windows-1252 code charts (ä = 0xE4, ° = 0xB0) and
// RFC 3629 for UTF-8 (ä = C3 A4).
const latin1 = (text: string) => Uint8Array.from([...text].map((c) => c.charCodeAt(0)));
const utf8 = (text: string) => new TextEncoder().encode(text);

describe("detectEncoding", () => {
  it("picks Latin-1 / Windows-1252 for a German export with single-byte umlauts and degrees", () => {
    const head = latin1("Zeit;Geschwindigkeit;Kurs (°);Breite;Länge\n0;1,2;90;52,1;9,3\n");
    expect(head.includes(0xe4)).toBe(true);
    expect(detectEncoding(head, { complete: true })).toBe("latin1");
  });

  it("keeps UTF-8 for the same header written as UTF-8, and for plain ASCII", () => {
    expect(detectEncoding(utf8("Zeit;Kurs (°);Länge\n"), { complete: true })).toBe("utf-8");
    expect(detectEncoding(utf8("time,speed\n"), { complete: true })).toBe("utf-8");
  });

  it("does not call a sample cut inside a multi-byte character invalid", () => {
    const bytes = utf8("Länge");
    const cut = bytes.subarray(0, 2); // "L" and the first byte of "ä"
    expect(detectEncoding(cut, { complete: false })).toBe("utf-8");
    expect(detectEncoding(cut, { complete: true })).toBe("latin1");
  });
});
