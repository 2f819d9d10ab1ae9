import Link from "next/link";
import type { TPlanItem, TTreadAlert } from "@/lib/calibration";
import { Card } from "@/lib/ui/card";
import { formatDay, POSITION_NAMES } from "@/features/calibration/components/format";

/** Dashboard cards: machines flagged by their tread readings, and tyres due in the next 90 days. */
export function DashboardTread({
  alerts,
  dueSoon,
}: {
  alerts: {
    withinHours: number;
    machines: {
      machineId: string;
      machineName: string;
      customerName: string | null;
      alerts: TTreadAlert[];
    }[];
  };
  dueSoon: TPlanItem[];
}) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Card
        title={`Tread alerts (${alerts.machines.length})`}
        actions={
          <form className="flex items-center gap-2 text-sm" action="/dashboard">
            <label htmlFor="alert-hours">Due within</label>
            <input
              id="alert-hours"
              name="alertHours"
              inputMode="numeric"
              defaultValue={alerts.withinHours}
              className="h-9 w-20 rounded-md border border-ink-300 px-2"
            />
            <span>h</span>
            <button type="submit" className="h-9 rounded-md border border-ink-300 px-3">
              Apply
            </button>
          </form>
        }
      >
        {alerts.machines.length === 0 ? (
          <p className="text-ink-700">No machine is flagged by its tread readings.</p>
        ) : (
          <ul className="flex flex-col gap-3" data-testid="dashboard-alerts">
            {alerts.machines.map((m) => (
              <li key={m.machineId} className="rounded-md border border-ink-200 p-3">
                <Link
                  href={`/machines/${m.machineId}/tread`}
                  className="font-medium text-furrow-700 hover:underline"
                >
                  {m.machineName}
                </Link>
                {m.customerName ? (
                  <span className="text-sm text-ink-600"> · {m.customerName}</span>
                ) : null}
                <ul className="mt-1 text-sm">
                  {m.alerts.map((a, i) => (
                    <li key={i}>
                      {POSITION_NAMES[a.position]}: {a.message}
                      {a.causes.length ? (
                        <span className="text-ink-600">
                          {" "}
                          Check: {a.causes.slice(0, 3).join("; ")}.
                        </span>
                      ) : null}
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card
        title={`Tyres due in the next 90 days (${dueSoon.length})`}
        actions={
          <Link href="/tyre-plan" className="text-sm text-furrow-700 underline">
            Tyre plan
          </Link>
        }
      >
        {dueSoon.length === 0 ? (
          <p className="text-ink-700">No tyre is due in the next 90 days.</p>
        ) : (
          <ul className="divide-y divide-ink-100 text-sm" data-testid="dashboard-due-soon">
            {dueSoon.slice(0, 12).map((i) => (
              <li key={`${i.machineId}-${i.position}`} className="flex justify-between gap-2 py-2">
                <span>
                  {i.machineName} · {POSITION_NAMES[i.position]} · {i.designation}
                </span>
                <span>{formatDay(i.dueOn)}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
