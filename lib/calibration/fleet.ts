import { positionAlerts, type TTreadAlert } from "./alerts";
import { predictPositions, type TPositionBasis, type TPositionPrediction } from "./apply";
import { calibrateFleet, poolKeyOf, type TCalibration } from "./choose";
import { wearIntervals, type TReadingPoint } from "./intervals";
import { planPosition, type TPlanItem } from "./plan";
import { UNCALIBRATED, type TMultipliers, type TWearComponents, type TTyrePosition } from "./types";
import { hoursPerWeek } from "./usage";

export type TFleetMachineInput = {
  machineId: string;
  machineName: string;
  customerId: string | null;
  customerName: string | null;
  /** Per-position model wear from the machine's latest estimate; null when it has none. */
  positions: TPositionBasis[] | null;
  /** Tyre sizes per position from the machine's spec (used when there is no estimate). */
  designations: Record<
    TTyrePosition,
    { designation: string; price: number; treadDepthReplace: number }
  >;
  surfaceShares: Partial<Record<string, number>>;
  readings: TReadingPoint[];
};

export type TFleetMachine = {
  machineId: string;
  machineName: string;
  customerId: string | null;
  customerName: string | null;
  calibration: TCalibration | null;
  multipliers: TMultipliers;
  calibrated: boolean;
  uncalibrated: TPositionPrediction[];
  predicted: TPositionPrediction[];
  hoursPerWeek: number | null;
  plan: TPlanItem[];
  alerts: TTreadAlert[];
};

const POSITIONS: readonly TTyrePosition[] = [
  "front-left",
  "front-right",
  "rear-left",
  "rear-right",
];

/**
 * Calibrates, predicts, plans and checks every machine of a dealership in one pass: the machine's
 * own fit, else its pool's (same tyre sizes and surface mix), else the model as published.
 */
export function computeFleet(
  machines: readonly TFleetMachineInput[],
  { alertWithinHours }: { alertWithinHours: number },
): TFleetMachine[] {
  const withBasis = machines.filter((m) => m.positions);
  const calibrations = calibrateFleet(
    withBasis.map((m) => {
      const components = Object.fromEntries(
        m.positions!.map((p) => [p.position, p.components]),
      ) as Partial<Record<TTyrePosition, TWearComponents>>;
      return {
        machineId: m.machineId,
        poolKey: poolKeyOf(
          m.positions!.map((p) => p.designation),
          m.surfaceShares,
        ),
        intervals: wearIntervals(m.machineId, m.readings, components),
      };
    }),
  );
  return machines.map((m) => {
    const calibration = calibrations.get(m.machineId) ?? null;
    const calibrated = calibration !== null && calibration.source !== "none";
    const multipliers = calibrated ? calibration.multipliers : UNCALIBRATED;
    const uncalibrated = m.positions ? predictPositions(m.positions, UNCALIBRATED) : [];
    const predicted = m.positions ? predictPositions(m.positions, multipliers) : [];
    const usage = hoursPerWeek(m.readings);
    const plan = POSITIONS.map((position) => {
      const p = predicted.find((x) => x.position === position);
      const spec = m.designations[position];
      return planPosition({
        machineId: m.machineId,
        machineName: m.machineName,
        customerId: m.customerId,
        customerName: m.customerName,
        position,
        designation: spec.designation,
        price: spec.price,
        treadDepthReplace: spec.treadDepthReplace,
        wearPer100h: p ? p.wearPer100h.total : null,
        calibrated,
        readings: m.readings,
        hoursPerWeek: usage,
      });
    });
    const alerts = plan.flatMap((item) => {
      const p = predicted.find((x) => x.position === item.position);
      return positionAlerts({
        position: item.position,
        readings: m.readings,
        wearPer100h: p?.wearPer100h.total ?? 0,
        hoursLeft: item.hoursLeft,
        withinHours: alertWithinHours,
      });
    });
    return {
      machineId: m.machineId,
      machineName: m.machineName,
      customerId: m.customerId,
      customerName: m.customerName,
      calibration,
      multipliers,
      calibrated,
      uncalibrated,
      predicted,
      hoursPerWeek: usage,
      plan,
      alerts,
    };
  });
}
