/**
 * Converts a stored duty cycle into the engine's ZDutyCycle input. Detected turns from a long
 * log are merged into kinds (same direction, surface, load, travel direction, and radius,
 * heading change and speed rounded to bands) so the estimate stays quick.
 */
import { ZDutyCycle, type TDutyCycle, type TTurnInput } from "@/lib/scrub/schemas";
import type { TStoredTurn, TStraight } from "@/lib/duty-cycles/stored-duty-cycle";

const MAX_RADIUS = 10_000; // the engine's limit (m)
const MAX_SPEED = 20; // the engine's limit (m/s)

/** Rounds to a band: finer for the tight turns that scrub most. */
function radiusBand(r: number): number {
  if (r === 0) return 0;
  if (r < 10) return Math.max(0.5, Math.round(r * 2) / 2);
  if (r < 50) return Math.round(r);
  return Math.min(MAX_RADIUS, Math.round(r / 5) * 5);
}

export function toEngineDutyCycle({
  name,
  turns,
  straight,
  mergeKinds = true,
}: {
  name: string;
  turns: readonly TStoredTurn[];
  straight: TStraight;
  /** false keeps one engine turn per stored turn (schedules and builder cycles are small). */
  mergeKinds?: boolean;
}): TDutyCycle {
  const kinds = new Map<string, { turn: TTurnInput; perHour: number }>();
  for (const t of turns) {
    const radius =
      t.radius === null
        ? undefined
        : mergeKinds
          ? radiusBand(t.radius)
          : Math.min(t.radius, MAX_RADIUS);
    const headingChange = mergeKinds
      ? Math.max(5, Math.round(t.headingChange / 5) * 5)
      : t.headingChange;
    const speed = Math.min(MAX_SPEED, mergeKinds ? Math.round(t.speed * 4) / 4 : t.speed);
    const turn: TTurnInput = {
      label: t.label ?? undefined,
      direction: t.direction,
      ...(radius === undefined ? { steerInput: t.steerInput ?? 0 } : { radius }),
      headingChange,
      speed,
      surface: t.surface,
      loadState: t.loadState,
    };
    const key = mergeKinds
      ? [
          t.direction,
          radius,
          t.steerInput,
          headingChange,
          speed,
          t.surface,
          t.loadState,
          t.reverse,
          t.label,
        ].join("|")
      : String(t.seq);
    const kind = kinds.get(key);
    if (kind) kind.perHour += t.perHour;
    else kinds.set(key, { turn, perHour: t.perHour });
  }
  return ZDutyCycle.parse({
    name,
    turns: [...kinds.values()],
    straight: {
      distancePerHour: straight.distancePerHour,
      speed: Math.min(MAX_SPEED, straight.speed),
      surfaceShares: straight.surfaceShares,
      ladenShare: straight.ladenShare,
    },
  });
}
