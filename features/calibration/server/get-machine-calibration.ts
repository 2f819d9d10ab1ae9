import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TMachineInput } from "@/lib/scrub";
import { loadMachine } from "@/features/calibration/server/load-machine";
import { listReadings } from "@/features/calibration/server/list-readings";
import { loadFleet } from "@/features/calibration/server/load-fleet";
import { dealershipCurrency } from "@/features/calibration/server/dealership-currency";
import type { TMachineCalibrationDto } from "@/features/calibration/schemas/calibration";

/**
 * A machine's readings, its calibration (own, pooled or refused, with the data behind it), the
 * model's wear per position calibrated and not, its plan and its alerts.
 */
export async function getMachineCalibration({
  db,
  actor,
  machineId,
}: {
  db: DbOrTx;
  actor: TActor;
  machineId: string;
}): Promise<TMachineCalibrationDto> {
  const { machine } = await loadMachine(db, actor, machineId, "read");
  const [readings, { fleet, basis }, currency] = await Promise.all([
    listReadings({ db, actor, machineId: machine.id }),
    loadFleet(db, actor),
    dealershipCurrency(db, actor.dealershipId),
  ]);
  const mine = fleet.find((m) => m.machineId === machine.id);
  const axles = (machine.spec as Partial<TMachineInput> | null)?.axles;
  return {
    machine: { id: machine.id, name: machine.name, customerId: machine.customerId },
    canWrite: can(actor, "machine:write", machine),
    currency,
    tyres:
      axles?.front?.tyre && axles.rear?.tyre
        ? { front: axles.front.tyre, rear: axles.rear.tyre }
        : null,
    readings,
    basis: basis.get(machine.id) ?? null,
    fleet: mine ?? null,
  };
}
