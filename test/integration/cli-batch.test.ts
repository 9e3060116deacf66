import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { valveSpringMetric } from '../fixtures/specs';

const root = join(__dirname, '..', '..');
const dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-batch-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const cli = (args: string[], input?: string) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8', input });

const lines = (stdout: string) => stdout.trim().split('\n').map((l) => JSON.parse(l) as { spec: number; line?: number; ok: boolean; result?: Record<string, number>; errors?: { path: string; code: string }[] });

/** A DEMO inch part (invented). */
const inchPart = { kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.0625, outerDiameter: 0.75, totalCoils: 12, ends: 'closed-ground', freeLength: 2.25 };

describe('calc --batch', () => {
  it('writes one JSON line per spec of JSON lines, errors by field path, and goes on after a bad spec', () => {
    const file = join(dir, 'specs.jsonl');
    writeFileSync(file, [
      JSON.stringify(valveSpringMetric),
      JSON.stringify({ ...valveSpringMetric, wireDiameter: -1, loads: [{ length: 'short' }] }),
      '{ not json',
      '',
      JSON.stringify(inchPart),
    ].join('\n'));
    const run = cli(['calc', '--batch', file]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/2 of 4 specs have errors/);
    const out = lines(run.stdout);
    expect(out.map((l) => [l.spec, l.line, l.ok])).toEqual([[0, 1, true], [1, 2, false], [2, 3, false], [3, 5, true]]);
    expect(out[1]!.errors!.map((e) => e.path)).toEqual(['wireDiameter', 'loads[0].length']);
    expect(out[2]!.errors![0]!.code).toBe('invalid-json');
    // The same engine as a single calc; spring index w = D/d (EN 13906-1:2013, 3 symbols) with D = OD - d.
    const single = JSON.parse(cli(['calc', '-'], JSON.stringify(valveSpringMetric)).stdout);
    expect(out[0]!.result).toEqual(single);
    expect(out[3]!.result!.springIndex).toBeCloseTo((0.75 - 0.0625) / 0.0625, 10);
  });

  it('reads a JSON list from standard input and a CSV with field-path headers (units in brackets allowed)', () => {
    const list = cli(['calc', '--batch', '-'], JSON.stringify([valveSpringMetric, { ...valveSpringMetric, material: 'no-such-grade' }]));
    expect(lines(list.stdout).map((l) => [l.spec, l.ok, l.line])).toEqual([[0, true, undefined], [1, false, undefined]]);
    expect(lines(list.stdout)[1]!.errors![0]!.path).toBe('material');
    const csv = join(dir, 'specs.csv');
    writeFileSync(csv, [
      'kind,units,material,wireDiameter (mm | in),outerDiameter (mm | in),totalCoils,ends,freeLength,loads[0].length,quantities',
      'compression,inch,astm-a228,0.0625,0.75,12,closed-ground,2.25,1.5,100; 500',
      'compression,metric,en10270-1-dh,1.6,14,9,closed-ground,forty,30,',
    ].join('\r\n'));
    const run = cli(['calc', '--batch', csv]);
    const out = lines(run.stdout);
    expect(out.map((l) => [l.spec, l.line, l.ok])).toEqual([[0, 2, true], [1, 3, false]]);
    expect(out[0]!.result!.springIndex).toBeCloseTo(11, 10);
    expect(out[1]!.errors!.map((e) => e.path)).toEqual(['freeLength']);
  });

  it('price and sheet take the same batch forms', () => {
    const file = join(dir, 'two.jsonl');
    writeFileSync(file, `${JSON.stringify(valveSpringMetric)}\n${JSON.stringify({ ...valveSpringMetric, totalCoils: 1.5 })}\n`);
    const sheet = lines(cli(['sheet', '--batch', file, '--quantity', '500']).stdout);
    expect(sheet.map((l) => l.ok)).toEqual([true, false]);
    expect(sheet[1]!.errors![0]!.path).toMatch(/totalCoils/);
  });
});
