/**
 * Turn detection in a machine's telematics log: heading from yaw rate, steer angle, compass or
 * GPS positions; smoothing; segmentation into turns with heading change, mean radius, speed and
 * distance. Streaming: `createTurnSegmenter` takes samples one at a time and keeps only a few
 * seconds of them, so a log of millions of rows runs in constant memory. Method: docs/turn-detection.md.
 *
 * Sign conventions: heading change and yaw rate are positive to the left (counter-clockwise seen
 * from above, ISO 8855 z up); compass heading and GPS bearing are clockwise from north; steer
 * angle is positive to the left. A negative speed means the machine is reversing.
 */
import { fitHeadingRamp } from "./fit-heading-ramp";
import { fitArcToFixes, interpolate, type TFixPoints } from "./gps-arc";

/**
 * One telematics sample: s, m/s (negative when reversing), deg/s, deg, deg, decimal degrees.
 * An optional value that is undefined or not finite (NaN) counts as absent.
 */
export type TTurnSample = {
  t: number;
  speed: number;
  yawRate?: number;
  heading?: number;
  steer?: number;
  lat?: number;
  lon?: number;
  /** Reversing, when the log has a gear/direction column instead of a signed speed. */
  reverse?: boolean;
  /** Carried through to the turn that starts at this sample (surface name). */
  surface?: string;
  /** Carried through to the turn that starts at this sample. */
  laden?: boolean;
};

/** A detected turn: times in s, heading change in deg (magnitude), radius in m, speed in m/s. */
export type TDetectedTurn = {
  start: number;
  end: number;
  headingChange: number;
  /** Mean path radius = distance / heading change (rad); 0 for a pivot turn on the spot. */
  radius: number;
  /** Mean speed over the turn (m/s, magnitude). */
  speed: number;
  /** Distance travelled during the turn (m). */
  distance: number;
  direction: "left" | "right";
  /** More than half of the turn's distance was driven in reverse. */
  reverse: boolean;
  pivot: boolean;
  surface?: string;
  laden?: boolean;
};

export type TSegmentOptions = {
  /** Wheelbase (m), needed to turn a steer angle into a yaw rate (v·tanδ/L). */
  wheelbase?: number;
  /** Centred smoothing window for the yaw rate (s). */
  smoothingWindow?: number;
  /** Smoothed yaw rate above which the machine counts as turning (deg/s). */
  yawThreshold?: number;
  /** Turns with a smaller heading change are ignored (deg). */
  minHeadingChange?: number;
  /** A quiet spell shorter than this inside a turn does not end it (s). */
  mergeGap?: number;
  /** A time step longer than this is a gap in the log: any open turn ends there (s). */
  maxGap?: number;
  /** GPS course is taken over at least this distance, so jitter at low speed does not turn it (m). */
  gpsBaseline?: number;
  /** Below this speed GPS positions do not update the course (m/s). */
  gpsMinSpeed?: number;
  /** A turn whose mean speed is below this, or radius below pivotRadius, is a pivot turn. */
  pivotSpeed?: number;
  pivotRadius?: number;
};

const DEFAULTS: Required<Omit<TSegmentOptions, "wheelbase">> = {
  smoothingWindow: 2,
  yawThreshold: 3,
  minHeadingChange: 20,
  mergeGap: 1.5,
  maxGap: 10,
  gpsBaseline: 4,
  gpsMinSpeed: 0.3,
  pivotSpeed: 0.15,
  pivotRadius: 0.3,
};

const DEG = Math.PI / 180;
/** Course points closer than this share of the GPS baseline are thinned out before fitting. */
const COURSE_POINT_SPACING = 1 / 8;
/** Run-in and run-out kept around a GPS turn for the arc fit, in GPS baselines. */
const FIT_MARGIN = 3;
/**
 * GPS fixes kept around a turn for the fit to the positions: this far (m), and at least this
 * many fixes, each side. The straights fix the tangent lines, whose place at the corner sets
 * the radius: a longer run-in and run-out narrows the radius several times more than the
 * course points' margin would (the fix history stops at the previous turn, and the run-out at
 * the next one, so nothing of another turn gets in).
 */
const FIX_MARGIN = 30;
const FIX_MARGIN_COUNT = 20;
/** A turn waiting for its run-out is measured at the latest this long after it ended (s). */
const RUN_OUT_WAIT = 30;
/** Positions kept for the GPS course chord; at very slow speed the chord is simply shorter. */
const POSITION_RING = 512;
const EARTH_RADIUS = 6_371_008.8; // mean Earth radius (m), IUGG

