/**
 * Reads a telematics log row by row: validates and converts each row with the column mapping,
 * feeds the turn segmenter, and keeps running totals. Holds no rows, so memory stays flat
 * however long the log is.
 */
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub/schemas";
import {
  createTurnSegmenter,
  type TDetectedTurn,
  type TSegmentOptions,
  type TTurnSample,
} from "@/lib/scrub/segment-turns";
import type { TColumnMapping, TColumnRef } from "@/lib/duty-cycles/column-mapping";
import { parseDecimal, parseTime, siFactor, formatKmh } from "@/lib/duty-cycles/units";
import { parseLoadState, parseReverse, parseSurface } from "@/lib/duty-cycles/surface-names";
import {
  ImportFailure,
  RowErrorLog,
  columnName,
  tooFewRowsFailure,
} from "@/lib/duty-cycles/row-errors";
import {
  SPEED_BIN_WIDTH,
  SPEED_BINS,
  type TSpeedHistogram,
  type TStoredTurn,
  type TStraight,
} from "@/lib/duty-cycles/stored-duty-cycle";
import type { TRowError } from "@/lib/duty-cycles/row-errors";

export type TImportResult = {
  turns: TStoredTurn[];
  straight: TStraight;
  /** Operating hours covered by the log (hour meter when mapped, else logged time). */
  operatingHours: number | null;
  rowsUsed: number;
  rowsSkipped: number;
  errors: TRowError[];
  errorCount: number;
  speedHistogram: TSpeedHistogram | null;
};

export type TRowImporter = {
  /** One parsed CSV record; `line` is its line in the file. */
  pushRow(fields: readonly string[], line: number): void;
  /** Ends the file; throws ImportFailure when it cannot make a duty cycle. */
  finish(): TImportResult;
};

export type TImportOptions = { maxStoredErrors?: number; segment?: TSegmentOptions };

const MAX_GAP = 10; // s: a longer pause in the log is not operating time (matches the segmenter)
const MAX_YAW_RATE = 360; // deg/s: faster is a sensor fault, no machine spins that fast
const MAX_ENGINE_SPEED = 20; // m/s: the engine's limit for a turn

/** What a text cell reads as when it is empty or only spaces. */
const BLANK = Symbol("blank");

/**
 * Meaning of a text cell, read once per distinct word (blank included); consecutive repeats
 * skip even the hashing.
 */
class WordCache<T> {
  private readonly known = new Map<string, T | null | typeof BLANK>();
  private lastCell: string | undefined;
  private lastValue: T | null | typeof BLANK = null;
  constructor(private readonly parse: (cell: string) => T | undefined) {}

  read(cell: string): T | null | typeof BLANK {
    if (cell === this.lastCell) return this.lastValue;
    let value = this.known.get(cell);
    if (value === undefined) {
      value = cell.trim() === "" ? BLANK : (this.parse(cell) ?? null);
      if (this.known.size < 1000) this.known.set(cell, value);
    }
    this.lastCell = cell;
    this.lastValue = value;
    return value;
  }
}

type Reader = { ref: TColumnRef; name: string; factor: number };

