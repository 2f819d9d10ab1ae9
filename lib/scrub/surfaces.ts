import type { TSurfaceKind, TSurfaceOverrides, TSurfaceProperties } from "./schemas";

/**
 * Default surface table. Friction: lateral sliding friction of rubber tyres, mid values of the
 * ranges in PHYSICS.md §4.2 [M/J: calibrate]. Abrasion: multiplier on the wear coefficient
 * relative to concrete/asphalt, mid values of PHYSICS.md §6.6 [J: no published source; the
 * ranking hard > gravel-cutting > soil is trade practice]. Grass is a judgement placeholder [J].
 * Users override any value per duty cycle (`dutyCycle.surfaces`).
 */
export const DEFAULT_SURFACES: Readonly<Record<TSurfaceKind, TSurfaceProperties>> = {
  /** μ 0.7–0.9 [M/J]; reference abrasion 1. */
  "concrete-asphalt": { friction: 0.8, abrasion: 1 },
  /** μ 0.5–0.7 [M/J]; abrasion 1.5–3 (cutting/chipping not captured by energy laws) [J]. */
  gravel: { friction: 0.6, abrasion: 2 },
  /** μ 0.5–0.7 [M/J]; abrasion 0.2–0.5 [J]. */
  "firm-soil": { friction: 0.6, abrasion: 0.35 },
  /** μ 0.3–0.5 [M/J]; abrasion 0.05–0.2 [J]. */
  "loose-soil": { friction: 0.4, abrasion: 0.1 },
  /** Judgement placeholders [J]: grass is slippery and barely abrasive. */
  grass: { friction: 0.45, abrasion: 0.1 },
};

export const SURFACE_KINDS = Object.keys(DEFAULT_SURFACES) as TSurfaceKind[];

/** Default table with the user's overrides applied. */
export function resolveSurfaces(
  overrides: TSurfaceOverrides | undefined,
): Record<TSurfaceKind, TSurfaceProperties> {
  const out = { ...DEFAULT_SURFACES } as Record<TSurfaceKind, TSurfaceProperties>;
  for (const kind of SURFACE_KINDS) {
    const o = overrides?.[kind];
    if (o) out[kind] = { ...DEFAULT_SURFACES[kind], ...o };
  }
  return out;
}
