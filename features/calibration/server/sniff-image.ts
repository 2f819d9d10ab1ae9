/**
 * Image type from the file's first bytes, never from its name or the browser's claim:
 * JPEG starts FF D8 FF (JFIF/Exif, ISO/IEC 10918-1), PNG with its 8-byte signature (RFC 2083 §3.1).
 */
export function sniffImage(bytes: Uint8Array): "image/jpeg" | "image/png" | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff)
    return "image/jpeg";
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length >= 8 && png.every((b, i) => bytes[i] === b)) return "image/png";
  return null;
}
