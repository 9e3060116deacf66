import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { PrintedPdf, Quote, QuoteSummary } from '../../../core/api';
import { LATEST_VERSION, migrate, openStore, schemaVersion } from '../../../db';
import { quoteHistorySql } from '../../../db/quotes';
import { createService, dispatch } from '../../../service/api';
import { tempDir, track } from './helpers';

/**
 * A store at schema 9 with one quote issued by the build before quotations had lines (demo data), and the
 * SHA-256 of the PDF that build printed for it.
 */
interface Fixture { schemaVersion: number; pdfSha256: string; rows: Record<string, Record<string, unknown>[]> }
const fixture = JSON.parse(readFileSync(join(__dirname, 'fixtures', 'quote-schema-9.json'), 'utf8')) as Fixture;

/** Puts the fixture's rows in a file migrated to schema 9, as that build left them. */
function schema9Store(file: string): void {
  const db = new Database(file);
  migrate(db, 9);
  db.transaction(() => {
    for (const table of ['customers', 'jobs', 'job_revisions', 'settings', 'quotes']) {
      db.exec(`DELETE FROM ${table}`);
      for (const row of fixture.rows[table]!) {
        const columns = Object.keys(row);
        db.prepare(`INSERT INTO ${table} (${columns.join(', ')}) VALUES (${columns.map((c) => `@${c}`).join(', ')})`).run(row);
      }
    }
  })();
  db.close();
}

describe('migration 0010 (quotation lines)', () => {
  it('gives every quote already issued its one line, and the lines refuse change, deletion, replacement and additions', () => {
    expect(fixture.schemaVersion).toBe(9);
    const file = join(tempDir(), 'm10.db');
    schema9Store(file);
    const db = new Database(file);
    expect(migrate(db, 10)).toEqual({ from: 9, to: 10 });
    expect(schemaVersion(db)).toBe(10);
    const quote = fixture.rows.quotes![0]!;
    const lines = db.prepare('SELECT * FROM quote_lines').all() as Record<string, unknown>[];
    expect(lines).toEqual([{ quote_id: quote.id, line: 1, job_id: quote.job_id, job_revision: quote.job_revision, job: quote.job,
      spec: quote.spec, prices: quote.prices, quantity_breaks: quote.quantity_breaks }]);
    expect(db.prepare('SELECT line_count FROM quotes').get()).toEqual({ line_count: 1 });
    expect(() => db.exec("UPDATE quote_lines SET prices = '{}'")).toThrow(/cannot be changed/);
    expect(() => db.exec('DELETE FROM quote_lines')).toThrow(/cannot be deleted/);
    expect(() => db.exec(`INSERT OR REPLACE INTO quote_lines SELECT * FROM quote_lines`)).toThrow(/cannot be replaced/);
    db.pragma('foreign_keys = OFF');
    expect(() => db.prepare(`INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
      VALUES (?, 1, 77, 1, '{}', '{}', '{}', '[]') ON CONFLICT DO NOTHING`).run(quote.id)).toThrow(/cannot be replaced/);
    expect(() => db.prepare(`INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
      VALUES (?, 2, 77, 1, '{}', '{}', '{}', '[]')`).run(quote.id)).toThrow(/lines it was issued with/);
    expect(() => db.exec('UPDATE quotes SET line_count = 2')).toThrow(/cannot be changed/);
    expect(db.prepare('SELECT count(*) AS n FROM quote_lines').get()).toEqual({ n: 1 });
    db.close();
  });

  it('the quote issued before reads as a one-line quotation, stays in its job\'s history and reprints byte-identical', async () => {
    const file = join(tempDir(), 'm10-service.db');
    schema9Store(file);
    const store = track(openStore(file));
    expect(schemaVersion(store.db)).toBe(LATEST_VERSION);
    const service = createService(store);
    const call = async <T>(name: string, input: unknown): Promise<T> => {
      const r = await dispatch(service.handlers, name, input);
      if (!r.ok) throw new Error(JSON.stringify(r.error));
      return r.value as T;
    };
    const number = fixture.rows.quotes![0]!.number as string;
    const jobId = fixture.rows.quotes![0]!.job_id as number;
    const quote = await call<Quote>('getQuote', { number });
    expect(quote.lines.map((l) => [l.line, l.jobId, l.jobNumber, l.partNumber])).toEqual([[1, jobId, 'J-26-0001', 'FG-100']]);
    expect(quote.lines[0]!.spec).toEqual(quote.spec);
    expect(quote.decision?.reason).toBe('customer fits a stop at 18 mm');
    expect((await call<QuoteSummary[]>('listQuotes', { jobId })).map((q) => q.number)).toEqual([number]);
    const printed = await call<PrintedPdf>('reprintQuote', { number });
    expect(createHash('sha256').update(Buffer.from(printed.base64, 'base64')).digest('hex')).toBe(fixture.pdfSha256);
  });

  it('a job\'s quote history reads its lines through the index by job, not by scanning', () => {
    const store = track(openStore(join(tempDir(), 'plan.db')));
    const plan = (store.db.prepare(`EXPLAIN QUERY PLAN ${quoteHistorySql}`).all(1, 50, 0) as { detail: string }[]).map((r) => r.detail).join('\n');
    expect(plan).toMatch(/SEARCH l USING (COVERING )?INDEX quote_lines_by_job \(job_id=\?\)/);
    expect(plan).not.toMatch(/SCAN (l|q)\b/);
  });
});
