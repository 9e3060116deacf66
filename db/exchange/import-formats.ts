import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import { parseWith } from '../../core/validation';
import type { CsvRecord } from './csv';
import { unguarded } from './csv';
import { CSV_IMPORTED, documentHeadSchema } from './document';
import type { ImportItem, ImportRun } from './import-run';
import { JsonListSplitter } from './json-list';

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

export const headerError = () => fieldError('invalid-csv', 'lines[1]', 'the first line must name the columns, including spec');

/** One CSV line as an import record; a column that does not read becomes the record's error. */
function csvItem(header: string[], row: CsvRecord): ImportItem | FieldError[] {
  const at: PropertyKey[] = ['lines', row.line];
  const raw: Record<string, unknown> = {};
  const errors: FieldError[] = [];
  header.forEach((column, i) => {
    const blankOptional = (row.fields[i] ?? '') === '' && ['number', 'createdAt', 'updatedAt', 'archivedAt'].includes(column);
    if (!CSV_IMPORTED.has(column) || blankOptional) return;
    const value = csvValue(column, unguarded(row.fields[i] ?? ''), at);
    if (value.ok) raw[column] = value.value;
    else errors.push(...value.errors);
  });
  return errors.length > 0 ? errors : { at, raw: withCustomerContact(raw) };
}

/** Feeds the run from CSV records (the first names the columns). */
export function csvTaker(run: ImportRun) {
  let header: string[] | undefined;
  return (record: CsvRecord): FieldError | undefined => {
    if (header === undefined) {
      if (!record.fields.includes('spec')) return headerError();
      header = record.fields;
      return undefined;
    }
    const item = csvItem(header, record);
    if (Array.isArray(item)) run.reject(item);
    else run.take(item);
    return undefined;
  };
}

/** Feeds the run from the jobs of a coilwright-jobs document, given in pieces; end() checks its head. */
export function jsonTaker(run: ImportRun) {
  const splitter = new JsonListSplitter('jobs');
  let index = 0;
  const takeAll = (texts: string[]) => {
    for (const text of texts) {
      const at = ['jobs', index++];
      try {
        run.take({ at, raw: JSON.parse(text) });
      } catch (e) {
        if (!(e instanceof SyntaxError)) throw e;
        run.reject([fieldError('invalid-json', formatPath(at), `not valid JSON (${e.message})`)]);
      }
    }
  };
  return {
    feed: (text: string) => takeAll(splitter.feed(text)),
    end(): FieldError[] {
      let head: unknown;
      try {
        head = JSON.parse(splitter.rest());
      } catch (e) {
        return [fieldError('invalid-json', '', `not valid JSON (${(e as Error).message})`)];
      }
      const checked = parseWith(documentHeadSchema, head);
      return checked.ok ? [] : checked.errors;
    },
  };
}

export function detectFormat(start: string, file: string | undefined, given: 'json' | 'csv' | undefined): 'json' | 'csv' {
  if (given) return given;
  if (file?.toLowerCase().endsWith('.csv')) return 'csv';
  return start.replace(/^\uFEFF/, '').trimStart().startsWith('{') ? 'json' : 'csv';
}

/** A problem with the file as a whole (not JSON, no header, bad CSV syntax): nothing was imported. */
export class WholeFileError extends Error {
  constructor(readonly errors: FieldError[]) {
    super(errors[0]?.message);
  }
}

