import { analyseSpec } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { helicalRate, torsionStressPerForce } from '../../core/springs/helix';
import { bergstraesser } from '../../core/springs/factors';
import type { BenchRow, BenchSuite } from '../harness';
import { throughput } from '../harness';

/** A fixed pool of valid, varied compression specs (invented parts). */
function specPool(count: number): Spec[] {
  const grades = ['en10270-1-dh', 'astm-a228', 'en10270-1-sm', 'astm-a313-302', 'en10270-2-vdsicr'];
  const pool: Spec[] = [];
  for (let i = 0; i < count; i++) {
    const d = 0.5 + (i % 23) * 0.2;
    const index = 5 + (i % 7);
    const nt = 6 + (i % 9);
    const L0 = d * nt * 2.2 + 5;
    const parsed = parseSpec({
      kind: 'compression', units: i % 3 === 0 ? 'inch' : 'metric', material: grades[i % grades.length],
      wireDiameter: i % 3 === 0 ? d / 25.4 : d, meanDiameter: i % 3 === 0 ? (d * index) / 25.4 : d * index,
      totalCoils: nt, ends: 'closed-ground', freeLength: i % 3 === 0 ? L0 / 25.4 : L0,
      loads: [{ length: (i % 3 === 0 ? 1 / 25.4 : 1) * (L0 * 0.8) }],
      duty: i % 4 === 0 ? { type: 'cyclic', between: [L0 * 0.85, L0 * 0.7].map((v) => (i % 3 === 0 ? v / 25.4 : v)), cycles: 1e7 } : { type: 'static' },
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    pool.push(parsed.value);
  }
  return pool;
}

export const engineSuite: BenchSuite = {
  name: 'engine',
  run(): BenchRow[] {
    const pool = specPool(1024);
    let sink = 0;
    const full = throughput((i) => { sink += analyseSpec(pool[i & 1023]!).springIndex; }, 2000);
    const bare = throughput((i) => {
      const s = pool[i & 1023]! as Extract<Spec, { kind: 'compression' }>;
      const D = s.meanDiameter!;
      const rate = helicalRate(81500, s.wireDiameter, D, s.totalCoils! - 2);
      sink += bergstraesser(D / s.wireDiameter) * torsionStressPerForce(D, s.wireDiameter) * rate * (s.freeLength - s.wireDiameter * s.totalCoils!);
    }, 1000);
    const raw = pool.map((s) => JSON.parse(JSON.stringify(s)));
    const validated = throughput((i) => { const p = parseSpec(raw[i & 1023]); if (p.ok) sink += analyseSpec(p.value).springIndex; }, 1000);
    if (sink === 42) console.log('');
    return [
      { suite: 'engine', name: 'compression analysis + review', value: full, unit: 'specs/s', target: '≥ 200 000', pass: full >= 200_000 },
      { suite: 'engine', name: 'bare rate/stress formulas', value: bare, unit: 'specs/s' },
      { suite: 'engine', name: 'ratio bare / full', value: bare / full, unit: '×', target: '≤ 3', pass: bare / full <= 3 },
      { suite: 'engine', name: 'validate + analysis + review', value: validated, unit: 'specs/s' },
    ];
  },
};
