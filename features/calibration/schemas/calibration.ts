import type { TFleetMachine, TOrderLine, TPlanItem } from "@/lib/calibration";
import type { TReadingDto } from "@/features/calibration/schemas/reading";

export type TMachineCalibrationDto = {
  machine: { id: string; name: string; customerId: string | null };
  canWrite: boolean;
  currency: string;
  tyres: Record<"front" | "rear", { treadDepthNew: number; treadDepthReplace: number }> | null;
  readings: TReadingDto[];
  /** The estimate whose per-position wear the fit scales; null before any estimate is run. */
  basis: { estimateId: string; createdAt: string } | null;
  /** Null for a dealership template (no customer, no readings). */
  fleet: TFleetMachine | null;
};

export type TTyrePlanDto = {
  currency: string;
  today: string;
  /** Last day of the order table and the timeline. */
  until: string;
  items: TPlanItem[];
  orders: TOrderLine[];
  dueSoon: TPlanItem[];
  machines: {
    machineId: string;
    machineName: string;
    customerName: string | null;
    calibrated: boolean;
    hoursPerWeek: number | null;
  }[];
};
