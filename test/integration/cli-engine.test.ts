import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { valveSpringMetric } from '../fixtures/specs';

const root = join(__dirname, '..', '..');
const cli = (args: string[], input?: string) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8', input });

describe('command line: calc and materials', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-'));

  it('calc FILE prints the report and exits 0', () => {
    const file = join(dir, 'spec.json');
    writeFileSync(file, JSON.stringify(valveSpringMetric));
    const run = cli(['calc', file]);
    expect(run.status, run.stderr).toBe(0);
    const report = JSON.parse(run.stdout);
    expect(report.kind).toBe('compression');
    expect(report.springIndex).toBeCloseTo(10, 10);
    expect(Array.isArray(report.findings)).toBe(true);
  });

  it('calc - reads standard input', () => {
    const run = cli(['calc', '-'], JSON.stringify(valveSpringMetric));
    expect(run.status, run.stderr).toBe(0);
    expect(JSON.parse(run.stdout).rate).toBeGreaterThan(0);
  });

  it('a spec that fails validation exits 2 with the errors as JSON on stderr', () => {
    const run = cli(['calc', '-'], JSON.stringify({ ...valveSpringMetric, wireDiameter: -1 }));
    expect(run.status).toBe(2);
    const { errors } = JSON.parse(run.stderr);
    expect(errors[0].path).toBe('wireDiameter');
  });

  it('bad JSON and a missing file are input errors (exit 2)', () => {
    expect(cli(['calc', '-'], '{ nope').status).toBe(2);
    expect(cli(['calc', join(dir, 'absent.json')]).status).toBe(2);
  });

  it('materials lists every grade with its size range', () => {
    const run = cli(['materials']);
    expect(run.status, run.stderr).toBe(0);
    const grades = JSON.parse(run.stdout);
    expect(grades.map((g: { id: string }) => g.id)).toContain('astm-a228');
    expect(grades.length).toBeGreaterThanOrEqual(18);
  });
});
