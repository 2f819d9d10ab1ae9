import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { csvLine } from "@/lib/duty-cycles/csv-export";
import { getTyrePlan } from "@/features/calibration/server/get-tyre-plan";

const STATUS_WORDS: Record<string, string> = {
  planned: "planned",
  "due-now": "due now",
  "no-reading": "no reading yet",
  "no-usage": "hour meter read too rarely for a date",
  "no-wear": "no wear predicted",
  "no-estimate": "no estimate yet",
};

/** The plan as CSV: one row per tyre position, formula-safe, units and currency in the headers. */
export async function exportTyrePlanCsv({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query?: unknown;
}): Promise<string> {
  const plan = await getTyrePlan({ db, actor, query });
  const header = [
    "customer",
    "machine",
    "position",
    "tyre size",
    "status",
    "calibrated",
    "last reading",
    "hour meter at last reading (h)",
    "depth now (mm)",
    "hours left (h)",
    "due at hour meter (h)",
    "due on",
    `tyre price (${plan.currency})`,
  ];
  const rows = plan.items.map((i) => [
    i.customerName,
    i.machineName,
    i.position,
    i.designation,
    STATUS_WORDS[i.status] ?? i.status,
    i.calibrated ? "yes" : "no",
    i.lastReadOn,
    i.lastHourMeter,
    i.depthNow === null ? null : Math.round(i.depthNow * 10) / 10,
    i.hoursLeft === null ? null : Math.round(i.hoursLeft),
    i.dueHourMeter === null ? null : Math.round(i.dueHourMeter),
    i.dueOn,
    i.price,
  ]);
  return [header, ...rows].map((r) => csvLine(r)).join("");
}
