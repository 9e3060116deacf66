import { existsSync } from 'node:fs';
import type { ExportResult, JobStatus, StoredProblem } from '../../core/api/store';
import { exportFileSchema } from '../../core/api/store';
import { kindEntryOf } from '../../core/kinds/registry';
import { findGrade } from '../../core/materials/catalog';
import type { SpringKind } from '../../core/spec';
import { fromInternal } from '../../core/units';
import type { UnitSystem } from '../../core/units';
import { parseWith } from '../../core/validation';
import { StoreError, failure, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, judgementOf, storedSpecOf } from '../jobs/rows';
import type { StoredSpec } from '../jobs/stored-spec';
import { carriedSpec } from '../jobs/stored-spec';
import { jobFilter } from '../search/list';
import type { Store } from '../store';
import { csvLines } from './csv';
import type { JobRecord } from './document';
import { CSV_COLUMNS, EXCHANGE_FORMAT, EXCHANGE_VERSION } from './document';
import type { FirstOffExport } from './first-off';
import { firstOffByJob } from './first-off';
import type { JobRelations } from './relations';
import { relationsByJob } from './relations';
import type { LongRun, TextSink } from '../long-run';
import { cancelled, fileSink, yieldToEvents } from '../long-run';
import { specCells, tradeNumber } from '../../core/spec/columns';

type ExportRow = JobRow & { customer_email: string | null; customer_phone: string | null };

interface ReadRow {
  row: ExportRow;
  stored: StoredSpec;
}

/**
 * Jobs read per statement: the export holds one chunk at a time, so its memory stays flat at any store size.
 * Small, because what a chunk builds is alive when the young heap is swept: 500 kept the process at about
 * 210 MB on a 100 000-job CSV export, 100 at about 150 MB (`npm run bench -- store`).
 */
const CHUNK = 100;

/** The jobs in number order, a chunk at a time (keyset on the unique number), each spec read once. */
function* readChunks(store: Store, status: JobStatus | JobStatus[] | undefined): Generator<ReadRow[]> {
  const where = jobFilter({ status });
  const clauses = [...where.clauses, 'j.number > ?'].join(' AND ');
  const query = store.sql(`SELECT ${SUMMARY_COLUMNS}, c.email AS customer_email, c.phone AS customer_phone
                           FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id WHERE ${clauses} ORDER BY j.number LIMIT ${CHUNK}`);
  let after = '';
  for (;;) {
    const rows = query.all(...where.params, after) as ExportRow[];
    if (rows.length === 0) return;
    yield rows.map((row) => ({ row, stored: storedSpecOf(row) }));
    if (rows.length < CHUNK) return;
    after = rows[rows.length - 1]!.number;
  }
}

function countJobs(store: Store, status: JobStatus | JobStatus[] | undefined): number {
  const where = jobFilter({ status });
  const clause = where.clauses.length > 0 ? `WHERE ${where.clauses.join(' AND ')}` : '';
  return (store.sql(`SELECT count(*) AS n FROM jobs j ${clause}`).get(...where.params) as { n: number }).n;
}

function toRecord({ row, stored }: ReadRow, firstOff: FirstOffExport[] | undefined, relations: JobRelations | undefined): JobRecord {
  return {
    number: row.number,
    customer: row.customer_name === null ? null
      : { name: row.customer_name, email: row.customer_email ?? '', phone: row.customer_phone ?? '' },
    partNumber: row.part_number, drawingNumber: row.drawing_number, drawingRevision: row.drawing_revision,
    status: row.status, notes: row.notes, dueDate: row.due_date, orderQuantity: row.order_quantity,
    leadTimeDays: row.lead_time_days, createdAt: row.created_at, updatedAt: row.updated_at,
    judgement: judgementOf(row.judgement), spec: carriedSpec(stored),
    ...(firstOff ? { firstOff } : {}),
    ...(row.archived_at !== null ? { archivedAt: row.archived_at } : {}),
    ...relations,
  };
}

/** One format's text: what goes before the jobs, each chunk of jobs, and what closes the file. */
interface ExportFormat {
  head(): string;
  chunk(rows: ReadRow[], first: boolean): string;
  tail(): string;
}

/**
 * The coilwright-jobs document, the lossless format: one job per line inside the jobs list, so an import
 * (and a person with a text editor) can take it a job at a time. Each job carries what ties it to others
 * (the job it was made from, its enquiry) by number and key, never by this store's ids.
 */
