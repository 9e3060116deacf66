import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BenchRow, BenchSuite } from '../harness';

/** A DEMO part (invented): what an estimator would type for a small compression spring. */
const DEMO_SPEC = {
  kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1.6, outerDiameter: 14,
  totalCoils: 9, ends: 'closed-ground', freeLength: 42, loads: [{ length: 30 }], notes: 'DEMO data: bench part',
};

const RUNS = 9;
const TARGET_RATIO = 2.5;

function timed(args: string[]): number {
  const t0 = performance.now();
  const r = spawnSync('npm', args, { cwd: process.cwd(), encoding: 'utf8', shell: process.platform === 'win32' });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`npm ${args.join(' ')} failed: ${r.stderr}`);
  return ms;
}

/** 1 000 DEMO specs (invented parts), varied in size, grade and units; every tenth is bad. */
function batchOfSpecs(count: number): Record<string, unknown>[] {
  const grades = ['en10270-1-dh', 'astm-a228', 'en10270-1-sm', 'astm-a313-302'];
  const specs: Record<string, unknown>[] = [];
  for (let i = 0; i < count; i++) {
    const d = 0.6 + (i % 19) * 0.2;
    const inch = i % 3 === 0;
    const f = inch ? 1 / 25.4 : 1;
    specs.push({
      kind: 'compression', units: inch ? 'inch' : 'metric', material: grades[i % grades.length],
      wireDiameter: d * f, outerDiameter: d * (6 + (i % 6)) * f, totalCoils: 6 + (i % 9), ends: 'closed-ground',
      freeLength: (i % 10 === 9 ? -1 : d * 30) * f, loads: [{ length: d * 24 * f }],
    });
  }
  return specs;
}

const CSV_FIELDS = ['kind', 'units', 'material', 'wireDiameter', 'outerDiameter', 'totalCoils', 'ends', 'freeLength'];

/** The three forms `calc --batch` reads: a JSON list, JSON lines, and a CSV with field-path headers. */
const batchForms: { form: string; file: string; text: (specs: Record<string, unknown>[]) => string }[] = [
  { form: 'JSON lines', file: 'batch.jsonl', text: (specs) => `${specs.map((s) => JSON.stringify(s)).join('\n')}\n` },
  { form: 'JSON list', file: 'batch.json', text: (specs) => JSON.stringify(specs) },
  {
    form: 'CSV, field-path headers', file: 'batch.csv',
    text: (specs) => [[...CSV_FIELDS, 'loads[0].length'].join(','),
      ...specs.map((s) => [...CSV_FIELDS.map((k) => String(s[k])), String((s.loads as { length: number }[])[0]!.length)].join(','))].join('\r\n'),
  },
];

const BATCH = 1000;

/** `calc --batch` over 1 000 specs in one process, through the launcher as a user runs it (median of 3 per form). */
function batchRows(dir: string): BenchRow[] {
  const specs = batchOfSpecs(BATCH);
  return batchForms.map(({ form, file, text }) => {
    const path = join(dir, file);
    writeFileSync(path, text(specs));
    const times: number[] = [];
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      const r = spawnSync(process.execPath, ['scripts/cli.mjs', 'calc', '--batch', path], { cwd: process.cwd(), encoding: 'utf8', maxBuffer: 1 << 28 });
      times.push(performance.now() - t0);
      const lines = r.stdout.trim().split('\n');
      const failed = lines.filter((l) => l.includes('"ok":false')).length;
      if (lines.length !== BATCH || failed !== BATCH / 10) throw new Error(`calc --batch (${form}) wrote ${lines.length} lines, ${failed} failed, for ${BATCH} specs: ${r.stderr}`);
    }
    const ms = median(times);
    return row(`calc --batch of ${BATCH} specs, one process (${form}; median of 3)`, ms, 'ms', '< 2 000 ms', ms < 2000);
  });
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
  ({ suite: 'cli', name, value, unit, ...(target === undefined ? {} : { target, pass }) });

/**
 * One command-line call against npm starting and doing nothing, measured side by side: the two
 * alternate, so a busy machine slows both alike, and the medians are compared.
 */
export const cliSuite: BenchSuite = {
  name: 'cli',
  run(): BenchRow[] {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-cli-'));
    try {
      const file = join(dir, 'demo-spring.json');
      writeFileSync(file, JSON.stringify(DEMO_SPEC));
      const calc = ['run', '-s', 'cli', '--', 'calc', file];
      const idle = ['-s', 'pkg', 'get', 'name'];
      timed(calc); // builds the command line's bundle when a source is newer than it
      timed(idle);
      const calcTimes: number[] = [];
      const idleTimes: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        calcTimes.push(timed(calc));
        idleTimes.push(timed(idle));
      }
      const ratio = median(calcTimes) / median(idleTimes);
      return [
        ...batchRows(dir),
        row('npm run -s cli -- calc FILE (median of 9)', median(calcTimes), 'ms'),
        row('npm -s pkg get name (median of 9, same run)', median(idleTimes), 'ms'),
        row('calc call against npm doing nothing', ratio, '×', `≤ ${TARGET_RATIO}×`, ratio <= TARGET_RATIO),
      ];
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
