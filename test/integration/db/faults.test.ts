import fs, { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { runCli } from '../../../service/cli/main';
import { createService, dispatch } from '../../../service/api';
import type { Service } from '../../../service/api';
import { createJob, openStore } from '../../../db';
import type { SqliteStore } from '../../../db';
import { job, tempDir, track } from './helpers';

function service(): Service {
  const store = track(openStore(join(tempDir(), 'shop.db')));
  return createService(store);
}

const call = (s: Service, method: string, input: unknown) => dispatch(s.handlers, method, input);

/** What a save could change: every row count and the numbering sequence. */
function footprint(s: Service): unknown {
  const db = (s.store() as SqliteStore).db;
  const tables = ['jobs', 'job_revisions', 'customers', 'settings', 'attachments', 'quotes', 'job_text', 'job_shape_compression', 'job_shape_extension', 'job_shape_torsion'];
  return Object.fromEntries(tables.map((t) => [t, (db.prepare(`SELECT count(*) AS n FROM ${t}`).get() as { n: number }).n]));
}

/**
 * The disk fills up: SQLite's max_page_count caps the file at the pages it has now, so a write that
 * needs a new page fails with SQLITE_FULL exactly as on a full disk. Jobs are saved until one fails,
 * which leaves no room in the pages either.
 */
async function fillDisk(s: Service): Promise<void> {
  const pages = (s.store() as SqliteStore).db.pragma('page_count', { simple: true }) as number;
  (s.store() as SqliteStore).db.pragma(`max_page_count = ${pages}`);
  for (let i = 0; i < 500; i++) {
    const saved = await call(s, 'createJob', job({ partNumber: `FILL-${i}` }));
    if (!saved.ok) return;
  }
  throw new Error('the capped store never filled up');
}

const importText = (parts: string[]) => JSON.stringify({
  format: 'coilwright-jobs', version: 1, jobs: parts.map((p) => ({ ...job({ partNumber: p }), customer: { name: 'Ashgrove Instruments (demo)' } })),
});

describe('a full disk', () => {
  it('saves, imports, settings and attachments answer "the disk is full" and change nothing', async () => {
    const s = service();
    const first = await call(s, 'createJob', job({ partNumber: 'BEFORE-FULL' }));
    expect(first.ok).toBe(true);
    const id = first.ok ? (first.value as { id: number }).id : 0;
    await fillDisk(s);
    const before = footprint(s);
    const attempts = await Promise.all([
      call(s, 'createJob', job({ partNumber: 'P-FULL', notes: 'n'.repeat(1500) })),
      call(s, 'updateJob', { id, notes: 'x'.repeat(1500) }),
      call(s, 'importJobs', { text: importText(Array.from({ length: 12 }, (_, i) => `IMP-${i}`)) }),
      call(s, 'addAttachment', { jobId: id, name: 'drawing.pdf', mimeType: 'application/pdf', dataBase64: Buffer.alloc(20_000, 7).toString('base64') }),
    ]);
    for (const result of attempts) {
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.error.code).toBe('disk-full');
        expect(result.error.message).toMatch(/^the disk is full: nothing was saved/);
      }
    }
    expect(footprint(s)).toEqual(before);
    expect((s.store() as SqliteStore).db.pragma('integrity_check', { simple: true })).toBe('ok');
    // Space again: the same save goes through, with the next number in the sequence.
    (s.store() as SqliteStore).db.pragma('max_page_count = 1073741823');
    const after = await call(s, 'createJob', job({ partNumber: 'P-FULL' }));
    expect(after.ok).toBe(true);
    const numbers = (s.store() as SqliteStore).db.prepare('SELECT number FROM jobs').all() as { number: string }[];
    expect(new Set(numbers.map((r) => r.number)).size).toBe(numbers.length);
  });
});

/**
 * The disk fills up part way through a file: the first write call lands 1 000 bytes, the next fails with
 * ENOSPC as a full disk does. Only writes to files (fd > 2) are touched, so the test's own output works.
 */
function diskFillsAfterFirstWrite(): () => void {
  const real = fs.writeSync.bind(fs) as (fd: number, data: Buffer, offset: number, length: number) => number;
  let calls = 0;
  const fake = (fd: number, data: Buffer, offset?: number, length?: number): number => {
    const at = offset ?? 0;
    const rest = length ?? data.length - at;
    if (fd <= 2 || !Buffer.isBuffer(data)) return real(fd, data, at, rest);
    calls += 1;
    if (calls > 1) throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
    return real(fd, data, at, Math.min(1000, rest));
  };
  const spy = vi.spyOn(fs, 'writeSync').mockImplementation(fake as unknown as typeof fs.writeSync);
  return () => spy.mockRestore();
}

describe('files written on a full disk', () => {
  it('export says the disk is full and leaves neither a 0-byte file nor a half one, and an old file untouched', async () => {
    const s = service();
    for (let i = 0; i < 5; i++) expect((await call(s, 'createJob', job({ partNumber: `EXP-${i}`, notes: 'e'.repeat(400) }))).ok).toBe(true);
    const dir = dirname(s.store().file);
    const fresh = join(dir, 'jobs.json');
    const kept = join(dir, 'kept.csv');
    writeFileSync(kept, 'an earlier export\n');
    const restore = diskFillsAfterFirstWrite();
    let results;
    try {
      results = [await s.files.run('exportJobs', { file: fresh }), await s.files.run('exportJobs', { file: kept, format: 'csv', force: true })];
    } finally {
      restore();
    }
    for (const r of results) expect(!r.ok && r.error).toMatchObject({ code: 'disk-full', path: 'file', message: expect.stringMatching(/^the disk is full/) });
    expect(existsSync(fresh)).toBe(false);
    expect(readFileSync(kept, 'utf8')).toBe('an earlier export\n');
    expect(readdirSync(dir).filter((f) => f.includes('partial'))).toEqual([]);
    const written = await s.files.run('exportJobs', { file: fresh });
    expect(written.ok && JSON.parse(readFileSync(fresh, 'utf8')).jobs).toHaveLength(5);
  });

  it('print says the disk is full and leaves no PDF of 0 bytes', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    const store = openStore(file);
    const created = createJob(store, job({ partNumber: 'PRINT-FULL' }));
    store.close();
    const out = join(dir, 'traveller.pdf');
    const errors: string[] = [];
    const restore = diskFillsAfterFirstWrite();
    let code;
    try {
      code = await runCli(['print', 'traveller', '--job', String(created.ok && created.value.id), '--quantity', '500', '--db', file, '--out', out], () => {}, (t) => errors.push(t));
    } finally {
      restore();
    }
    expect(code).toBe(2);
    expect(errors.join('\n')).toMatch(/the disk is full: .*traveller\.pdf was not written/);
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(dir).filter((f) => f.endsWith('.partial'))).toEqual([]);
  });
});
