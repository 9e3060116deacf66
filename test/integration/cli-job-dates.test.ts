import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { datedJobs, datedJobsDocument, inRange } from '../support/dated-jobs';

const root = resolve(__dirname, '../..');
/** Each call is a command-line process: seconds apiece on a busy machine. */
const SEVERAL_PROCESSES = 180_000;

function cli(...args: string[]) {
  const r = spawnSync(process.execPath, ['scripts/cli.mjs', ...args], { cwd: root, encoding: 'utf8' });
  return {
    code: r.status ?? -1,
    parts: () => (JSON.parse(r.stdout) as { jobs: { partNumber: string }[] }).jobs.map((j) => j.partNumber).sort(),
    errors: () => (JSON.parse(r.stderr) as { errors: { code: string; path: string; message: string }[] }).errors,
  };
}

describe('command line: jobs list by a date range', () => {
  const jobs = datedJobs(60, 11);
  let dir: string;
  let db: string;

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-dates-'));
    db = join(dir, 'shop.db');
    writeFileSync(join(dir, 'dated.json'), datedJobsDocument(jobs));
    expect(spawnSync(process.execPath, ['scripts/cli.mjs', 'db', 'import', join(dir, 'dated.json'), '--db', db], { cwd: root }).status).toBe(0);
  }, SEVERAL_PROCESSES);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('lists the jobs of a created, last-saved or due range, both days included', { timeout: SEVERAL_PROCESSES }, () => {
    const march = cli('jobs', 'list', '--created-from', '2025-03-01', '--created-to', '2025-03-31', '--db', db);
    expect(march.code).toBe(0);
    const expected = inRange(jobs, 'created', '2025-03-01', '2025-03-31').map((j) => j.partNumber).sort();
    expect(expected.length).toBeGreaterThan(1);
    expect(march.parts()).toEqual(expected);
    // DR-004 is due 2024-03-16 (created 2024-02-15 + 30 days): a to date on that day holds it, and not DR-005.
    expect(jobs[4]!.dueDate).toBe('2024-03-16');
    const dueBy = cli('jobs', 'list', '--due-to', '2024-03-16', '--limit', '500', '--db', db);
    expect(dueBy.parts()).toEqual(['DR-000', 'DR-001', 'DR-002', 'DR-003', 'DR-004']);
    expect(inRange(jobs, 'due', undefined, '2024-03-16')).toHaveLength(5);
    const saved = cli('jobs', 'list', '--updated-from', '2025-06-01', '--status', 'quoted', '--limit', '500', '--db', db);
    expect(saved.parts()).toEqual(inRange(jobs, 'updated', '2025-06-01').filter((j) => j.status === 'quoted').map((j) => j.partNumber).sort());
  });

  it('refuses a bad date, a from after its to and two fields at once, naming the flag', { timeout: SEVERAL_PROCESSES }, () => {
    const notADay = cli('jobs', 'list', '--created-from', '2025-02-30', '--db', db);
    expect(notADay.code).toBe(2);
    expect(notADay.errors()[0]).toMatchObject({ code: 'invalid-option', path: '--created-from' });
    expect(notADay.errors()[0]!.message).toContain('2025-02-30');
    expect(cli('jobs', 'list', '--due-to', '31/03/2025', '--db', db).errors()[0]).toMatchObject({ path: '--due-to' });
    const backwards = cli('jobs', 'list', '--created-from', '2025-04-01', '--created-to', '2025-03-31', '--db', db);
    expect(backwards.errors()[0]).toMatchObject({ path: '--created-from', message: '--created-from 2025-04-01 is after --created-to 2025-03-31' });
    expect(cli('jobs', 'list', '--created-from', '2025-01-01', '--due-to', '2025-02-01', '--db', db).errors()[0]).toMatchObject({ path: '--due-to' });
    // Refused before any store opens: a mistyped --db is not created as a new, empty store.
    const typo = join(dir, 'shpo.db');
    expect(cli('jobs', 'list', '--updated-to', '2025-13-01', '--db', typo).errors()[0]).toMatchObject({ path: '--updated-to' });
    expect(existsSync(typo)).toBe(false);
  });
});
