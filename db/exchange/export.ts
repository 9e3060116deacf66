import { existsSync } from 'node:fs';
import type { ExportResult, JobStatus, StoredProblem } from '../../core/api/store';
import { exportFileSchema } from '../../core/api/store';
import { StoreError, failure, invalid, success } from '../errors';
import { writeFileReplacing } from '../files';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, judgementOf, storedSpecOf } from '../jobs/rows';
import type { StoredSpec } from '../jobs/stored-spec';
import { carriedSpec } from '../jobs/stored-spec';
import { jobFilter } from '../search/list';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import { csvLine } from './csv';
import type { JobRecord, JobsDocument } from './document';
import { CSV_COLUMNS, EXCHANGE_FORMAT, EXCHANGE_VERSION } from './document';
import type { FirstOffExport } from './first-off';
import { firstOffByJob } from './first-off';

type ExportRow = JobRow & { customer_email: string | null; customer_phone: string | null };

function exportRows(store: Store, status: JobStatus | JobStatus[] | undefined): ExportRow[] {
  const where = jobFilter({ status });
  const clause = where.clauses.length > 0 ? `WHERE ${where.clauses.join(' AND ')}` : '';
  return store.sql(`SELECT ${SUMMARY_COLUMNS}, c.email AS customer_email, c.phone AS customer_phone
                    FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id ${clause} ORDER BY j.number`)
    .all(...where.params) as ExportRow[];
}

interface ReadRow {
  row: ExportRow;
  stored: StoredSpec;
}

/** Every row with its spec read once: the record carries it, and a spec that no longer reads is named. */
function readRows(store: Store, status: JobStatus | JobStatus[] | undefined): ReadRow[] {
  return exportRows(store, status).map((row) => ({ row, stored: storedSpecOf(row) }));
}

function toRecord({ row, stored }: ReadRow, firstOff: FirstOffExport[] | undefined): JobRecord {
  return {
    number: row.number,
    customer: row.customer_name === null ? null
      : { name: row.customer_name, email: row.customer_email ?? '', phone: row.customer_phone ?? '' },
    partNumber: row.part_number, drawingNumber: row.drawing_number, drawingRevision: row.drawing_revision,
    status: row.status, notes: row.notes, dueDate: row.due_date, orderQuantity: row.order_quantity,
    leadTimeDays: row.lead_time_days, createdAt: row.created_at, updatedAt: row.updated_at,
    judgement: judgementOf(row.judgement), spec: carriedSpec(stored),
    ...(firstOff ? { firstOff } : {}),
  };
}

const problemsOf = (rows: ReadRow[]): StoredProblem[] => rows.flatMap(({ stored }) => (stored.ok ? [] : [stored.problem]));

function documentOf(store: Store, rows: ReadRow[], firstOff: Map<number, FirstOffExport[]>): JobsDocument {
  return {
    format: EXCHANGE_FORMAT, version: EXCHANGE_VERSION, exportedAt: store.now().toISOString(),
    jobs: rows.map((r) => toRecord(r, firstOff.get(r.row.id))),
  };
}

export function jobsDocument(store: Store, status?: JobStatus | JobStatus[]): JobsDocument {
  const firstOff = firstOffByJob(store);
  return documentOf(store, readRows(store, status), firstOff);
}

function csvRow(row: ExportRow): unknown[] {
  return [
    row.number, row.customer_name ?? '', row.customer_email ?? '', row.customer_phone ?? '', row.part_number, row.drawing_number, row.drawing_revision, row.status,
    row.notes, row.due_date, row.order_quantity, row.lead_time_days, row.created_at, row.updated_at, row.kind,
    row.material, row.units, row.d, row.mean_diameter, row.mean_diameter + row.d, row.free_length,
    row.active_coils, row.rate, row.spec, row.judgement,
  ];
}

function csvOf(rows: readonly ExportRow[]): string {
  return `${[csvLine(CSV_COLUMNS), ...rows.map((r) => csvLine(csvRow(r)))].join('\r\n')}\r\n`;
}

/** The job list as CSV: one header line, one line per job; the spec column holds the spec JSON as stored. */
export function jobsCsv(store: Store, status?: JobStatus | JobStatus[]): { text: string; count: number } {
  const rows = exportRows(store, status);
  return { text: csvOf(rows), count: rows.length };
}

export function exportJobs(store: Store, raw: unknown): StoreResult<ExportResult> {
  const parsed = parseWith(exportFileSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { format, file, status, force } = parsed.value;
  if (file !== undefined && !force && existsSync(file)) {
    return failure('file-exists', `${file} already exists: choose a new name, or replace it on purpose (--force)`, 'file');
  }
  const rows = readRows(store, status);
  const text = format === 'csv' ? csvOf(rows.map((r) => r.row)) : `${JSON.stringify(documentOf(store, rows, firstOffByJob(store)), null, 2)}\n`;
  const problems = problemsOf(rows);
  const named = problems.length > 0 ? { problems } : {};
  if (file === undefined) return success({ format, count: rows.length, text, ...named });
  try {
    writeFileReplacing(file, text);
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
  return success({ format, count: rows.length, file, ...named });
}