/** Wraps an angle difference to [-180, 180). */
export function wrapDegrees(d: number): number {
  return ((((d + 180) % 360) + 360) % 360) - 180;
}

/** A sample after heading extraction: increments since the previous sample. */
type Step = {
  t: number;
  dt: number;
  /** Heading increment (deg, left positive). */
  dPsi: number;
  /** Distance increment (m) and the part of it driven in reverse. */
  ds: number;
  dsReverse: number;
  speed: number;
  surface?: string;
  laden?: boolean;
  /** First step after a gap or the start of the log. */
  restart: boolean;
  /** Distance travelled since the log began (m), the scale of `courseS`. */
  s: number;
  /**
   * A GPS course point: course of the chord ending at this sample (deg, left positive,
   * unwrapped), placed at the chord's midpoint in distance and time. NaN when there is none.
   */
  courseS: number;
  coursePsi: number;
  courseT: number;
  /** Length of that chord along the path (m). */
  courseC: number;
  /**
   * The GPS fix of this sample on the local east/north plane (m), NaN when none was used, and
   * the stretch of unbroken driving in one direction it belongs to (a stop, a change between
   * forward and reverse or a gap starts a new one: positions across it are no single path).
   */
  fixX: number;
  fixY: number;
  fixRun: number;
};

/** Turns raw samples into heading and distance increments, one source picked per sample. */
class HeadingTracker {
  // The previous sample, as plain fields: samples may be reused by the caller. NaN marks an
  // absent number: a field that mixed numbers with undefined would box a new number per write.
  private hasPrev = false;
  private prevT = NaN;
  private prevSpeed = NaN;
  private prevRate = NaN;
  private prevPsi = NaN;
  private gpsPsi = NaN;
  private lat0 = NaN;
  private lon0 = NaN;
  private cosLat0 = NaN;
  private sTotal = 0;
  private lastPointS = -Infinity;
  // Recent fixes for the course chord, in rings indexed by a running count: [back, next).
  private readonly px = new Float64Array(POSITION_RING);
  private readonly py = new Float64Array(POSITION_RING);
  private readonly ps = new Float64Array(POSITION_RING);
  private readonly pt = new Float64Array(POSITION_RING);
  private back = 0;
  private next = 0;
  /** The fix at or just before the latest chord's midpoint. */
  private mid = 0;
  private ringReverse = false;
  private fixRun = 0;

  constructor(
    private readonly o: Required<Omit<TSegmentOptions, "wheelbase">> & { wheelbase?: number },
  ) {}

  /** Yaw rate of a sample from the rate sources (deg/s), or NaN. */
  private rateOf(s: TTurnSample, speed: number): number {
    if (s.yawRate !== undefined && Number.isFinite(s.yawRate)) return s.yawRate;
    if (s.steer !== undefined && Number.isFinite(s.steer) && this.o.wheelbase) {
      return (speed * Math.tan(s.steer * DEG)) / this.o.wheelbase / DEG;
    }
    return NaN;
  }

  private clearFixes() {
    this.back = this.next;
    this.fixRun++;
  }

  /** When the machine had travelled `s` (within the kept fixes), from the fixes either side. */
  private timeAt(s: number): number {
    const m = POSITION_RING - 1;
    if (this.mid < this.back) this.mid = this.back;
    while (this.mid + 1 < this.next - 1 && this.ps[(this.mid + 1) & m]! <= s) this.mid++;
    const i = this.mid & m;
    const k = (this.mid + 1) & m;
    const span = this.ps[k]! - this.ps[i]!;
    return span > 0
      ? this.pt[i]! + ((this.pt[k]! - this.pt[i]!) * (s - this.ps[i]!)) / span
      : this.pt[i]!;
  }

