/**
 * The stored shape of a duty cycle, the same whether it came from a telematics log, a turn
 * schedule or the builder: kinds of turn with how often they happen per operating hour, and the
 * straight travel in between.
 */
import type { TStraightTravel, TSurfaceKind } from "@/lib/scrub/schemas";

export type TStoredTurn = {
  seq: number;
  label: string | null;
  direction: "left" | "right";
  /** Path radius (m); 0 for a pivot on the spot; null when given as a steer input. */
  radius: number | null;
  steerInput: number | null;
  /** Heading change (deg, magnitude). */
  headingChange: number;
  /** Mean speed (m/s). */
  speed: number;
  perHour: number;
  surface: TSurfaceKind;
  loadState: "laden" | "unladen";
  reverse: boolean;
  /** Distance (m) and duration (s) of one occurrence, when known. */
  distance: number | null;
  duration: number | null;
  /** Telematics only: seconds from the start of the log. */
  startTime: number | null;
};

export type TStraight = Omit<TStraightTravel, "frontDrive" | "ladenShare" | "drawbarWork"> & {
  ladenShare: number;
  /** Optional field blocks under drawbar pull (engine input; absent = free rolling). */
  drawbarWork?: TStraightTravel["drawbarWork"];
};

/** Seconds spent in each speed band of SPEED_BIN_WIDTH m/s, from 0 up. */
export type TSpeedHistogram = { binWidth: number; seconds: number[] };

export const SPEED_BIN_WIDTH = 0.5;
export const SPEED_BINS = 40; // 0 to 20 m/s (72 km/h); faster goes in the last band
