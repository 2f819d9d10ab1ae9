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

/** One telematics sample: s, m/s (negative when reversing), deg/s, deg, deg, decimal degrees. */
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
  gpsBaseline: 2,
  gpsMinSpeed: 0.3,
  pivotSpeed: 0.15,
  pivotRadius: 0.3,
};

const DEG = Math.PI / 180;
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
  /** Smoothed yaw rate, filled in when the step is classified (deg/s). */
  rate: number;
};

/** Turns raw samples into heading and distance increments, one source picked per sample. */
class HeadingTracker {
  // The previous sample, as plain fields: samples may be reused by the caller.
  private hasPrev = false;
  private prevT = 0;
  private prevSpeed = 0;
  private prevRate: number | undefined;
  private prevPsi: number | undefined;
  private anchor: { x: number; y: number; reverse: boolean } | undefined;
  private gpsPsi: number | undefined;
  private lat0: number | undefined;
  private lon0 = 0;
  private cosLat0 = 1;

  constructor(
    private readonly o: Required<Omit<TSegmentOptions, "wheelbase">> & { wheelbase?: number },
  ) {}

  /** Yaw rate of a sample from the rate sources (deg/s), or undefined. */
  private rateOf(s: TTurnSample, speed: number): number | undefined {
    if (s.yawRate !== undefined && Number.isFinite(s.yawRate)) return s.yawRate;
    if (s.steer !== undefined && Number.isFinite(s.steer) && this.o.wheelbase) {
      return (speed * Math.tan(s.steer * DEG)) / this.o.wheelbase / DEG;
    }
    return undefined;
  }

  private gpsHeading(s: TTurnSample, speed: number, reverse: boolean): number | undefined {
    if (s.lat === undefined || s.lon === undefined) return undefined;
    if (!Number.isFinite(s.lat) || !Number.isFinite(s.lon)) return undefined;
    if (this.lat0 === undefined) {
      this.lat0 = s.lat;
      this.lon0 = s.lon;
      this.cosLat0 = Math.cos(s.lat * DEG);
    }
    // Local east/north plane: plenty accurate over the few metres of the course baseline.
    const x = (s.lon - this.lon0) * DEG * EARTH_RADIUS * this.cosLat0;
    const y = (s.lat - this.lat0) * DEG * EARTH_RADIUS;
    // A change of direction starts a new baseline: mixing forward and reverse travel would
    // give a course that is neither.
    if (!this.anchor || this.anchor.reverse !== reverse) {
      this.anchor = { x, y, reverse };
      return this.gpsPsi;
    }
    const dx = x - this.anchor.x;
    const dy = y - this.anchor.y;
    if (Math.abs(speed) >= this.o.gpsMinSpeed && dx * dx + dy * dy >= this.o.gpsBaseline ** 2) {
      // Course of travel, counter-clockwise from east; the machine points the other way in reverse.
      let psi = Math.atan2(dy, dx) / DEG + (reverse ? 180 : 0);
      if (this.gpsPsi !== undefined) psi = this.gpsPsi + wrapDegrees(psi - this.gpsPsi);
      this.gpsPsi = psi;
      this.anchor = { x, y, reverse };
    }
    return this.gpsPsi;
  }

  reset() {
    this.hasPrev = false;
    this.prevRate = undefined;
    this.prevPsi = undefined;
    this.anchor = undefined;
    this.gpsPsi = undefined;
  }

  step(s: TTurnSample): Step {
    const reverse = s.reverse ?? s.speed < 0;
    const speed = reverse ? -Math.abs(s.speed) : Math.abs(s.speed);
    let restart = !this.hasPrev;
    if (this.hasPrev && (s.t - this.prevT > this.o.maxGap || s.t <= this.prevT)) {
      this.reset();
      restart = true;
    }
    const rate = this.rateOf(s, speed);
    // Absolute heading (compass, then GPS), left positive and unwrapped; only needed when
    // the sample has no rate source.
    let psi: number | undefined;
    if (rate === undefined) {
      if (s.heading !== undefined && Number.isFinite(s.heading)) {
        const h = -s.heading;
        psi = this.prevPsi === undefined ? h : this.prevPsi + wrapDegrees(h - this.prevPsi);
      } else psi = this.gpsHeading(s, speed, reverse);
    } else this.anchor = undefined;
    const dt = restart ? 0 : s.t - this.prevT;
    let dPsi = 0;
    if (!restart) {
      if (rate !== undefined) dPsi = ((this.prevRate ?? rate) + rate) * 0.5 * dt;
      else if (psi !== undefined && this.prevPsi !== undefined) dPsi = psi - this.prevPsi;
    }
    const ds = restart ? 0 : (Math.abs(this.prevSpeed) + Math.abs(speed)) * 0.5 * dt;
    this.hasPrev = true;
    this.prevT = s.t;
    this.prevSpeed = speed;
    this.prevRate = rate;
    this.prevPsi = psi;
    return {
      t: s.t,
      dt,
      dPsi,
      ds,
      dsReverse: reverse ? ds : 0,
      speed,
      surface: s.surface,
      laden: s.laden,
      restart,
      rate: 0,
    };
  }
}

/** A step inside an open turn, with its smoothed yaw rate. */
type TurnStep = Step;

/** Records the smoothed rate on the step itself (no copy per sample: this runs for every row). */
function withRate(step: Step, rate: number): TurnStep {
  step.rate = rate;
  return step;
}

