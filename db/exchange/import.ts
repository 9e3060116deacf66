import { readFileSync } from 'node:fs';
import type { ImportResult } from '../../core/api/store';
import { importFileSchema } from '../../core/api/store';
import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import { failure, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { CheckedJob } from '../jobs/input';
import { checkSpec } from '../jobs/input';
import { attempt, writeNewJob } from '../jobs/write';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { parseWith, zodErrors } from '../../core/validation';
import { CsvSyntaxError, parseCsv, unguarded } from './csv';
import { CSV_IMPORTED, documentHeadSchema, importRecordSchema } from './document';
import type { CheckedFirstOff } from './first-off';
import { checkImportedFirstOff, writeImportedFirstOff } from './first-off';

interface ImportItem {
  /** "jobs[3]" for JSON, "lines[7]" (line 7 of the file) for CSV. */
  at: PropertyKey[];
  raw: unknown;
}

interface CheckedItem extends CheckedJob {
  at: string;
  number?: string | undefined;
  createdAt?: string | undefined;
  updatedAt?: string | undefined;
  firstOff: CheckedFirstOff[];
}

function checkItem(item: ImportItem): Result<CheckedItem> {
  const parsed = importRecordSchema.safeParse(item.raw);
  const spec = typeof item.raw === 'object' && item.raw !== null ? (item.raw as { spec?: unknown }).spec : undefined;
  const specCheck = checkSpec(spec, [...item.at, 'spec']);
  if (!parsed.success || !specCheck.ok) {
    return fail([...(parsed.success ? [] : zodErrors(parsed.error, item.at)), ...(specCheck.ok ? [] : specCheck.errors)]);
  }
  const { number, createdAt, updatedAt, firstOff: rawFirstOff, ...fields } = parsed.data;
  const firstOff = checkImportedFirstOff(rawFirstOff, specCheck.value.spec, item.at);
  if (!firstOff.ok) return firstOff;
  return ok({ at: formatPath(item.at), fields, ...specCheck.value, number, createdAt, updatedAt, firstOff: firstOff.value });
}

function numberErrors(store: Store, items: CheckedItem[]): FieldError[] {
  const errors: FieldError[] = [];
  const seen = new Map<string, string>();
  for (const item of items) {
    if (item.number === undefined) continue;
    const path = `${item.at}.number`;
    const earlier = seen.get(item.number);
    if (earlier) errors.push(fieldError('duplicate-number', path, `job number ${item.number} is also used by ${earlier}`));
    else if (store.sql('SELECT 1 FROM jobs WHERE number = ?').get(item.number) !== undefined) {
      errors.push(fieldError('duplicate-number', path, `job number ${item.number} is already in this store (import with renumber to give new numbers)`));
    }
    seen.set(item.number, item.at);
  }
  return errors;
}

function jsonItems(text: string): Result<ImportItem[]> {
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    return fail([fieldError('invalid-json', '', `not valid JSON (${(e as Error).message})`)]);
  }
  const head = parseWith(documentHeadSchema, doc);
  if (!head.ok) return head;
  return ok(head.value.jobs.map((raw, i) => ({ at: ['jobs', i], raw })));
}

function csvValue(column: string, text: string, at: PropertyKey[]): Result<unknown> {
  if (column === 'spec' || column === 'judgement') {
    if (column === 'judgement' && text === '') return ok(undefined);
    try {
      return ok(JSON.parse(text));
    } catch (e) {
      return fail([fieldError('invalid-json', formatPath([...at, column]), `the ${column} column is not valid JSON (${(e as Error).message})`)]);
    }
  }
  if (column === 'customer') return ok(text === '' ? null : { name: text });
  if (['dueDate', 'orderQuantity', 'leadTimeDays'].includes(column) && text === '') return ok(null);
  if (['orderQuantity', 'leadTimeDays'].includes(column) && /^-?\d+(\.\d+)?$/.test(text)) return ok(Number(text));
  return ok(text);
}

