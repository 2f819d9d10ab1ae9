/** Degree/radian conversion: degrees at the public boundary, radians inside. */
export const DEG = Math.PI / 180;

export function toRadians(degrees: number): number {
  return degrees * DEG;
}

export function toDegrees(radians: number): number {
  return radians / DEG;
}