export function createTelematicsImporter(
  mapping: TColumnMapping,
  options: TImportOptions = {},
): TRowImporter {
  const log = new RowErrorLog(options.maxStoredErrors ?? 10_000);
  const { decimal, defaults } = mapping;
  const read = (role: keyof TColumnMapping["columns"]): Reader | undefined => {
    const ref = mapping.columns[role];
    return ref ? { ref, name: columnName(ref), factor: siFactor(ref.unit) } : undefined;
  };
  const time = read("time");
  const speed = read("speed");
  if (!time || !speed) throw new ImportFailure("Map the time and speed columns first.");
  const yaw = read("yawRate");
  const heading = read("heading");
  const steer = read("steer");
  const lat = read("lat");
  const lon = read("lon");
  const surface = read("surface");
  const load = read("load");
  const direction = read("direction");
  const hourMeter = read("hourMeter");
  const timeIsIso = time.ref.unit === "iso8601";
  // Read on every row: plain locals rather than property chains.
  const timeIndex = time.ref.index;
  const timeFactor = time.factor;
  const speedIndex = speed.ref.index;
  const speedFactor = speed.factor;
  const maxSpeed = defaults.maxSpeed;
  const widest = Math.max(...Object.values(mapping.columns).map((c) => c.index)) + 1;

  const segmenter = createTurnSegmenter({ wheelbase: defaults.wheelbase, ...options.segment });
  const detected: TDetectedTurn[] = [];
  // Running state lives in an object, not in `let`s the row function closes over: V8 boxes a
  // number kept in a closure's context, so every row would allocate a fresh one per variable.
  const run = {
    used: 0,
    prevT: NaN,
    logStart: NaN,
    prevSpeed: NaN,
    prevSurface: defaults.surface,
    prevLaden: defaults.loadState === "laden",
    seconds: NaN,
    distance: NaN,
    ladenDistance: NaN,
    prevSurfaceIndex: ZSurfaceKind.options.indexOf(defaults.surface),
    firstHours: NaN,
    lastHours: NaN,
  };
  // Doubles from the start (NaN above), so the fields never change representation.
  run.logStart = run.prevSpeed = run.seconds = run.distance = run.ladenDistance = 0;
  // Distance per surface, indexed like ZSurfaceKind.options; the index changes only with the surface.
  const surfaceDistance = new Float64Array(ZSurfaceKind.options.length);
  const histogram = new Float64Array(SPEED_BINS);

  /**
   * Numeric cell in SI units; NaN when the column is unmapped, the cell blank or not a number
   * (hasValue tells those apart, off the hot path). NaN rather than undefined keeps every value
   * a plain double: no boxed number per cell.
   */
  function numberAt(fields: readonly string[], r: Reader | undefined): number {
    return r ? parseDecimal(fields[r.ref.index]!, decimal) * r.factor : NaN;
  }
  /** Whether a cell that read as NaN holds something (so is an error, not an absent value). */
  function hasValue(fields: readonly string[], r: Reader | undefined): boolean {
    return r !== undefined && fields[r.ref.index]!.trim() !== "";
  }

  // Text cells repeat the same few words millions of times: read each distinct word once.
  const surfaceWords = new WordCache(parseSurface);
  const loadWords = new WordCache(parseLoadState);
  const reverseWords = new WordCache(parseReverse);

  const reusable: TTurnSample = {
    t: 0,
    speed: 0,
    yawRate: NaN,
    heading: NaN,
    steer: NaN,
    lat: NaN,
    lon: NaN,
    reverse: undefined,
    surface: undefined,
    laden: undefined,
  };

  function pushRow(fields: readonly string[], line: number) {
    if (fields.length < widest) {
      log.add(
        line,
        "(row)",
        `has ${fields.length} fields; the mapping needs at least ${widest}`,
        fields.join(mapping.delimiter).slice(0, 200),
      );
      return;
    }
    const tCell = fields[timeIndex]!;
    const t = timeIsIso
      ? parseTime(tCell, "iso8601", decimal)
      : parseDecimal(tCell, decimal) * timeFactor;
    if (!Number.isFinite(t))
      return log.add(line, time!.name, "is not a time in the chosen unit", tCell);
    if (t < run.prevT)
      return log.add(
        line,
        time!.name,
        `goes back in time (${(run.prevT - t).toFixed(3)} s before the row above)`,
        tCell,
      );
    if (t === run.prevT)
      return log.add(line, time!.name, "repeats the time of the row above", tCell);
    const vCell = fields[speedIndex]!;
    const v = parseDecimal(vCell, decimal) * speedFactor;
    if (!Number.isFinite(v)) return log.add(line, speed!.name, "is not a number", vCell);
    if (Math.abs(v) > maxSpeed)
      return log.add(
        line,
        speed!.name,
        `${formatKmh(Math.abs(v))} is beyond what the machine can reach (limit ${formatKmh(defaults.maxSpeed)})`,
        vCell,
      );
    // One sample object, reused for every row with a fixed shape (the segmenter keeps no reference).
    const sample = reusable;
    sample.t = t;
    sample.speed = v;
    // NaN, not undefined, marks an absent value: the fields stay plain doubles (no boxing per
    // row), and the segmenter reads NaN as absent.
    sample.yawRate = sample.heading = sample.steer = sample.lat = sample.lon = NaN;
    sample.reverse = undefined;
    // Each optional number: finite is a value, NaN in a blank cell is absent, anything else is
    // an error. The sample keeps NaN for absent values.
    const yawRate = numberAt(fields, yaw);
    if (yawRate === yawRate || hasValue(fields, yaw)) {
      if (!Number.isFinite(yawRate) || Math.abs(yawRate) > MAX_YAW_RATE)
        return log.add(
          line,
          yaw!.name,
          Number.isFinite(yawRate)
            ? `${yawRate.toFixed(0)} deg/s is not a possible yaw rate`
            : "is not a number",
          fields[yaw!.ref.index]!,
        );
      sample.yawRate = yawRate;
    }
    const h = numberAt(fields, heading);
    if (h === h || hasValue(fields, heading)) {
      if (!Number.isFinite(h) || h < -360 || h > 720)
        return log.add(
          line,
          heading!.name,
          "is not a compass heading",
          fields[heading!.ref.index]!,
        );
      sample.heading = h;
    }
    const delta = numberAt(fields, steer);
    if (delta === delta || hasValue(fields, steer)) {
      if (!Number.isFinite(delta) || Math.abs(delta) >= 89)
        return log.add(
          line,
          steer!.name,
          "is not a possible steer angle (under 89° either way)",
          fields[steer!.ref.index]!,
        );
      sample.steer = delta;
    }
    const la = numberAt(fields, lat);
    const lo = numberAt(fields, lon);
    const hasLa = la === la || hasValue(fields, lat);
    if (hasLa || lo === lo || hasValue(fields, lon)) {
      if (!hasLa || !Number.isFinite(la) || Math.abs(la) > 90)
        return log.add(
          line,
          lat!.name,
          "is not a latitude in decimal degrees",
          fields[lat!.ref.index]!,
        );
      if (!Number.isFinite(lo) || Math.abs(lo) > 180)
        return log.add(
          line,
          lon!.name,
          "is not a longitude in decimal degrees",
          fields[lon!.ref.index]!,
        );
      sample.lat = la;
      sample.lon = lo;
    }
    let surf = defaults.surface;
    if (surface) {
      const cell = fields[surface.ref.index]!;
      const s = surfaceWords.read(cell);
      if (s === null)
        return log.add(
          line,
          surface.name,
          "is not a surface we know (concrete, gravel, firm soil, loose soil, grass)",
          cell,
        );
      if (s !== BLANK) surf = s;
    }
    let laden = defaults.loadState === "laden";
    if (load) {
      const cell = fields[load.ref.index]!;
      const l = loadWords.read(cell);
      if (l === null) return log.add(line, load.name, "is not a load state (laden or empty)", cell);
      if (l !== BLANK) laden = l === "laden";
    }
    if (direction) {
      const cell = fields[direction.ref.index]!;
      const r = reverseWords.read(cell);
      if (r === null)
        return log.add(
          line,
          direction.name,
          "is not a travel direction (forward or reverse)",
          cell,
        );
      if (r !== BLANK) sample.reverse = r;
    }
    const hm = numberAt(fields, hourMeter);
    if (hm === hm || hasValue(fields, hourMeter)) {
      if (!Number.isFinite(hm) || hm < run.lastHours)
        return log.add(
          line,
          hourMeter!.name,
          Number.isFinite(hm) ? "runs backwards" : "is not a number",
          fields[hourMeter!.ref.index]!,
        );
      if (Number.isNaN(run.firstHours)) run.firstHours = hm;
      run.lastHours = hm;
    }
    sample.surface = surf;
    sample.laden = laden;

    const dt = t - run.prevT;
    if (dt > 0 && dt <= MAX_GAP) {
      const ds = ((Math.abs(run.prevSpeed) + Math.abs(v)) / 2) * dt;
      run.seconds += dt;
      run.distance += ds;
      if (run.prevLaden) run.ladenDistance += ds;
      surfaceDistance[run.prevSurfaceIndex]! += ds;
      const bin = Math.min(SPEED_BINS - 1, Math.floor(Math.abs(run.prevSpeed) / SPEED_BIN_WIDTH));
      histogram[bin]! += dt;
    }
    if (run.used === 0) run.logStart = t;
    run.prevT = t;
    run.prevSpeed = v;
    if (surf !== run.prevSurface) {
      run.prevSurface = surf;
      run.prevSurfaceIndex = ZSurfaceKind.options.indexOf(surf);
    }
    run.prevLaden = laden;
    run.used++;
    const done = segmenter.push(sample);
    if (done.length > 0) detected.push(...done);
  }

  function finish(): TImportResult {
    detected.push(...segmenter.finish());
    if (run.used < 2 || log.count > run.used) throw tooFewRowsFailure(run.used, log.count, log);
    const meterHours = run.lastHours - run.firstHours;
    const hours = Number.isFinite(meterHours) && meterHours > 0 ? meterHours : run.seconds / 3600;
    if (!(hours * 3600 >= 60))
      throw new ImportFailure(
        "The log covers less than a minute of work: upload a longer log so turns per hour mean something.",
        log.errors,
        log.count,
      );
    let turnDistance = 0;
    const turns: TStoredTurn[] = detected.map((d, i) => {
      turnDistance += d.distance;
      return {
        seq: i + 1,
        label: d.pivot ? "pivot" : null,
        direction: d.direction,
        radius: d.radius,
        steerInput: null,
        headingChange: d.headingChange,
        speed: Math.min(d.speed, MAX_ENGINE_SPEED),
        perHour: 1 / hours,
        surface: (d.surface as TSurfaceKind | undefined) ?? defaults.surface,
        loadState: d.laden === undefined ? defaults.loadState : d.laden ? "laden" : "unladen",
        reverse: d.reverse,
        distance: d.distance,
        duration: d.end - d.start,
        startTime: d.start - run.logStart,
      };
    });
    const straightDistance = Math.max(0, run.distance - turnDistance);
    const turningSeconds = detected.reduce((s, d) => s + (d.end - d.start), 0);
    const movingSeconds = histogram.reduce((s, x, i) => (i === 0 ? s : s + x), 0);
    const straightSeconds = Math.max(1, movingSeconds - turningSeconds);
    const shares: Partial<Record<TSurfaceKind, number>> = {};
    ZSurfaceKind.options.forEach((k, i) => {
      const d = surfaceDistance[i]!;
      if (d > 0) shares[k] = d / Math.max(run.distance, 1e-9);
    });
    if (Object.keys(shares).length === 0) shares[defaults.surface] = 1;
    return {
      turns,
      straight: {
        distancePerHour: straightDistance / hours,
        speed: Math.min(MAX_ENGINE_SPEED, straightDistance / straightSeconds),
        surfaceShares: shares,
        ladenShare: run.distance > 0 ? run.ladenDistance / run.distance : 0,
      },
      operatingHours: hours,
      rowsUsed: run.used,
      rowsSkipped: log.count,
      errors: log.errors,
      errorCount: log.count,
      speedHistogram: { binWidth: SPEED_BIN_WIDTH, seconds: Array.from(histogram) },
    };
  }

  return { pushRow, finish };
}
