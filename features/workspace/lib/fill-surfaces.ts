import {
  ZSurfaceKind,
  type TDutyCycleInput,
  type TSurfaceKind,
  type TTurnInput,
} from "@/lib/scrub";

/** A turn kind as stored: its surface may be a name the engine does not know ("" or "unknown"). */
export type TTurnWithOptionalSurface = {
  perHour: number;
  turn: Omit<TTurnInput, "surface"> & { surface: string };
};

const isSurface = (s: string): s is TSurfaceKind => ZSurfaceKind.safeParse(s).success;

/**
 * Turns logged without a known surface are split across the site's surface mix: one turn kind per
 * surface with the occurrences per hour shared out, so the total number of turns is unchanged.
 * Throws when such a turn exists and no mix is given.
 */
export function fillSurfaces(
  turns: TTurnWithOptionalSurface[],
  mix: Partial<Record<TSurfaceKind, number>> | null,
): TDutyCycleInput["turns"] {
  const out: TDutyCycleInput["turns"] = [];
  for (const kind of turns) {
    const surface = kind.turn.surface;
    if (isSurface(surface)) {
      out.push({ ...kind, turn: { ...kind.turn, surface } });
      continue;
    }
    if (!mix) throw new MissingSurfaceMixError();
    const total = Object.values(mix).reduce<number>((s, v) => s + (v ?? 0), 0);
    for (const [name, share] of Object.entries(mix) as [TSurfaceKind, number][]) {
      if (!share) continue;
      out.push({
        perHour: (kind.perHour * share) / total,
        turn: { ...kind.turn, surface: name },
      });
    }
  }
  return out;
}

export class MissingSurfaceMixError extends Error {
  constructor() {
    super(
      "This duty cycle has turns with no surface recorded: choose a site so its surface mix can be used.",
    );
  }
}