  /**
   * Unwrapped GPS course (deg, left positive), or NaN before there is one. The course at each
   * fix is that of the chord back to the latest earlier fix at least a baseline away: on a
   * circle a chord points along the tangent at its midpoint, so the course is exact there, and
   * receiver noise is divided by the baseline rather than by the step between fixes. The
   * chord's midpoint also becomes a course point for the arc fit.
   */
  private gpsHeading(s: TTurnSample, speed: number, reverse: boolean, out: Step): number {
    if (s.lat === undefined || s.lon === undefined) return NaN;
    if (!Number.isFinite(s.lat) || !Number.isFinite(s.lon)) return NaN;
    if (Number.isNaN(this.lat0)) {
      this.lat0 = s.lat;
      this.lon0 = s.lon;
      this.cosLat0 = Math.cos(s.lat * DEG);
    }
    // Creeping or standing, receiver wander is no course; a change between forward and reverse
    // starts afresh, as mixing both would give a course that is neither.
    if (Math.abs(speed) < this.o.gpsMinSpeed || reverse !== this.ringReverse) {
      this.clearFixes();
      this.ringReverse = reverse;
      if (Math.abs(speed) < this.o.gpsMinSpeed) return this.gpsPsi;
    }
    // Local east/north plane: plenty accurate over the few metres of the course baseline.
    const x = (s.lon - this.lon0) * DEG * EARTH_RADIUS * this.cosLat0;
    const y = (s.lat - this.lat0) * DEG * EARTH_RADIUS;
    const m = POSITION_RING - 1;
    if (this.next - this.back >= POSITION_RING) this.back++;
    const k = this.next & m;
    this.px[k] = x;
    this.py[k] = y;
    this.ps[k] = this.sTotal;
    this.pt[k] = s.t;
    this.next++;
    out.fixX = x;
    out.fixY = y;
    out.fixRun = this.fixRun;
    const base2 = this.o.gpsBaseline ** 2;
    const far = (j: number) => {
      const dx = x - this.px[j & m]!;
      const dy = y - this.py[j & m]!;
      return dx * dx + dy * dy >= base2;
    };
    while (this.back + 1 < this.next - 1 && far(this.back + 1)) this.back++;
    if (this.back >= this.next - 1 || !far(this.back)) return this.gpsPsi;
    const j = this.back & m;
    // Course of travel, counter-clockwise from east; the machine points the other way in reverse.
    let psi = Math.atan2(y - this.py[j]!, x - this.px[j]!) / DEG + (reverse ? 180 : 0);
    if (!Number.isNaN(this.gpsPsi)) psi = this.gpsPsi + wrapDegrees(psi - this.gpsPsi);
    this.gpsPsi = psi;
    const mid = (this.ps[j]! + this.sTotal) / 2;
    if (mid - this.lastPointS >= this.o.gpsBaseline * COURSE_POINT_SPACING) {
      this.lastPointS = mid;
      out.courseS = mid;
      out.coursePsi = psi;
      out.courseT = this.timeAt(mid);
      out.courseC = this.sTotal - this.ps[j]!;
    }
    return psi;
  }

  reset() {
    this.hasPrev = false;
    this.prevRate = NaN;
    this.prevPsi = NaN;
    this.clearFixes();
    this.gpsPsi = NaN;
  }

  /** The result of the latest step, reused: the segmenter copies what it keeps. */
  readonly out: Step = {
    t: 0,
    dt: 0,
    dPsi: 0,
    ds: 0,
    dsReverse: 0,
    speed: 0,
    surface: undefined,
    laden: undefined,
    restart: true,
    s: 0,
    courseS: NaN,
    coursePsi: NaN,
    courseT: NaN,
    courseC: NaN,
    fixX: NaN,
    fixY: NaN,
    fixRun: 0,
  };

  step(s: TTurnSample): Step {
    const reverse = s.reverse ?? s.speed < 0;
    const speed = reverse ? -Math.abs(s.speed) : Math.abs(s.speed);
    let restart = !this.hasPrev;
    if (this.hasPrev && (s.t - this.prevT > this.o.maxGap || s.t <= this.prevT)) {
      this.reset();
      restart = true;
    }
    const out = this.out;
    out.courseS = out.coursePsi = out.courseT = NaN;
    out.fixX = out.fixY = NaN;
    const ds = restart
      ? 0
      : (Math.abs(this.prevSpeed) + Math.abs(speed)) * 0.5 * (s.t - this.prevT);
    this.sTotal += ds;
    const rate = this.rateOf(s, speed);
    const hasRate = !Number.isNaN(rate);
    // Absolute heading (compass, then GPS), left positive and unwrapped; only needed when
    // the sample has no rate source. NaN when there is none.
    let psi = NaN;
    if (!hasRate) {
      if (s.heading !== undefined && Number.isFinite(s.heading)) {
        const h = -s.heading;
        psi = Number.isNaN(this.prevPsi) ? h : this.prevPsi + wrapDegrees(h - this.prevPsi);
      } else psi = this.gpsHeading(s, speed, reverse, out);
    } else this.clearFixes();
    const dt = restart ? 0 : s.t - this.prevT;
    let dPsi = 0;
    if (!restart) {
      if (hasRate) dPsi = ((Number.isNaN(this.prevRate) ? rate : this.prevRate) + rate) * 0.5 * dt;
      else if (!Number.isNaN(psi) && !Number.isNaN(this.prevPsi)) dPsi = psi - this.prevPsi;
    }
    this.hasPrev = true;
    this.prevT = s.t;
    this.prevSpeed = speed;
    this.prevRate = rate;
    this.prevPsi = psi;
    out.t = s.t;
    out.dt = dt;
    out.dPsi = dPsi;
    out.ds = ds;
    out.dsReverse = reverse ? ds : 0;
    out.speed = speed;
    out.surface = s.surface;
    out.laden = s.laden;
    out.restart = restart;
    out.s = this.sTotal;
    return out;
  }
}

