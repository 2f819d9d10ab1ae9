import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub";

export type TSurfaceMixShares = Partial<Record<TSurfaceKind, number>>;

const isSurface = (s: string): s is TSurfaceKind => ZSurfaceKind.safeParse(s).success;

export class MissingSurfaceMixError extends Error {
  constructor() {
    super(
      "This duty cycle has turns with no surface recorded: choose a site so its surface mix can be used.",
    );
  }
}

/**
 * Turns recorded without a known surface are split across the site's surface mix: one turn per
 * surface with the occurrences per hour shared out, so the number of turns per hour is unchanged.
 * Throws MissingSurfaceMixError when such a turn exists and no mix is given.
 */
export function fillSurfaces<T extends { perHour: number; surface: string }>(
  turns: readonly T[],
  mix: TSurfaceMixShares | null,
): (Omit<T, "surface"> & { surface: TSurfaceKind })[] {
  const out: (Omit<T, "surface"> & { surface: TSurfaceKind })[] = [];
  for (const turn of turns) {
    const surface = turn.surface;
    if (isSurface(surface)) {
      out.push({ ...turn, surface });
      continue;
    }
    if (!mix) throw new MissingSurfaceMixError();
    const total = Object.values(mix).reduce<number>((s, v) => s + (v ?? 0), 0);
    for (const [name, share] of Object.entries(mix) as [TSurfaceKind, number][]) {
      if (!share) continue;
      out.push({ ...turn, perHour: (turn.perHour * share) / total, surface: name });
    }
  }
  return out;
}