function jsonFormat(store: Store): ExportFormat {
  return {
    head: () => `{\n  "format": ${JSON.stringify(EXCHANGE_FORMAT)},\n  "version": ${EXCHANGE_VERSION},\n`
      + `  "exportedAt": ${JSON.stringify(store.now().toISOString())},\n  "jobs": [`,
    chunk(rows, first) {
      const ids = rows.map((r) => r.row.id);
      const firstOff = firstOffByJob(store, ids);
      const relations = relationsByJob(store, ids);
      return rows.map((r, i) => `${first && i === 0 ? '' : ','}\n    ${JSON.stringify(toRecord(r, firstOff.get(r.row.id), relations.get(r.row.id)))}`).join('');
    },
    tail: () => '\n  ]\n}\n',
  };
}

/** The rate in the job's units: stored internally, in the kind's own rate quantity. */
function shownRate(row: ExportRow): string {
  if (row.rate === null || !Number.isFinite(row.rate)) return '';
  const quantity = kindEntryOf(row.kind as SpringKind).shape.rateQuantity;
  return tradeNumber(fromInternal(row.rate, quantity, row.units as UnitSystem), quantity, row.units as UnitSystem);
}

function csvRow({ row, stored }: ReadRow): unknown[] {
  const spec = carriedSpec(stored);
  return [
    row.number, row.customer_name ?? '', row.customer_email ?? '', row.customer_phone ?? '', row.part_number, row.drawing_number,
    row.drawing_revision, row.status, row.notes, row.due_date, row.order_quantity, row.lead_time_days, row.created_at, row.updated_at,
    row.archived_at ?? '', row.kind, row.units, row.material, findGrade(row.material)?.name ?? '', ...specCells(spec, row.units as UnitSystem),
    shownRate(row), JSON.stringify(spec), row.judgement,
  ];
}

const csvFormat: ExportFormat = {
  head: () => csvLines([CSV_COLUMNS]),
  chunk: (rows) => csvLines(rows.map(csvRow)),
  tail: () => '',
};

interface Written {
  count: number;
  problems: StoredProblem[];
}

const named = (problems: StoredProblem[]) => (problems.length > 0 ? { problems } : {});

/** The whole export as one text, for the screen's download of a modest list (the file export streams). */
function exportText(store: Store, format: ExportFormat, status: JobStatus | JobStatus[] | undefined): Written & { text: string } {
  const parts = [format.head()];
  const written: Written = { count: 0, problems: [] };
  for (const rows of readChunks(store, status)) {
    parts.push(format.chunk(rows, written.count === 0));
    note(written, rows);
  }
  parts.push(format.tail());
  return { ...written, text: parts.join('') };
}

function note(written: Written, rows: ReadRow[]): void {
  written.count += rows.length;
  for (const { stored } of rows) if (!stored.ok) written.problems.push(stored.problem);
}

/** Writes the export a chunk at a time; between chunks it reports progress and gives way to other events. */
export async function writeExport(store: Store, input: { format: 'json' | 'csv'; status?: JobStatus | JobStatus[] | undefined }, sink: TextSink, run: LongRun = {}): Promise<Written> {
  const format = input.format === 'csv' ? csvFormat : jsonFormat(store);
  const total = countJobs(store, input.status);
  const written: Written = { count: 0, problems: [] };
  run.onProgress?.(0, total);
  await sink.write(format.head());
  for (const rows of readChunks(store, input.status)) {
    if (run.signal?.aborted) throw cancelled('export');
    await sink.write(format.chunk(rows, written.count === 0));
    note(written, rows);
    run.onProgress?.(written.count, total);
    await yieldToEvents();
  }
  await sink.write(format.tail());
  return written;
}

/** The contract's export (the screen): the text of the file, built in chunks. */
export function exportJobs(store: Store, raw: unknown): StoreResult<ExportResult> {
  const parsed = parseWith(exportFileSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { format, status, file } = parsed.value;
  if (file !== undefined) return failure('file-export-is-streamed', 'an export to a file goes through exportJobsToFile', 'file');
  const written = exportText(store, format === 'csv' ? csvFormat : jsonFormat(store), status);
  return success({ format, count: written.count, text: written.text, ...named(written.problems) });
}

/**
 * Export to a file (command line, the desktop shell's save dialog): streamed into a temporary file beside
 * it, which replaces the file only when complete. Cancelled or failed, nothing is left behind.
 */
export async function exportJobsToFile(store: Store, raw: unknown, run: LongRun = {}): Promise<StoreResult<ExportResult>> {
  const parsed = parseWith(exportFileSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { format, file, status, force } = parsed.value;
  if (file === undefined) return exportJobs(store, parsed.value);
  if (!force && existsSync(file)) {
    return failure('file-exists', `${file} already exists: choose a new name, or replace it on purpose (--force)`, 'file');
  }
  const sink = fileSink(file);
  try {
    const written = await writeExport(store, { format, status }, sink, run);
    await sink.finish();
    return success({ format, count: written.count, file, ...named(written.problems) });
  } catch (e) {
    await sink.abandon();
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
