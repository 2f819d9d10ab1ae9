import { SURFACE_KINDS } from "./surfaces";
import { STEERING_LAYOUTS, type TTurn } from "./schemas";
import { copyUnitTurn, type UnitTurn } from "./unit-turn";

const CACHE_LIMIT = 4096;
const SURFACE_INDEX = new Map(SURFACE_KINDS.map((s, i) => [s, i]));

const LAYOUT_CODES = new Map<string, number>(STEERING_LAYOUTS.map((l, i) => [l, i]));

/**
 * Solved turns keyed by everything that changes the solve (not heading change, count, crab
 * distance or label: results scale linearly with those). Direct-mapped and fixed-size, with the
 * full key compared exactly: a collision or eviction only re-solves, deterministically, to the
 * same result, so memory stays flat for huge imported duty cycles without strings or maps.
 */
export class TurnCache {
  private readonly codes = new Int32Array(CACHE_LIMIT).fill(-1);
  private readonly sizes = new Float64Array(CACHE_LIMIT);
  private readonly speeds = new Float64Array(CACHE_LIMIT);
  private readonly units: (UnitTurn | undefined)[] = new Array<UnitTurn | undefined>(
    CACHE_LIMIT,
  ).fill(undefined);
  private readonly bits = new Float64Array(2);
  private readonly words = new Uint32Array(this.bits.buffer);
  private index = 0;
  private seen = false;

  private code(layout: string, t: TTurn): number {
    let c = LAYOUT_CODES.get(layout) ?? 15;
    c = c * 2 + (t.direction === "left" ? 0 : 1);
    c = c * 2 + (t.radius === undefined ? 0 : 1);
    c = c * 8 + (SURFACE_INDEX.get(t.surface) ?? 7);
    c = c * 2 + (t.loadState === "laden" ? 1 : 0);
    c = c * 2 + (t.frontDrive === "engaged" ? 1 : 0);
    return c * 2 + (t.differentialLock ? 1 : 0);
  }

  /**
   * The cached solve for this turn, or undefined. Remembers the slot for {@link store}; a turn
   * is kept only from its second occurrence on, so all-distinct imports allocate nothing here.
   */
  lookup(layout: string, t: TTurn): UnitTurn | undefined {
    const code = this.code(layout, t);
    const size = t.radius ?? t.steerInput ?? 0;
    this.bits[0] = size;
    this.bits[1] = t.speed;
    const w = this.words;
    let h = Math.imul(code + 0x9e3779b9, 0x85ebca6b);
    for (let i = 0; i < 4; i++) h = Math.imul(h ^ (w[i] as number), 0xc2b2ae35) ^ (h >>> 15);
    const i = (h >>> 0) % CACHE_LIMIT;
    this.index = i;
    this.seen = this.codes[i] === code && this.sizes[i] === size && this.speeds[i] === t.speed;
    if (this.seen) return this.units[i];
    this.codes[i] = code;
    this.sizes[i] = size;
    this.speeds[i] = t.speed;
    this.units[i] = undefined;
    return undefined;
  }

  /** After a miss: keep a copy if this turn kind was seen before. */
  store(unit: UnitTurn): void {
    if (this.seen) this.units[this.index] = copyUnitTurn(unit);
  }
}
