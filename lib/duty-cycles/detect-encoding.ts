/**
 * Which text encoding a CSV export is in, from its first bytes. The WHATWG TextDecoder in fatal
 * mode refuses any byte sequence that is not UTF-8; older Windows exports (Latin-1 /
 * Windows-1252) put single bytes above 0x7F in names such as "Länge" or "Kurs (°)", which
 * UTF-8 never accepts, so a refusal means the file is Windows-1252. Pure ASCII is both.
 */
export type TTextEncoding = "utf-8" | "latin1";

export function detectEncoding(
  head: Uint8Array,
  { complete }: { complete: boolean },
): TTextEncoding {
  try {
    // stream: a sample cut inside a multi-byte character is not an error.
    new TextDecoder("utf-8", { fatal: true }).decode(head, { stream: !complete });
    return "utf-8";
  } catch {
    return "latin1";
  }
}

/** What the preview says about the encoding it picked by itself. */
export const ENCODING_DETECTED_NOTE =
  "This file is not UTF-8: it is read as Western European (Latin-1 / Windows-1252), as older Windows exports are. Change the text encoding if names still look wrong.";
