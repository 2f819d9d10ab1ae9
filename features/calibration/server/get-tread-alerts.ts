import "server-only";
import { z } from "zod";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TTreadAlert } from "@/lib/calibration";
import { forbidden } from "@/features/calibration/server/errors";
import { DEFAULT_ALERT_HOURS, loadFleet } from "@/features/calibration/server/load-fleet";

const ZHours = z.coerce.number().int().min(1).max(5000).catch(DEFAULT_ALERT_HOURS);

/** Machines with a tread alert, for the dashboard: due within `withinHours`, fast or uneven wear. */
export async function getTreadAlerts({
  db,
  actor,
  withinHours,
}: {
  db: DbOrTx;
  actor: TActor;
  withinHours?: unknown;
}): Promise<{
  withinHours: number;
  machines: {
    machineId: string;
    machineName: string;
    customerName: string | null;
    alerts: TTreadAlert[];
  }[];
}> {
  if (!can(actor, "machine:read")) throw forbidden("tread alerts");
  const hours = ZHours.parse(withinHours ?? DEFAULT_ALERT_HOURS);
  const { fleet } = await loadFleet(db, actor, { alertWithinHours: hours });
  return {
    withinHours: hours,
    machines: fleet
      .filter((m) => m.alerts.length > 0)
      .map((m) => ({
        machineId: m.machineId,
        machineName: m.machineName,
        customerName: m.customerName,
        alerts: m.alerts,
      })),
  };
}
