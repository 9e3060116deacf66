import { writeFileSync } from 'node:fs';
import type { ExportResult, JobStatus } from '../../core/api/store';
import { exportJobsSchema } from '../../core/api/store';
import type { Spec } from '../../core/spec';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, judgementOf } from '../jobs/rows';
import { jobFilter } from '../search/list';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import { csvLine } from './csv';
import type { JobRecord, JobsDocument } from './document';
import { CSV_COLUMNS, EXCHANGE_FORMAT, EXCHANGE_VERSION } from './document';

type ExportRow = JobRow & { customer_email: string | null; customer_phone: string | null };

function exportRows(store: Store, status: JobStatus | JobStatus[] | undefined): ExportRow[] {
  const where = jobFilter({ status });
  const clause = where.clauses.length > 0 ? `WHERE ${where.clauses.join(' AND ')}` : '';
  return store.sql(`SELECT ${SUMMARY_COLUMNS}, j.spec, c.email AS customer_email, c.phone AS customer_phone
                    FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id ${clause} ORDER BY j.number`)
    .all(...where.params) as ExportRow[];
}

function toRecord(row: ExportRow): JobRecord {
  return {
    number: row.number,
    customer: row.customer_name === null ? null
      : { name: row.customer_name, email: row.customer_email ?? '', phone: row.customer_phone ?? '' },
    partNumber: row.part_number, drawingNumber: row.drawing_number, drawingRevision: row.drawing_revision,
    status: row.status, notes: row.notes, dueDate: row.due_date, orderQuantity: row.order_quantity,
    leadTimeDays: row.lead_time_days, createdAt: row.created_at, updatedAt: row.updated_at,
    judgement: judgementOf(row.judgement), spec: JSON.parse(row.spec!) as Spec,
  };
}

export function jobsDocument(store: Store, status?: JobStatus | JobStatus[]): JobsDocument {
  return {
    format: EXCHANGE_FORMAT, version: EXCHANGE_VERSION, exportedAt: store.now().toISOString(),
    jobs: exportRows(store, status).map(toRecord),
  };
}

function csvRow(row: ExportRow): unknown[] {
  return [
    row.number, row.customer_name ?? '', row.part_number, row.drawing_number, row.drawing_revision, row.status,
    row.notes, row.due_date, row.order_quantity, row.lead_time_days, row.created_at, row.updated_at, row.kind,
    row.material, row.units, row.d, row.mean_diameter, row.mean_diameter + row.d, row.free_length,
    row.active_coils, row.rate, row.spec, row.judgement,
  ];
}

/** The job list as CSV: one header line, one line per job; the spec column holds the spec JSON. */
export function jobsCsv(store: Store, status?: JobStatus | JobStatus[]): { text: string; count: number } {
  const rows = exportRows(store, status);
  const lines = [csvLine(CSV_COLUMNS), ...rows.map((r) => csvLine(csvRow(r)))];
  return { text: `${lines.join('\r\n')}\r\n`, count: rows.length };
}

export function exportJobs(store: Store, raw: unknown): StoreResult<ExportResult> {
  const parsed = parseWith(exportJobsSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const { format, file, status } = parsed.value;
  let text: string;
  let count: number;
  if (format === 'csv') ({ text, count } = jobsCsv(store, status));
  else {
    const doc = jobsDocument(store, status);
    text = `${JSON.stringify(doc, null, 2)}\n`;
    count = doc.jobs.length;
  }
  if (file === undefined) return success({ format, count, text });
  writeFileSync(file, text);
  return success({ format, count, file });
}
