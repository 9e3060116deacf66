import type { Quote, QuoteLine, QuoteLineSummary, QuoteSummary, RevisionFields } from '../core/api/store';
import { listQuotesSchema } from '../core/api/store';
import type { IssueDecision } from '../core/quoting/problems';
import type { Settings } from '../core/settings/schema';
import { StoreError, failure, invalid, success } from './errors';
import type { StoreResult } from './errors';
import { takeNumber } from './jobs/numbering';
import { jobRow } from './jobs/read';
import type { JobRow } from './jobs/rows';
import { storedSpecOf } from './jobs/rows';
import { readStoredSpec } from './jobs/stored-spec';
import { revisionFields, stateOfRow } from './jobs/state';
import { attempt, updateJob } from './jobs/write';
import { readSettings, shopTimeZone } from './settings';
import { addCalendarDays, calendarDay, snapshotTimeZone } from '../core/calendar';
import type { Store } from './store';
import { inTransaction } from './store';
import { parseWith } from '../core/validation';

interface QuoteRow {
  id: number; number: string; job_id: number; job_revision: number; issued_at: string; validity_days: number;
  currency: string; job?: string; spec?: string; settings?: string; prices?: string; quantity_breaks?: string; document?: string;
  decision?: string | null; made_by?: string;
}

interface LineRow {
  quote_id: number; line: number; job_id: number; job_revision: number; job: string; spec?: string; prices?: string; quantity_breaks?: string;
}


function lineSummary(row: LineRow): QuoteLineSummary {
  const job = JSON.parse(row.job) as { number: string; partNumber: string };
  return { line: row.line, jobId: row.job_id, jobRevision: row.job_revision, jobNumber: job.number, partNumber: job.partNumber };
}

/** A quote's last valid day: its day of issue in the shop's time zone, plus its days of validity (as on the document). */
function toSummary(row: QuoteRow, lines: readonly LineRow[], timeZone: string): QuoteSummary {
  const validUntil = addCalendarDays(calendarDay(row.issued_at, timeZone), row.validity_days);
  return {
    id: row.id, number: row.number, jobId: row.job_id, jobRevision: row.job_revision, issuedAt: row.issued_at,
    validityDays: row.validity_days, validUntil, currency: row.currency, lines: lines.map(lineSummary),
  };
}

function toLine(row: LineRow, quoteNumber: string): StoreResult<QuoteLine> {
  const stored = readStoredSpec(row.spec, `quote ${quoteNumber} line ${row.line}`);
  if (!stored.ok) return failure(stored.problem.code, stored.problem.message, `lines[${row.line - 1}].${stored.problem.path}`);
  return success({
    ...lineSummary(row), job: JSON.parse(row.job) as RevisionFields & { number: string }, spec: stored.spec,
    prices: JSON.parse(row.prices!), quantityBreaks: JSON.parse(row.quantity_breaks!) as unknown[],
  });
}

/** The issued quote as it was; a spec that no longer reads is this quote's problem, named with its field. */
function toQuote(row: QuoteRow, lineRows: readonly LineRow[]): StoreResult<Quote> {
  const stored = readStoredSpec(row.spec, `quote ${row.number}`);
  if (!stored.ok) return failure(stored.problem.code, stored.problem.message, stored.problem.path);
  const lines: QuoteLine[] = [];
  for (const lineRow of lineRows) {
    const line = toLine(lineRow, row.number);
    if (!line.ok) return line;
    lines.push(line.value);
  }
  const settings = JSON.parse(row.settings!) as Settings;
  return success({
    // Dated in the zone the quote was issued under, as its document is.
    ...toSummary(row, lineRows, snapshotTimeZone(settings)),
    job: JSON.parse(row.job!) as RevisionFields & { number: string },
    spec: stored.spec,
    settings,
    prices: JSON.parse(row.prices!),
    quantityBreaks: JSON.parse(row.quantity_breaks!) as unknown[],
    document: JSON.parse(row.document!),
    decision: row.decision ? JSON.parse(row.decision) as IssueDecision : null,
    lines,
    madeBy: row.made_by ?? '',
  });
}

/** What the service worked out for one line: the job revision it priced, the estimate and the breaks. */
export interface QuoteLineSnapshot {
  jobId: number;
  /** The job revision the figures were worked from: the issue is refused if the job was saved since. */
  jobRevision: number;
  prices: unknown;
  quantityBreaks: number[];
}

/** What the service worked out for a quotation: its lines, the document model and any decision. */
export interface QuotationSnapshot {
  lines: QuoteLineSnapshot[];
  validityDays: number;
  document: unknown;
  decision: IssueDecision | null;
}

/** A one-line quotation, as the snapshot of a single job's quote has always been given. */
export type QuoteSnapshot = QuoteLineSnapshot & Omit<QuotationSnapshot, 'lines'>;

/** A quoted job moves to "quoted" from draft (or stays there when quoted again); later states are kept. */
const MOVES_TO_QUOTED = new Set(['draft', 'quoted', 'lost']);

interface HeldLine { row: JobRow; job: RevisionFields & { number: string }; spec: unknown; snapshot: QuoteLineSnapshot }

/** The job of a line as it stands, refused when it was saved since it was priced. */
function holdLine(store: Store, snapshot: QuoteLineSnapshot, index: number, count: number): HeldLine {
  const path = count === 1 ? 'jobId' : `jobIds[${index}]`;
  const row = jobRow(store, snapshot.jobId);
  if (!row) throw new StoreError('not-found', `no job with id ${snapshot.jobId}`, path);
  if (row.revision !== snapshot.jobRevision) {
    throw new StoreError('stale-revision', `job ${row.number} was saved while the quote was being priced: issue it again`, path);
  }
  const stored = storedSpecOf(row);
  if (!stored.ok) throw new StoreError(stored.problem.code, stored.problem.message, stored.problem.path);
  return { row, job: { number: row.number, ...revisionFields(store, stateOfRow(row)) }, spec: stored.spec, snapshot };
}