/**
 * Steps waiting for their smoothing window, in typed-array rings indexed by a running count:
 * one slot per sample, no object per sample (this runs for every row of a large log).
 */
class StepRing {
  t = new Float64Array(64);
  dt = new Float64Array(64);
  dPsi = new Float64Array(64);
  ds = new Float64Array(64);
  dsReverse = new Float64Array(64);
  s = new Float64Array(64);
  courseS = new Float64Array(64);
  coursePsi = new Float64Array(64);
  courseT = new Float64Array(64);
  courseC = new Float64Array(64);
  fixX = new Float64Array(64);
  fixY = new Float64Array(64);
  fixRun = new Float64Array(64);
  surface: (string | undefined)[] = new Array(64);
  laden = new Int8Array(64); // -1 unknown, 0 unladen, 1 laden
  mask = 63;

  /** Makes room for `count` live entries starting at running index `from`. */
  ensure(from: number, count: number) {
    if (count <= this.mask) return;
    let size = this.mask + 1;
    while (size <= count) size *= 2;
    const grow = <A extends Float64Array | Int8Array>(old: A, make: (n: number) => A): A => {
      const next = make(size);
      for (let i = from; i < from + this.mask + 1; i++) next[i & (size - 1)] = old[i & this.mask]!;
      return next;
    };
    this.t = grow(this.t, (n) => new Float64Array(n));
    this.dt = grow(this.dt, (n) => new Float64Array(n));
    this.dPsi = grow(this.dPsi, (n) => new Float64Array(n));
    this.ds = grow(this.ds, (n) => new Float64Array(n));
    this.dsReverse = grow(this.dsReverse, (n) => new Float64Array(n));
    this.s = grow(this.s, (n) => new Float64Array(n));
    this.courseS = grow(this.courseS, (n) => new Float64Array(n));
    this.coursePsi = grow(this.coursePsi, (n) => new Float64Array(n));
    this.courseT = grow(this.courseT, (n) => new Float64Array(n));
    this.courseC = grow(this.courseC, (n) => new Float64Array(n));
    this.fixX = grow(this.fixX, (n) => new Float64Array(n));
    this.fixY = grow(this.fixY, (n) => new Float64Array(n));
    this.fixRun = grow(this.fixRun, (n) => new Float64Array(n));
    this.laden = grow(this.laden, (n) => new Int8Array(n));
    const surface = new Array<string | undefined>(size);
    for (let i = from; i < from + this.mask + 1; i++)
      surface[i & (size - 1)] = this.surface[i & this.mask];
    this.surface = surface;
    this.mask = size - 1;
  }
}

/** The steps of an open turn, then of its quiet tail (parallel arrays). */
type OpenTurn = {
  sign: number;
  t: number[];
  dt: number[];
  dPsi: number[];
  ds: number[];
  dsReverse: number[];
  rate: number[];
  /** Distance at each step (m). */
  s: number[];
  /** GPS course points of the turn with its run-in (and, once ended, its run-out). */
  course: CoursePoints;
  /** GPS fixes over the same stretch, for the fit of the arc to the positions. */
  fixes: TFixPoints;
  surface: string | undefined;
  laden: number;
  /** Number of steps up to and including the last one that was still turning. */
  activeLen: number;
  /** Heading change over those steps (deg), and over all steps appended so far. */
  psi: number;
  psiAll: number;
  quietSince: number | undefined;
};

/** GPS course points: distance (m), course (deg), time (s), chord (m), in order of distance. */
type CoursePoints = { s: number[]; psi: number[]; t: number[]; chord: number[] };

/**
 * The latest GPS fixes, for the run-in of a turn that opens: bounded, oldest dropped. Fixes
 * before `floor` belong to the previous turn and are not handed on.
 */
