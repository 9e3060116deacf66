import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';
import type { PointKey } from './frame';
import type { LimitCode, Miss } from './misses';
import type { WireChoice } from './wire-sizes';

/** The design point that came nearest to meeting the requirement, and how often each limit ruled points out. */
export class Closest {
  point: PointKey | null = null;
  wire: WireChoice | null = null;
  misses: Miss[] = [];
  score = Infinity;
  readonly counts = new Map<LimitCode, number>();

  private count(misses: readonly Miss[]): void {
    for (let i = 0; i < misses.length; i++) {
      const limit = misses[i]!.limit;
      let repeated = false;
      for (let j = 0; j < i; j++) if (misses[j]!.limit === limit) repeated = true;
      if (!repeated) this.counts.set(limit, (this.counts.get(limit) ?? 0) + 1);
    }
  }

  private take(score: number, misses: Miss[], point: PointKey | null, wire: WireChoice | null): void {
    if (score >= this.score) return;
    this.score = score;
    this.misses = misses;
    this.point = point;
    this.wire = wire;
  }

  /** A point that missed: its score is its worst relative miss, plus a little for each further miss. */
  offer(point: PointKey, misses: Miss[]): void {
    this.count(misses);
    let worst = 0;
    for (const m of misses) worst = Math.max(worst, m.relative);
    this.take(worst + 1e-3 * (misses.length - 1), misses, point, null);
  }

  /** A grade ruled out as a whole (duty, temperature): a poorer near miss than any point that was tried. */
  offerWire(wire: WireChoice, misses: Miss[]): void {
    this.count(misses);
    let worst = 0;
    for (const m of misses) worst = Math.max(worst, m.relative);
    this.take(worst + 10, misses, null, wire);
  }

  /** A wire for which the envelope and the preferred index leave no mean diameter at all. */
  offerEmptyRange(wire: WireChoice, range: { lo: number; hi: number }, units: UnitSystem): void {
    const len = (v: number) => formatQuantity(v, 'length', units);
    const miss: Miss = {
      limit: 'envelope', path: 'envelope', quantity: 'length', value: range.lo, bound: range.hi, sense: 'max',
      relative: (range.lo - range.hi) / Math.max(range.hi, 1e-9),
      note: `wire ${len(wire.d)} needs a mean diameter of at least ${len(range.lo)}; the envelope leaves at most ${len(range.hi)}`,
    };
    this.count([miss]);
    // A wire that fits nowhere is a poorer near miss than any point tried or any grade ruled out.
    this.take(miss.relative + 20, [miss], null, wire);
  }
}
