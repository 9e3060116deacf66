import type { Quote, QuoteSummary, RevisionFields } from '../core/api/store';
import { listQuotesSchema } from '../core/api/store';
import type { IssueDecision } from '../core/quoting/problems';
import type { Settings } from '../core/settings/schema';
import { StoreError, failure, invalid, success } from './errors';
import type { StoreResult } from './errors';
import { takeNumber } from './jobs/numbering';
import { jobRow } from './jobs/read';
import { storedSpecOf } from './jobs/rows';
import { readStoredSpec } from './jobs/stored-spec';
import { revisionFields, stateOfRow } from './jobs/state';
import { attempt, updateJob } from './jobs/write';
import { readSettings } from './settings';
import type { Store } from './store';
import { inTransaction } from './store';
import { parseWith } from '../core/validation';

interface QuoteRow {
  id: number; number: string; job_id: number; job_revision: number; issued_at: string; validity_days: number;
  currency: string; job?: string; spec?: string; settings?: string; prices?: string; quantity_breaks?: string; document?: string;
  decision?: string | null; made_by?: string;
}

const DAY_MS = 86_400_000;

function toSummary(row: QuoteRow): QuoteSummary {
  const validUntil = new Date(Date.parse(row.issued_at) + row.validity_days * DAY_MS).toISOString().slice(0, 10);
  return {
    id: row.id, number: row.number, jobId: row.job_id, jobRevision: row.job_revision, issuedAt: row.issued_at,
    validityDays: row.validity_days, validUntil, currency: row.currency,
  };
}

/** The issued quote as it was; a spec that no longer reads is this quote's problem, named with its field. */
function toQuote(row: QuoteRow): StoreResult<Quote> {
  const stored = readStoredSpec(row.spec, `quote ${row.number}`);
  if (!stored.ok) return failure(stored.problem.code, stored.problem.message, stored.problem.path);
  return success({
    ...toSummary(row),
    job: JSON.parse(row.job!) as RevisionFields & { number: string },
    spec: stored.spec,
    settings: JSON.parse(row.settings!) as Settings,
    prices: JSON.parse(row.prices!),
    quantityBreaks: JSON.parse(row.quantity_breaks!) as unknown[],
    document: JSON.parse(row.document!),
    decision: row.decision ? JSON.parse(row.decision) as IssueDecision : null,
    madeBy: row.made_by ?? '',
  });
}

/** What the service worked out for a quote: the estimate, the breaks, the document model and any decision. */
export interface QuoteSnapshot {
  jobId: number;
  /** The job revision the figures were worked from: the issue is refused if the job was saved since. */
  jobRevision: number;
  validityDays: number;
  prices: unknown;
  quantityBreaks: number[];
  document: unknown;
  decision: IssueDecision | null;
}

/** A quoted job moves to "quoted" from draft (or stays there when quoted again); later states are kept. */
const MOVES_TO_QUOTED = new Set(['draft', 'quoted', 'lost']);

/**
 * Records an issued quote: copies the job as it stands, its spec and the whole shop settings with the
 * service's figures into one row that can never change afterwards, and moves the job to "quoted".
 */
export function recordQuote(store: Store, snapshot: QuoteSnapshot): StoreResult<Quote> {
  return attempt(() => {
    const id = inTransaction(store, () => {
      const row = jobRow(store, snapshot.jobId);
      if (!row) throw new StoreError('not-found', `no job with id ${snapshot.jobId}`, 'jobId');
      if (row.revision !== snapshot.jobRevision) {
        throw new StoreError('stale-revision', `job ${row.number} was saved while the quote was being priced: issue it again`, 'jobId');
      }
      const stored = storedSpecOf(row);
      if (!stored.ok) throw new StoreError(stored.problem.code, stored.problem.message, stored.problem.path);
      const settings = readSettings(store);
      const number = takeNumber(store, 'quotes');
      const job = { number: row.number, ...revisionFields(store, stateOfRow(row)) };
      const result = store.sql(`INSERT INTO quotes (number, job_id, job_revision, issued_at, validity_days, currency, job, spec,
                                  settings, prices, quantity_breaks, document, decision, made_by) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`)
        .run(number, row.id, row.revision, store.now().toISOString(), snapshot.validityDays, settings.defaults.currency,
          JSON.stringify(job), JSON.stringify(stored.spec), JSON.stringify(settings), JSON.stringify(snapshot.prices),
          JSON.stringify(snapshot.quantityBreaks), JSON.stringify(snapshot.document),
          snapshot.decision === null ? null : JSON.stringify(snapshot.decision), store.author);
      if (MOVES_TO_QUOTED.has(row.status) && row.status !== 'quoted') {
        const moved = updateJob(store, { id: row.id, status: 'quoted' }, `quoted (${number})`);
        if (!moved.ok) throw new StoreError(moved.error.code, moved.error.message, moved.error.path);
      }
      return Number(result.lastInsertRowid);
    });
    return getQuote(store, { id });
  });
}

export function getQuote(store: Store, key: { id: number } | { number: string }): StoreResult<Quote> {
  const row = 'id' in key
    ? store.sql('SELECT * FROM quotes WHERE id = ?').get(key.id)
    : store.sql('SELECT * FROM quotes WHERE number = ?').get(key.number);
  if (!row) return failure('not-found', `no quote ${'id' in key ? `with id ${key.id}` : key.number}`, 'id' in key ? 'id' : 'number');
  return toQuote(row as QuoteRow);
}

const SUMMARY = 'id, number, job_id, job_revision, issued_at, validity_days, currency';

/** Issued quotes, newest first, for one job or the whole shop. */
export function listQuotes(store: Store, raw: unknown): StoreResult<QuoteSummary[]> {
  const parsed = parseWith(listQuotesSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { jobId, limit, offset } = parsed.value;
  const rows = (jobId === undefined
    ? store.sql(`SELECT ${SUMMARY} FROM quotes ORDER BY issued_at DESC, id DESC LIMIT ? OFFSET ?`).all(limit, offset)
    : store.sql(`SELECT ${SUMMARY} FROM quotes WHERE job_id = ? ORDER BY issued_at DESC, id DESC LIMIT ? OFFSET ?`).all(jobId, limit, offset)
  ) as QuoteRow[];
  return success(rows.map(toSummary));
}
