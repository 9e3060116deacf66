import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_CUSTOMER, requestCsv, requestRows, requestXlsx } from '../support/request-sheets';
import { tempDir } from './db/helpers';

const root = resolve(__dirname, '../..');

function cli(...args: string[]) {
  const r = spawnSync(process.execPath, ['scripts/cli.mjs', ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status ?? -1, out: r.stdout, err: r.stderr };
}

describe('command line: import-request', { timeout: 180_000 }, () => {
  it('previews with --guess and --dry-run, refuses the bad row, imports with a fix and reuses the kept mapping', async () => {
    const dir = tempDir();
    const db = join(dir, 'shop.db');
    const sheet = join(dir, 'rfq-120.xlsx');
    writeFileSync(sheet, await requestXlsx(requestRows(6, { badRow: 2 })));

    const dry = cli('import-request', sheet, '--customer', DEMO_CUSTOMER, '--guess', '--dry-run');
    expect(dry.code).toBe(0);
    const preview = JSON.parse(dry.out) as { counts: unknown; rows: { row: number; errors: { path: string; code: string }[] }[] };
    expect(preview.counts).toEqual({ ready: 5, error: 1, skipped: 0, blank: 0 });
    expect(preview.rows.flatMap((r) => r.errors.map((e) => e.path))).toEqual(['E5']);

    const refused = cli('import-request', sheet, '--customer', DEMO_CUSTOMER, '--guess', '--db', db);
    expect(refused.code).toBe(2);
    expect(JSON.parse(refused.err).errors[0]).toMatchObject({ code: 'sheet-has-errors', path: 'E5' });

    const fixes = join(dir, 'fixes.json');
    writeFileSync(fixes, JSON.stringify({ E5: '1.5' }));
    const done = cli('import-request', sheet, '--customer', DEMO_CUSTOMER, '--guess', '--db', db, '--fixes', fixes, '--skip', '7');
    expect(done.code).toBe(0);
    const imported = JSON.parse(done.out) as { enquiry: { reference: string; jobCount: number }; skipped: { row: number }[] };
    expect(imported.enquiry).toMatchObject({ reference: 'rfq-120', jobCount: 5 });
    expect(imported.skipped.map((s) => s.row)).toEqual([7]);

    const csv = join(dir, 'rfq-121.csv');
    writeFileSync(csv, requestCsv(requestRows(3, { decimalMark: '.' })));
    const again = cli('import-request', csv, '--customer', DEMO_CUSTOMER, '--db', db, '--dry-run');
    expect(again.code).toBe(0);
    expect(JSON.parse(again.out)).toMatchObject({ savedMapping: true, counts: { ready: 3 } });

    const unknown = cli('import-request', csv, '--customer', 'Nobody Yet (demo)', '--db', db, '--dry-run');
    expect(JSON.parse(unknown.err).errors[0]).toMatchObject({ code: 'no-saved-mapping', path: '--mapping' });
  });
});
