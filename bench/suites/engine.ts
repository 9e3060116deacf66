import { analyseSpec, calculate } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { FLOOR_FIELDS, FLOOR_FINDINGS, FLOOR_OUTPUTS, floorCalculate } from './engine-floor';
import type { BenchRow, BenchSuite } from '../harness';

const POOL = 1024;

/**
 * A fixed pool of varied compression specs as a file or the CLI gives them (invented parts): metric and
 * inch, five grades, four end forms, each coil diameter, static and cyclic duty, some with a toleranced force.
 */
export function rawSpecPool(count: number): Record<string, unknown>[] {
  const grades = ['en10270-1-dh', 'astm-a228', 'en10270-1-sm', 'astm-a313-302', 'en10270-2-vdsicr'];
  const ends = ['closed-ground', 'closed', 'open-ground', 'open'];
  const pool: Record<string, unknown>[] = [];
  for (let i = 0; i < count; i++) {
    const u = i % 3 === 0 ? 1 / 25.4 : 1;
    const d = 0.5 + (i % 23) * 0.2;
    const index = 5 + (i % 7);
    const nt = 6 + (i % 9);
    const L0 = d * nt * 2.2 + 5;
    const diameter = i % 5 === 0 ? { outerDiameter: d * (index + 1) * u } : { meanDiameter: d * index * u };
    const force = i % 6 === 0 ? { force: 0.2 * (i % 11 + 1) * (u === 1 ? 1 : 0.2248), tolerancePercent: 10 } : {};
    pool.push({
      kind: 'compression', units: u === 1 ? 'metric' : 'inch', material: grades[i % grades.length],
      wireDiameter: d * u, ...diameter, totalCoils: nt, ends: ends[(i >> 2) % ends.length], freeLength: L0 * u,
      loads: [{ length: L0 * 0.8 * u, ...force }],
      duty: i % 4 === 0 ? { type: 'cyclic', between: [L0 * 0.85 * u, L0 * 0.7 * u], cycles: i % 8 === 0 ? 1e7 : 2e5 } : { type: 'static' },
    });
  }
  return pool;
}

/** Specs `calculate` refuses, each for one reason; the floor must refuse them too. */
const refused: unknown[] = [
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: -1, meanDiameter: 10, totalCoils: 8, ends: 'closed', freeLength: 30 },
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, meanDiameter: 10, totalCoils: 8, ends: 'closed', freeLength: 30, colour: 'red' },
  { kind: 'compression', units: 'metric', material: 'no-such-grade', wireDiameter: 1, meanDiameter: 10, totalCoils: 8, ends: 'closed', freeLength: 30 },
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, meanDiameter: 10, totalCoils: 8, ends: 'closed', freeLength: 30, loads: [{ length: 31 }] },
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, meanDiameter: 10, totalCoils: 8, ends: 'closed', freeLength: 5 },
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, meanDiameter: 1.5, totalCoils: 8, ends: 'closed', freeLength: 30 },
  { kind: 'compression', units: 'inch', material: 'en10270-1-dh', wireDiameter: 5, meanDiameter: 40, totalCoils: 8, ends: 'closed', freeLength: 300 },
  { kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, meanDiameter: 10, totalCoils: 8, activeCoils: 6, ends: 'closed', freeLength: 30 },
];

const valueAt = (report: unknown, path: string): number => {
  let at: unknown = report;
  for (const key of path.split('.')) at = (at as Record<string, unknown> | null)?.[key];
  return typeof at === 'number' ? at : Number.NaN;
};

const near = (a: number, b: number): boolean => (Number.isNaN(a) && Number.isNaN(b)) || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));

/**
 * The floor must do the engine's work, or the ratio compares unlike work: the same specs refused, every
 * number it writes equal to the report's, and the same finding codes.
 */