class FixHistory {
  private readonly size = 2048;
  private readonly x = new Float64Array(this.size);
  private readonly y = new Float64Array(this.size);
  private readonly s = new Float64Array(this.size);
  private readonly t = new Float64Array(this.size);
  private readonly run = new Float64Array(this.size);
  private count = 0;
  floor = -Infinity;

  push(r: StepRing, k: number) {
    const i = this.count % this.size;
    this.x[i] = r.fixX[k]!;
    this.y[i] = r.fixY[k]!;
    this.s[i] = r.s[k]!;
    this.t[i] = r.t[k]!;
    this.run[i] = r.fixRun[k]!;
    this.count++;
  }

  clear() {
    this.count = 0;
    this.floor = -Infinity;
  }

  /**
   * Fixes from distance `from` onwards, or the latest `atLeast` when that reaches further back
   * (sparse logs), never before the floor; oldest first.
   */
  since(from: number, atLeast: number): TFixPoints {
    const out: TFixPoints = { x: [], y: [], s: [], t: [], run: [] };
    const first = Math.max(0, this.count - this.size);
    let i = this.count;
    while (i > first) {
      const s = this.s[(i - 1) % this.size]!;
      if (s < this.floor || (s < from && this.count - i >= atLeast)) break;
      i--;
    }
    for (; i < this.count; i++) {
      const k = i % this.size;
      out.x.push(this.x[k]!);
      out.y.push(this.y[k]!);
      out.s.push(this.s[k]!);
      out.t.push(this.t[k]!);
      out.run.push(this.run[k]!);
    }
    return out;
  }
}

function addFix(into: TFixPoints, r: StepRing, k: number) {
  const x = r.fixX[k]!;
  // The fix that opens a turn is already in its run-in from the history.
  if (Number.isNaN(x) || into.t[into.t.length - 1] === r.t[k]) return;
  into.x.push(x);
  into.y.push(r.fixY[k]!);
  into.s.push(r.s[k]!);
  into.t.push(r.t[k]!);
  into.run.push(r.fixRun[k]!);
}

/**
 * The latest course points, for the run-in of a turn that opens: bounded, oldest dropped.
 * Points before `floor` belong to the previous turn and are not handed on.
 */
class CourseHistory {
  private readonly size = 256;
  private readonly s = new Float64Array(this.size);
  private readonly psi = new Float64Array(this.size);
  private readonly t = new Float64Array(this.size);
  private readonly chord = new Float64Array(this.size);
  private count = 0;
  floor = -Infinity;

  push(r: StepRing, k: number) {
    const i = this.count % this.size;
    this.s[i] = r.courseS[k]!;
    this.psi[i] = r.coursePsi[k]!;
    this.t[i] = r.courseT[k]!;
    this.chord[i] = r.courseC[k]!;
    this.count++;
  }

  clear() {
    this.count = 0;
    this.floor = -Infinity;
  }

  /** Points from distance `from` onwards (and after the floor), oldest first. */
  since(from: number): CoursePoints {
    const out: CoursePoints = { s: [], psi: [], t: [], chord: [] };
    const first = Math.max(0, this.count - this.size);
    let i = this.count;
    while (i > first && this.s[(i - 1) % this.size]! >= Math.max(from, this.floor)) i--;
    for (; i < this.count; i++) {
      const k = i % this.size;
      out.s.push(this.s[k]!);
      out.psi.push(this.psi[k]!);
      out.t.push(this.t[k]!);
      out.chord.push(this.chord[k]!);
    }
    return out;
  }
}

/** The value |rate| exceeds for the top tenth of the turn's steps: its plateau level. */
function addCoursePoint(into: CoursePoints, r: StepRing, k: number) {
  const s = r.courseS[k]!;
  if (Number.isNaN(s)) return;
  into.s.push(s);
  into.psi.push(r.coursePsi[k]!);
  into.t.push(r.courseT[k]!);
  into.chord.push(r.courseC[k]!);
}

function plateauRate(rates: readonly number[], n: number): number {
  // A typed array sorts numerically without a comparator call per pair.
  const sorted = new Float64Array(n);
  for (let i = 0; i < n; i++) sorted[i] = Math.abs(rates[i]!);
  sorted.sort();
  return sorted[Math.floor(n * 0.9)] ?? 0;
}

/** What push() returns for the many samples that finish no turn: shared, never changed. */
const NO_TURNS: readonly TDetectedTurn[] = Object.freeze([]);

