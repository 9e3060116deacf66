import { analyseSpec } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { FLOOR_OUTPUTS, floorAnalysis } from './engine-floor';
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

type Compression = Extract<Spec, { kind: 'compression' }>;

/** The floor must give the engine's own numbers, or the ratio compares unlike work: checked on the metric specs. */
function checkFloor(pool: Spec[]): void {
  const out = new Float64Array(FLOOR_OUTPUTS);
  for (const spec of pool) {
    if (spec.units !== 'metric') continue;
    floorAnalysis(spec as Compression, out, 0);
    const r = analyseSpec(spec) as unknown as Record<string, number>;
    const pairs: [string, number][] = [['rate', out[7]!], ['solidLengthMaximum', out[9]!], ['stressAtSolid', out[18]!], ['naturalFrequency', out[34]!], ['mass', out[35]!]];
    for (const [name, floor] of pairs) {
      if (Math.abs(floor - r[name]!) > 1e-9 * Math.abs(r[name]!)) throw new Error(`engine floor ${name} ${floor} differs from the engine's ${r[name]}`);
    }
  }
}

export const engineSuite: BenchSuite = {
  name: 'engine',
  run(): BenchRow[] {
    const pool = specPool(1024);
    checkFloor(pool);
    let sink = 0;
    const full = throughput((i) => { sink += analyseSpec(pool[i & 1023]!).springIndex; }, 2000);
    const floorOut = new Float64Array(FLOOR_OUTPUTS * 1024);
    const bare = throughput((i) => {
      floorAnalysis(pool[i & 1023]! as Compression, floorOut, i & 1023);
      sink += floorOut[(i & 1023) * FLOOR_OUTPUTS + 7]!;
    }, 2000);
    const raw = pool.map((s) => JSON.parse(JSON.stringify(s)));
    const validated = throughput((i) => { const p = parseSpec(raw[i & 1023]); if (p.ok) sink += analyseSpec(p.value).springIndex; }, 1000);
    if (sink === 42) console.log('');
    return [
      { suite: 'engine', name: 'compression analysis + review', value: full, unit: 'specs/s', target: '≥ 200 000', pass: full >= 200_000 },
      { suite: 'engine', name: `fair floor: the report's ${FLOOR_OUTPUTS} numbers, real wire lookup, no objects or strings`, value: bare, unit: 'specs/s' },
      { suite: 'engine', name: 'engine time over the fair floor', value: bare / full, unit: '×', target: '≤ 3', pass: bare / full <= 3 },
      { suite: 'engine', name: 'validate + analysis + review', value: validated, unit: 'specs/s' },
    ];
  },
};