/** The e-mail and phone columns belong to the customer object; without a customer they say nothing. */
function withCustomerContact(raw: Record<string, unknown>): Record<string, unknown> {
  const { customerEmail, customerPhone, ...rest } = raw;
  if (rest.customer === null || rest.customer === undefined) return rest;
  const contact = {
    ...(customerEmail !== undefined && customerEmail !== '' ? { email: customerEmail } : {}),
    ...(customerPhone !== undefined && customerPhone !== '' ? { phone: customerPhone } : {}),
  };
  return { ...rest, customer: { ...(rest.customer as object), ...contact } };
}

function csvItems(text: string): Result<ImportItem[]> {
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    if (e instanceof CsvSyntaxError) return fail([fieldError('invalid-csv', `lines[${e.line}]`, e.message)]);
    throw e;
  }
  const [header, ...rows] = records;
  if (!header || !header.fields.includes('spec')) return fail([fieldError('invalid-csv', 'lines[1]', 'the first line must name the columns, including spec')]);
  const errors: FieldError[] = [];
  const items = rows.map((row) => {
    const at: PropertyKey[] = ['lines', row.line];
    const raw: Record<string, unknown> = {};
    header.fields.forEach((column, i) => {
      const blankOptional = (row.fields[i] ?? '') === '' && ['number', 'createdAt', 'updatedAt'].includes(column);
      if (!CSV_IMPORTED.has(column) || blankOptional) return;
      const value = csvValue(column, unguarded(row.fields[i] ?? ''), at);
      if (value.ok) raw[column] = value.value;
      else errors.push(...value.errors);
    });
    return { at, raw: withCustomerContact(raw) };
  });
  return errors.length > 0 ? fail(errors) : ok(items);
}

function importText(raw: { file?: string | undefined; text?: string | undefined }): Result<string> {
  if (raw.text !== undefined) return ok(raw.text);
  try {
    return ok(readFileSync(raw.file!, 'utf8'));
  } catch (e) {
    return fail([fieldError('unreadable-file', 'file', `${raw.file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`)]);
  }
}

function detectFormat(text: string, file: string | undefined, given: 'json' | 'csv' | undefined): 'json' | 'csv' {
  if (given) return given;
  if (file?.toLowerCase().endsWith('.csv')) return 'csv';
  return text.trimStart().startsWith('{') ? 'json' : 'csv';
}

/** Checks every record (schema, parseSpec, numbers), then writes all of them in one transaction, or none. */
export function importJobs(store: Store, input: unknown): StoreResult<ImportResult> {
  const parsed = parseWith(importFileSchema, input);
  if (!parsed.ok) return invalid(parsed.errors);
  const text = importText(parsed.value);
  if (!text.ok) return invalid(text.errors);
  const format = detectFormat(text.value, parsed.value.file, parsed.value.format);
  const items = format === 'json' ? jsonItems(text.value) : csvItems(text.value);
  if (!items.ok) return invalid(items.errors);
  const checks = items.value.map(checkItem);
  const errors = checks.flatMap((c) => (c.ok ? [] : c.errors));
  const checked = checks.flatMap((c) => (c.ok ? [c.value] : []));
  if (!parsed.value.renumber) errors.push(...numberErrors(store, checked));
  if (errors.length > 0) {
    const records = new Set(errors.map((e) => e.path.replace(/^((jobs|lines)\[\d+\]).*$/, '$1'))).size;
    return failure(errors[0]!.code, `${records} record(s) are not valid, nothing was imported: ${errors[0]!.path}: ${errors[0]!.message}`, errors[0]!.path, errors);
  }
  return attempt(() => success({ imported: inTransaction(store, () => checked.map((item) => {
    const id = writeNewJob(store, item, {
      number: parsed.value.renumber ? undefined : item.number, reason: 'imported',
      createdAt: item.createdAt, updatedAt: item.updatedAt,
    }, item.at);
    writeImportedFirstOff(store, id, item.firstOff);
    return { id, number: (store.sql('SELECT number FROM jobs WHERE id = ?').get(id) as { number: string }).number };
  })) }));
}