export type TTurnSegmenter = {
  /** Feeds one sample; returns the turns that finished with it (usually none). */
  push(sample: TTurnSample): readonly TDetectedTurn[];
  /** Ends the log; returns the turns still open. */
  finish(): TDetectedTurn[];
};

/** A streaming segmenter: feed samples in time order, collect turns as they complete. */
export function createTurnSegmenter(options: TSegmentOptions = {}): TTurnSegmenter {
  return new Segmenter({ ...DEFAULTS, ...options });
}

class Segmenter implements TTurnSegmenter {
  private readonly tracker: HeadingTracker;
  private readonly half: number;
  private readonly ring = new StepRing();
  // Running indices into the ring: next to classify, window start, window end, next to write.
  private head = 0;
  private lo = 0;
  private hi = 0;
  private tail = 0;
  private winPsi = 0;
  private winDt = 0;
  private open: OpenTurn | undefined;
  /** A GPS turn that has ended, still collecting its run-out for the arc fit. */
  private pending:
    | {
        turn: OpenTurn;
        /** Course points are collected up to this distance, fixes up to `fixesUntilS`. */
        untilS: number;
        fixesUntilS: number;
        /** and until the turn holds this many fixes. */
        fixesUntil: number;
        untilT: number;
        /**
         * Where another turn began (m), Infinity while none has: fixes after it are no run-out.
         * Reset when that turn proves too small to count (receiver noise on a sparse log).
         */
        cutS: number;
      }
    | undefined;
  private readonly history = new CourseHistory();
  private readonly fixHistory = new FixHistory();
  private out: TDetectedTurn[] = [];

  constructor(
    private readonly o: Required<Omit<TSegmentOptions, "wheelbase">> & { wheelbase?: number },
  ) {
    this.tracker = new HeadingTracker(o);
    this.half = o.smoothingWindow / 2;
  }

  push(sample: TTurnSample): readonly TDetectedTurn[] {
    const step = this.tracker.step(sample);
    if (step.restart) this.restart();
    const r = this.ring;
    r.ensure(this.lo, this.tail - this.lo + 1);
    const k = this.tail & r.mask;
    r.t[k] = step.t;
    r.dt[k] = step.dt;
    r.dPsi[k] = step.dPsi;
    r.ds[k] = step.ds;
    r.dsReverse[k] = step.dsReverse;
    r.s[k] = step.s;
    r.courseS[k] = step.courseS;
    r.coursePsi[k] = step.coursePsi;
    r.courseT[k] = step.courseT;
    r.courseC[k] = step.courseC;
    r.fixX[k] = step.fixX;
    r.fixY[k] = step.fixY;
    r.fixRun[k] = step.fixRun;
    r.surface[k] = step.surface;
    r.laden[k] = step.laden === undefined ? -1 : step.laden ? 1 : 0;
    this.tail++;
    this.drain(false);
    // Most samples finish no turn: skip allocating an empty array for each of them.
    if (this.out.length === 0) return NO_TURNS;
    const done = this.out;
    this.out = [];
    return done;
  }

  finish(): TDetectedTurn[] {
    this.restart();
    const done = this.out;
    this.out = [];
    return done;
  }

  /** Classifies each step once the window around it is complete (or the stretch of log ended). */
  private drain(final: boolean) {
    const r = this.ring;
    const half = this.half;
    while (this.head < this.tail) {
      const centreT = r.t[this.head & r.mask]!;
      while (this.hi < this.tail && r.t[this.hi & r.mask]! <= centreT + half) {
        this.winPsi += r.dPsi[this.hi & r.mask]!;
        this.winDt += r.dt[this.hi & r.mask]!;
        this.hi++;
      }
      if (this.hi >= this.tail && !final) break;
      while (this.lo < this.head && r.t[this.lo & r.mask]! < centreT - half) {
        this.winPsi -= r.dPsi[this.lo & r.mask]!;
        this.winDt -= r.dt[this.lo & r.mask]!;
        this.lo++;
      }
      this.classify(this.head & r.mask, this.winDt > 0 ? this.winPsi / this.winDt : 0);
      this.head++;
    }
  }

  /** A gap in the log: finish the stretch before it, so no window spans the gap. */
  private restart() {
    this.drain(true);
    if (this.open) this.end(this.open);
    this.open = undefined;
    this.settlePending();
    this.history.clear();
    this.fixHistory.clear();
    this.lo = this.hi = this.head = this.tail;
    this.winPsi = this.winDt = 0;
  }

