import type { TTreadAlert } from "@/lib/calibration";
import { Caution } from "@/lib/ui/caution";
import { POSITION_NAMES } from "@/features/calibration/components/format";

/** Tread alerts with the trade's usual causes to check, and the standing deferral to the makers. */
export function AlertList({ alerts }: { alerts: readonly TTreadAlert[] }) {
  if (alerts.length === 0) return null;
  return (
    <div className="flex flex-col gap-2" data-testid="tread-alerts">
      {alerts.map((a, i) => (
        <Caution
          key={i}
          tone={a.kind === "due-soon" ? "caution" : "danger"}
          title={`${POSITION_NAMES[a.position]}: ${a.message}`}
        >
          {a.causes.length ? (
            <>
              <p>Usual causes to check:</p>
              <ul className="ml-5 list-disc">
                {a.causes.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </>
          ) : null}
        </Caution>
      ))}
      <p className="text-xs text-ink-600">
        Check pressures, loads and alignment against the tyre and machine makers&apos; data before
        changing anything; have large tyres mounted by trained fitters.
      </p>
    </div>
  );
}
