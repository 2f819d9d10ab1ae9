import { currentFitment, meanDepth, type TReadingPoint } from "./intervals";
import type { TTyrePosition } from "./types";
import { dayNumber, isoFromDayNumber } from "./usage";

export type TPlanPositionInput = {
  machineId: string;
  machineName: string;
  customerId: string | null;
  customerName: string | null;
  position: TTyrePosition;
  designation: string;
  price: number;
  treadDepthReplace: number;
  /** Predicted wear in mm per 100 h (calibrated where a calibration exists); null: no estimate. */
  wearPer100h: number | null;
  calibrated: boolean;
  /** Every reading of the machine; the position's current fitment is picked out here. */
  readings: readonly TReadingPoint[];
  /** The machine's usage rate, or null when the hour meter has not been read often enough. */
  hoursPerWeek: number | null;
};

export type TPlanStatus =
  "planned" | "due-now" | "no-reading" | "no-usage" | "no-wear" | "no-estimate";

export type TPlanItem = {
  machineId: string;
  machineName: string;
  customerId: string | null;
  customerName: string | null;
  position: TTyrePosition;
  designation: string;
  price: number;
  calibrated: boolean;
  status: TPlanStatus;
  lastReadOn: string | null;
  lastHourMeter: number | null;
  depthNow: number | null;
  /** Operating hours left before the replacement depth. */
  hoursLeft: number | null;
  dueHourMeter: number | null;
  /** yyyy-mm-dd, projected with the usage rate. */
  dueOn: string | null;
};

/**
 * When a position reaches its replacement depth: hours left = (depth now − replacement depth) ÷
 * wear rate, projected from the last reading's date at the machine's hours per week.
 */
export function planPosition(p: TPlanPositionInput): TPlanItem {
  const fitment = currentFitment(p.readings, p.position);
  const last = fitment.at(-1) ?? null;
  const base: TPlanItem = {
    machineId: p.machineId,
    machineName: p.machineName,
    customerId: p.customerId,
    customerName: p.customerName,
    position: p.position,
    designation: fitment[0]?.designation || p.designation,
    price: p.price,
    calibrated: p.calibrated,
    status: "no-reading",
    lastReadOn: last?.measuredOn ?? null,
    lastHourMeter: last?.hourMeter ?? null,
    depthNow: last ? meanDepth(last) : null,
    hoursLeft: null,
    dueHourMeter: null,
    dueOn: null,
  };
  if (!last) return base;
  const remaining = meanDepth(last) - p.treadDepthReplace;
  if (remaining <= 0) {
    return {
      ...base,
      status: "due-now",
      hoursLeft: 0,
      dueHourMeter: last.hourMeter,
      dueOn: last.measuredOn,
    };
  }
  if (p.wearPer100h === null) return { ...base, status: "no-estimate" };
  if (!(p.wearPer100h > 0)) return { ...base, status: "no-wear" };
  const hoursLeft = (remaining / p.wearPer100h) * 100;
  const withHours = { ...base, hoursLeft, dueHourMeter: last.hourMeter + hoursLeft };
  if (!p.hoursPerWeek) return { ...withHours, status: "no-usage" };
  const days = (hoursLeft / p.hoursPerWeek) * 7;
  return {
    ...withHours,
    status: "planned",
    dueOn: isoFromDayNumber(dayNumber(last.measuredOn) + Math.floor(days)),
  };
}

export type TOrderLine = {
  month: string; // yyyy-mm
  designation: string;
  count: number;
  unitPrice: number;
  total: number;
};

/** Tyres to order per month (by due date), within [from, until] inclusive. */
export function monthlyOrders(items: readonly TPlanItem[], from: string, until: string) {
  const lines = new Map<string, TOrderLine>();
  for (const it of items) {
    if (!it.dueOn) continue;
    // Overdue tyres are ordered in the first month of the plan.
    const on = it.dueOn < from ? from : it.dueOn;
    if (on > until) continue;
    const month = on.slice(0, 7);
    const key = `${month}|${it.designation}|${it.price}`;
    const line = lines.get(key) ?? {
      month,
      designation: it.designation,
      count: 0,
      unitPrice: it.price,
      total: 0,
    };
    line.count += 1;
    line.total += it.price;
    lines.set(key, line);
  }
  return [...lines.values()].sort(
    (a, b) => a.month.localeCompare(b.month) || a.designation.localeCompare(b.designation),
  );
}

/** Positions due on or before `until` (overdue included), soonest first. */
export function dueBy(items: readonly TPlanItem[], until: string) {
  return items
    .filter((i) => i.dueOn !== null && i.dueOn <= until)
    .sort((a, b) => a.dueOn!.localeCompare(b.dueOn!));
}

export const addDays = (isoDate: string, days: number) =>
  isoFromDayNumber(dayNumber(isoDate) + days);