  private append(turn: OpenTurn, k: number, rate: number) {
    const r = this.ring;
    turn.t.push(r.t[k]!);
    turn.dt.push(r.dt[k]!);
    turn.dPsi.push(r.dPsi[k]!);
    turn.ds.push(r.ds[k]!);
    turn.dsReverse.push(r.dsReverse[k]!);
    turn.rate.push(rate);
    turn.psiAll += r.dPsi[k]!;
    turn.s.push(r.s[k]!);
    addCoursePoint(turn.course, r, k);
    addFix(turn.fixes, r, k);
  }

  private classify(k: number, rate: number) {
    const o = this.o;
    const r = this.ring;
    const turning = Math.abs(rate) >= o.yawThreshold;
    const sign = Math.sign(rate);
    if (!Number.isNaN(r.courseS[k]!)) this.history.push(r, k);
    if (!Number.isNaN(r.fixX[k]!)) this.fixHistory.push(r, k);
    this.feedPending(k);
    const open = this.open;
    if (open) {
      if (turning && sign === open.sign) {
        this.append(open, k, rate);
        open.activeLen = open.t.length;
        open.quietSince = undefined;
        open.psi = open.psiAll;
        // A real next turn is under way: its course is no run-out for the one before.
        if (Math.abs(open.psi) >= o.minHeadingChange / 2) this.settlePending();
        return;
      }
      if (!turning) {
        open.quietSince ??= open.t[open.activeLen - 1]!;
        if (r.t[k]! - open.quietSince <= o.mergeGap) {
          this.append(open, k, rate);
          return;
        }
      }
      this.end(open);
      this.open = undefined;
    }
    if (turning && r.dt[k]! > 0) {
      const turn: OpenTurn = {
        sign,
        t: [],
        dt: [],
        dPsi: [],
        ds: [],
        dsReverse: [],
        rate: [],
        s: [],
        course: this.history.since(r.s[k]! - o.gpsBaseline * FIT_MARGIN),
        fixes: this.fixHistory.since(r.s[k]! - FIX_MARGIN, FIX_MARGIN_COUNT),
        surface: r.surface[k],
        laden: r.laden[k]!,
        activeLen: 1,
        psi: 0,
        psiAll: 0,
        quietSince: undefined,
      };
      this.append(turn, k, rate);
      turn.psi = turn.psiAll;
      this.open = turn;
      if (this.pending && this.pending.cutS === Infinity) {
        this.pending.cutS = r.s[k]! - r.ds[k]!;
      }
    }
  }

  /** An ended turn: GPS turns wait for their run-out, the rest are measured now. */
  private end(turn: OpenTurn) {
    // Too small to be a turn (receiver noise, a lane change): gone, and no bound on run-ins;
    // the turn before it goes on collecting its run-out.
    if (Math.abs(turn.psi) < this.o.minHeadingChange) {
      if (this.pending) this.pending.cutS = Infinity;
      return;
    }
    // Output stays in order: the turn before this one is measured first.
    this.settlePending();
    const lastS = turn.s[turn.activeLen - 1]!;
    // The next turn's run-in starts after this one.
    this.history.floor = lastS;
    this.fixHistory.floor = lastS;
    if (turn.course.s.length === 0) return this.close(turn);
    const lastT = turn.t[turn.activeLen - 1]!;
    this.pending = {
      turn,
      // Course points sit half a chord behind the machine: run on that far again.
      untilS: lastS + this.o.gpsBaseline * (FIT_MARGIN + 0.5),
      fixesUntilS: lastS + FIX_MARGIN,
      fixesUntil: turn.fixes.x.length + FIX_MARGIN_COUNT,
      untilT: lastT + RUN_OUT_WAIT,
      cutS: Infinity,
    };
  }

  /** Hands a step's course point to the pending turn until it has its run-out. */
  private feedPending(k: number) {
    const p = this.pending;
    if (!p) return;
    const r = this.ring;
    const s = r.s[k]!;
    if (s - r.ds[k]! < p.untilS) addCoursePoint(p.turn.course, r, k);
    addFix(p.turn.fixes, r, k);
    const fixesDone = s >= p.fixesUntilS && p.turn.fixes.x.length >= p.fixesUntil;
    if ((s >= p.untilS && fixesDone) || r.t[k]! >= p.untilT) this.settlePending();
  }

  private settlePending() {
    const p = this.pending;
    if (!p) return;
    this.pending = undefined;
    // A turn under way (or undecided) when the run-out ends: its fixes are not run-out.
    const f = p.turn.fixes;
    let n = f.s.length;
    while (n > 0 && f.s[n - 1]! > p.cutS) n--;
    f.x.length = f.y.length = f.s.length = f.t.length = f.run.length = n;
    this.close(p.turn);
  }