type OpenTurn = {
  sign: number;
  /** Steps of the turn, then of the quiet tail after the last turning step. */
  steps: TurnStep[];
  /** Number of steps up to and including the last one that was still turning. */
  activeLen: number;
  quietSince: number | undefined;
};

/** Time-weighted value that |rate| exceeds for the top tenth of the turn: its plateau level. */
function plateauRate(steps: readonly TurnStep[]): number {
  const rates = steps.map((s) => Math.abs(s.rate)).sort((x, y) => x - y);
  return rates[Math.floor(rates.length * 0.9)] ?? 0;
}

export type TTurnSegmenter = {
  /** Feeds one sample; returns the turns that finished with it (usually none). */
  push(sample: TTurnSample): TDetectedTurn[];
  /** Ends the log; returns the turns still open. */
  finish(): TDetectedTurn[];
};

/** A streaming segmenter: feed samples in time order, collect turns as they complete. */
export function createTurnSegmenter(options: TSegmentOptions = {}): TTurnSegmenter {
  const o = { ...DEFAULTS, ...options };
  const tracker = new HeadingTracker(o);
  const half = o.smoothingWindow / 2;
  // Steps waiting for their smoothing window to fill (a few seconds of samples at most).
  let buf: Step[] = [];
  let head = 0; // next step to classify
  let lo = 0; // first step inside the window of buf[head]
  let hi = 0; // one past the last step inside that window
  let winPsi = 0;
  let winDt = 0;
  let open: OpenTurn | undefined;
  const out: TDetectedTurn[] = [];

  function close(turn: OpenTurn) {
    const steps = turn.steps.slice(0, turn.activeLen);
    let psi = 0;
    for (const st of steps) psi += st.dPsi;
    const headingChange = Math.abs(psi);
    if (headingChange < o.minHeadingChange || steps.length === 0) return;
    // Smoothing spreads a turn's edges by half a window each side. For a steady turn the smoothed
    // rate crosses half its plateau where the turn really starts and ends, so distance, duration
    // and radius come from that core; the heading change sums the whole window (nothing lost).
    const half = plateauRate(steps) / 2;
    let first = steps.findIndex((st) => Math.abs(st.rate) >= half);
    let last = steps.length - 1;
    while (last > first && Math.abs(steps[last]!.rate) < half) last--;
    if (first < 0) first = 0;
    let dist = 0;
    let distRev = 0;
    for (let i = first; i <= last; i++) {
      dist += steps[i]!.ds;
      distRev += steps[i]!.dsReverse;
    }
    const start = steps[first]!.t - steps[first]!.dt;
    const end = steps[last]!.t;
    const duration = end - start;
    const speed = duration > 0 ? dist / duration : 0;
    let radius = dist / (headingChange * DEG);
    const pivot = speed < o.pivotSpeed || radius < o.pivotRadius;
    if (pivot) radius = 0;
    const opening = steps[0]!;
    out.push({
      start,
      end,
      headingChange,
      radius,
      speed,
      distance: dist,
      direction: psi > 0 ? "left" : "right",
      reverse: distRev > dist / 2,
      pivot,
      ...(opening.surface !== undefined ? { surface: opening.surface } : {}),
      ...(opening.laden !== undefined ? { laden: opening.laden } : {}),
    });
  }

  function classify(step: Step, rate: number) {
    const turning = Math.abs(rate) >= o.yawThreshold;
    const sign = Math.sign(rate);
    if (open) {
      if (turning && sign === open.sign) {
        open.steps.push(withRate(step, rate));
        open.activeLen = open.steps.length;
        open.quietSince = undefined;
        return;
      }
      if (!turning) {
        open.quietSince ??= open.steps[open.activeLen - 1]!.t;
        if (step.t - open.quietSince <= o.mergeGap) {
          open.steps.push(withRate(step, rate));
          return;
        }
      }
      close(open);
      open = undefined;
    }
    if (turning && step.dt > 0) {
      open = { sign, steps: [withRate(step, rate)], activeLen: 1, quietSince: undefined };
    }
  }

  /** Classifies buf[head] once the window around it is complete (or the stretch of log ended). */
  function drain(final: boolean) {
    while (head < buf.length) {
      const centre = buf[head]!;
      while (hi < buf.length && buf[hi]!.t <= centre.t + half) {
        winPsi += buf[hi]!.dPsi;
        winDt += buf[hi]!.dt;
        hi++;
      }
      if (hi >= buf.length && !final) break;
      while (lo < head && buf[lo]!.t < centre.t - half) {
        winPsi -= buf[lo]!.dPsi;
        winDt -= buf[lo]!.dt;
        lo++;
      }
      classify(centre, winDt > 0 ? winPsi / winDt : 0);
      head++;
    }
    if (lo > 4096) {
      buf = buf.slice(lo);
      head -= lo;
      hi -= lo;
      lo = 0;
    }
  }

  /** A gap in the log: finish the stretch before it, so no window spans the gap. */
  function restart() {
    drain(true);
    if (open) close(open);
    open = undefined;
    buf = [];
    head = lo = hi = 0;
    winPsi = winDt = 0;
  }

  return {
    push(sample) {
      const step = tracker.step(sample);
      if (step.restart) restart();
      buf.push(step);
      drain(false);
      // Most samples finish no turn: skip allocating an empty array for each of them.
      return out.length === 0 ? [] : out.splice(0, out.length);
    },
    finish() {
      restart();
      return out.splice(0, out.length);
    },
  };
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