function moveToQuoted(store: Store, row: JobRow, number: string): void {
  if (!MOVES_TO_QUOTED.has(row.status) || row.status === 'quoted') return;
  const moved = updateJob(store, { id: row.id, status: 'quoted' }, `quoted (${number})`);
  if (!moved.ok) throw new StoreError(moved.error.code, moved.error.message, moved.error.path);
}

/**
 * Records an issued quotation: copies each line's job as it stands, its spec and figures, and the whole shop
 * settings with the document into rows that can never change afterwards, and moves every job to "quoted".
 */
export function recordQuotation(store: Store, snapshot: QuotationSnapshot): StoreResult<Quote> {
  return attempt(() => {
    const id = inTransaction(store, () => {
      if (snapshot.lines.length === 0) throw new StoreError('invalid-input', 'a quotation needs at least one line', 'jobIds');
      const held = snapshot.lines.map((l, i) => holdLine(store, l, i, snapshot.lines.length));
      const first = held[0]!;
      const settings = readSettings(store);
      const number = takeNumber(store, 'quotes');
      const result = store.sql(`INSERT INTO quotes (number, job_id, job_revision, issued_at, validity_days, currency, job, spec,
                                  settings, prices, quantity_breaks, document, decision, made_by, line_count) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`)
        .run(number, first.row.id, first.row.revision, store.now().toISOString(), snapshot.validityDays, settings.defaults.currency,
          JSON.stringify(first.job), JSON.stringify(first.spec), JSON.stringify(settings), JSON.stringify(first.snapshot.prices),
          JSON.stringify(first.snapshot.quantityBreaks), JSON.stringify(snapshot.document),
          snapshot.decision === null ? null : JSON.stringify(snapshot.decision), store.author, held.length);
      const quoteId = Number(result.lastInsertRowid);
      const insertLine = store.sql(`INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
                                    VALUES (?, ?, ?, ?, ?, ?, ?, ?)`);
      held.forEach((h, i) => {
        insertLine.run(quoteId, i + 1, h.row.id, h.row.revision, JSON.stringify(h.job), JSON.stringify(h.spec),
          JSON.stringify(h.snapshot.prices), JSON.stringify(h.snapshot.quantityBreaks));
        moveToQuoted(store, h.row, number);
      });
      return quoteId;
    });
    return getQuote(store, { id });
  });
}

/** Records the quote of one job: a one-line quotation. */
export function recordQuote(store: Store, snapshot: QuoteSnapshot): StoreResult<Quote> {
  const { jobId, jobRevision, prices, quantityBreaks, ...rest } = snapshot;
  return recordQuotation(store, { ...rest, lines: [{ jobId, jobRevision, prices, quantityBreaks }] });
}

const linesOf = (store: Store, quoteId: number): LineRow[] =>
  store.sql('SELECT * FROM quote_lines WHERE quote_id = ? ORDER BY line').all(quoteId) as LineRow[];

export function getQuote(store: Store, key: { id: number } | { number: string }): StoreResult<Quote> {
  const row = ('id' in key
    ? store.sql('SELECT * FROM quotes WHERE id = ?').get(key.id)
    : store.sql('SELECT * FROM quotes WHERE number = ?').get(key.number)) as QuoteRow | undefined;
  if (!row) return failure('not-found', `no quote ${'id' in key ? `with id ${key.id}` : key.number}`, 'id' in key ? 'id' : 'number');
  return toQuote(row, linesOf(store, row.id));
}

const SUMMARY = 'q.id, q.number, q.job_id, q.job_revision, q.issued_at, q.validity_days, q.currency';

/** The lines of a page of quotes, without their specs and figures. */
function lineSummaries(store: Store, quoteIds: readonly number[]): Map<number, LineRow[]> {
  const byQuote = new Map<number, LineRow[]>(quoteIds.map((id) => [id, []]));
  if (quoteIds.length === 0) return byQuote;
  // Plain placeholders, one per quote of the page: the same statement reads on SQLite and PostgreSQL.
  const rows = store.sql(`SELECT quote_id, line, job_id, job_revision, job FROM quote_lines
                          WHERE quote_id IN (${quoteIds.map(() => '?').join(', ')}) ORDER BY quote_id, line`).all(...quoteIds) as LineRow[];
  for (const r of rows) byQuote.get(r.quote_id)!.push(r);
  return byQuote;
}

/** A job's quote history: every quotation it is a line of, newest first, read through `quote_lines_by_job`. */
export const quoteHistorySql = `SELECT ${SUMMARY} FROM quote_lines l JOIN quotes q ON q.id = l.quote_id WHERE l.job_id = ?
                 ORDER BY q.issued_at DESC, q.id DESC LIMIT ? OFFSET ?`;

/** Issued quotes, newest first, for the whole shop or for one job: every quotation the job is a line of. */
export function listQuotes(store: Store, raw: unknown): StoreResult<QuoteSummary[]> {
  const parsed = parseWith(listQuotesSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { jobId, limit, offset } = parsed.value;
  const rows = (jobId === undefined
    ? store.sql(`SELECT ${SUMMARY} FROM quotes q ORDER BY q.issued_at DESC, q.id DESC LIMIT ? OFFSET ?`).all(limit, offset)
    : store.sql(quoteHistorySql).all(jobId, limit, offset)
  ) as QuoteRow[];
  const lines = lineSummaries(store, rows.map((r) => r.id));
  const zone = shopTimeZone(store);
  return success(rows.map((r) => toSummary(r, lines.get(r.id)!, zone)));
}