  private close(turn: OpenTurn) {
    const o = this.o;
    const n = turn.activeLen;
    let psi = 0;
    for (let i = 0; i < n; i++) psi += turn.dPsi[i]!;
    if (Math.abs(psi) < o.minHeadingChange || n === 0) return;
    // Smoothing spreads a turn's edges by half a window each side. For a steady turn the smoothed
    // rate crosses half its plateau where the turn really starts and ends, so distance, duration
    // and radius come from that core; the heading change sums the whole window (nothing lost).
    const half = plateauRate(turn.rate, n) / 2;
    let first = 0;
    while (first < n - 1 && Math.abs(turn.rate[first]!) < half) first++;
    let last = n - 1;
    while (last > first && Math.abs(turn.rate[last]!) < half) last--;
    let dist = 0;
    let distRev = 0;
    for (let i = first; i <= last; i++) {
      dist += turn.ds[i]!;
      distRev += turn.dsReverse[i]!;
    }
    let start = turn.t[first]! - turn.dt[first]!;
    let end = turn.t[last]!;
    let headingChange = Math.abs(psi);
    const arc = this.fitGpsArc(
      turn,
      turn.s[first]! - turn.ds[first]!,
      turn.s[last]!,
      psi,
      distRev > dist / 2,
    );
    if (arc) {
      ({ start, end, headingChange } = arc);
      dist = arc.distance;
    }
    const duration = end - start;
    const speed = duration > 0 ? dist / duration : 0;
    let radius = dist / (headingChange * DEG);
    const pivot = speed < o.pivotSpeed || radius < o.pivotRadius;
    if (pivot) radius = 0;
    this.out.push({
      start,
      end,
      headingChange,
      radius,
      speed,
      distance: dist,
      direction: psi > 0 ? "left" : "right",
      reverse: distRev > dist / 2,
      pivot,
      ...(turn.surface !== undefined ? { surface: turn.surface } : {}),
      ...(turn.laden >= 0 ? { laden: turn.laden === 1 } : {}),
    });
  }

  /**
   * Arc of a GPS turn from its course points (docs/turn-detection.md): the detector's core,
   * taken from a course that trails the machine by half a baseline, seeds the fit. Undefined
   * when the turn has no run-in or run-out to fit against, or the fit disagrees with the sum.
   */
  private fitGpsArc(
    turn: OpenTurn,
    coreStart: number,
    coreEnd: number,
    psiSum: number,
    reverse: boolean,
  ) {
    const c = turn.course;
    const n = c.s.length;
    if (n === 0) return undefined;
    const lag = this.o.gpsBaseline / 2;
    const a0 = coreStart - lag;
    const b0 = coreEnd - lag;
    const reach = Math.max(this.o.gpsBaseline, 0.3 * (b0 - a0));
    // The fit to the positions starts from the detector's core (heading change summed over the
    // turn, arc between the half-plateau crossings); the heading fit is the fallback, and a
    // better start when the core is too far off for the fit to the positions to be trusted.
    const psi0 = interpolate(c.s, c.psi, a0);
    const fromCore = fitArcToFixes(
      turn.fixes,
      { a: a0, b: b0, psi0, psi1: psi0 + psiSum },
      reverse,
    );
    if (fromCore) return fromCore;
    const ramp = fitHeadingRamp({ ...c, length: n }, { a: a0, b: b0, reach });
    const dPsi = ramp ? ramp.psi1 - ramp.psi0 : 0;
    const fit =
      ramp && Math.sign(dPsi) === Math.sign(psiSum) && Math.abs(dPsi) >= this.o.minHeadingChange
        ? ramp
        : undefined;
    if (!fit) return undefined;
    const onPositions = fitArcToFixes(turn.fixes, fit, reverse);
    if (onPositions) return onPositions;
    return {
      start: interpolate(c.s, c.t, fit.a),
      end: interpolate(c.s, c.t, fit.b),
      headingChange: Math.abs(dPsi),
      distance: fit.b - fit.a,
    };
  }
}

/** Detects the turns in a whole log held in memory. */
export function segmentTurns(
  samples: readonly TTurnSample[],
  options: TSegmentOptions = {},
): TDetectedTurn[] {
  const segmenter = createTurnSegmenter(options);
  const turns: TDetectedTurn[] = [];
  for (const s of samples) turns.push(...segmenter.push(s));
  turns.push(...segmenter.finish());
  return turns;
}