function checkFloor(pool: unknown[]): void {
  const out = new Float64Array(FLOOR_OUTPUTS);
  for (const raw of [...pool, ...refused]) {
    const engine = calculate(raw);
    const floor = floorCalculate(raw, out, 0);
    if (floor !== engine.ok) throw new Error(`the floor ${floor ? 'accepts' : 'refuses'} a spec calculate ${engine.ok ? 'accepts' : 'refuses'}: ${JSON.stringify(raw)}`);
    if (!engine.ok) continue;
    FLOOR_FIELDS.forEach(([path], i) => {
      if (path.startsWith('-')) return;
      if (!near(out[i]!, valueAt(engine.value, path))) throw new Error(`engine floor ${path} ${out[i]} differs from the engine's ${valueAt(engine.value, path)}: ${JSON.stringify(raw)}`);
    });
    const codes = [...new Set(engine.value.findings.map((f) => f.code))].sort();
    const floorCodes = FLOOR_FINDINGS.filter((_c, b) => (out[FLOOR_FIELDS.findIndex(([p]) => p === '-findings')]! & (1 << b)) !== 0).sort();
    if (codes.join() !== floorCodes.join()) throw new Error(`engine floor findings [${floorCodes.join()}] differ from the engine's [${codes.join()}]: ${JSON.stringify(raw)}`);
  }
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/**
 * Calls per second of the process's own CPU time (user + system, GC threads included), for about `ms` of
 * wall time after a warm-up: on a machine shared with other work, wall time counts their turns too.
 */
function cpuThroughput(fn: (i: number) => void, ms: number): number {
  for (let i = 0; i < 2000; i++) fn(i);
  const start = performance.now();
  const cpu = process.cpuUsage();
  let calls = 0;
  while (performance.now() - start < ms) {
    for (let i = 0; i < 1000; i++) fn(calls + i);
    calls += 1000;
  }
  const used = process.cpuUsage(cpu);
  return (calls * 1e6) / (used.user + used.system);
}

/** Runs the engine and its floor in turns (a busy machine slows both alike) and returns each one's median rate. */
function sideBySide(rounds: number, engine: (i: number) => void, floor: (i: number) => void): { engine: number; floor: number } {
  const e: number[] = [];
  const f: number[] = [];
  for (let r = 0; r < rounds; r++) {
    e.push(cpuThroughput(engine, 400));
    f.push(cpuThroughput(floor, 400));
  }
  return { engine: median(e), floor: median(f) };
}

export const engineSuite: BenchSuite = {
  name: 'engine',
  run(): BenchRow[] {
    const raw = rawSpecPool(POOL);
    checkFloor(raw);
    const parsed: Spec[] = raw.map((r) => {
      const p = parseSpec(r);
      if (!p.ok) throw new Error(JSON.stringify(p.errors));
      return p.value;
    });
    let sink = 0;
    const floorOut = new Float64Array(FLOOR_OUTPUTS * POOL);
    const { engine, floor } = sideBySide(5,
      (i) => { const r = calculate(raw[i % POOL]); if (r.ok) sink += r.value.springIndex; },
      (i) => { if (floorCalculate(raw[i % POOL], floorOut, i % POOL)) sink += floorOut[(i % POOL) * FLOOR_OUTPUTS]!; });
    const analysed = cpuThroughput((i) => { sink += analyseSpec(parsed[i % POOL]!).springIndex; }, 1000);
    if (sink === 42) console.log('');
    return [
      { suite: 'engine', name: 'calculate: validate + analysis + review + report in spec units (median of 5)', value: engine, unit: 'specs/CPU-s' },
      {
        suite: 'engine',
        name: `fair floor of calculate: same validation, ${FLOOR_OUTPUTS - 2} report numbers, finding codes, units out; real wire and tolerance lookups; no objects, strings or messages`,
        value: floor, unit: 'specs/CPU-s',
      },
      { suite: 'engine', name: 'calculate time over the fair floor (medians, same run)', value: floor / engine, unit: '×', target: '≤ 3', pass: floor / engine <= 3 },
      { suite: 'engine', name: 'analysis + review of a validated spec (internal units)', value: analysed, unit: 'specs/CPU-s', target: '≥ 200 000', pass: analysed >= 200_000 },
    ];
  },
};
