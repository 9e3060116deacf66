import { closeSync, createReadStream, openSync, readFileSync, readSync, statSync } from 'node:fs';
import type { ImportResult } from '../../core/api/store';
import { importFileSchema } from '../../core/api/store';
import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import { StoreError, failure, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { CheckedJob } from '../jobs/input';
import { checkSpec } from '../jobs/input';
import { writeNewJob } from '../jobs/write';
import { openStore } from '../open';
import type { Store } from '../store';
import { inTransaction, readOnlyError, writeFailure } from '../store';
import { parseWith, zodErrors } from '../../core/validation';
import type { CsvRecord } from './csv';
import { CsvSyntaxError, csvRecords, parseCsv, unguarded } from './csv';
import { CSV_IMPORTED, documentHeadSchema, importRecordSchema } from './document';
import type { CheckedFirstOff } from './first-off';
import { checkImportedFirstOff, writeImportedFirstOff } from './first-off';
import { JsonListSplitter } from './json-list';
import type { LongRun } from '../long-run';
import { cancelled } from '../long-run';

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

/** Field errors kept for the answer; the count of bad records goes on past it. */
const KEPT_ERRORS = 1000;

/**
 * One import: each record is checked as it arrives and, while every record so far was good, written at
 * once inside the caller's transaction. A bad record stops the writing (the caller rolls back) but not the
 * checking, so the answer names every bad record, as a check of the whole file first would.
 */
class ImportRun {
  private readonly errors: FieldError[] = [];
  private badRecords = 0;
  private readonly seen = new Map<string, string>();
  readonly imported: { id: number; number: string }[] = [];

  constructor(private readonly store: Store, private readonly renumber: boolean) {}

  get failed(): boolean {
    return this.badRecords > 0;
  }

  reject(errors: FieldError[]): void {
    this.badRecords++;
    this.errors.push(...errors.slice(0, Math.max(0, KEPT_ERRORS - this.errors.length)));
  }

  private numberError(item: CheckedItem): FieldError | undefined {
    if (this.renumber || item.number === undefined) return undefined;
    const path = `${item.at}.number`;
    const earlier = this.seen.get(item.number);
    this.seen.set(item.number, item.at);
    if (earlier) return fieldError('duplicate-number', path, `job number ${item.number} is also used by ${earlier}`);
    if (this.store.sql('SELECT 1 FROM jobs WHERE number = ?').get(item.number) !== undefined) {
      return fieldError('duplicate-number', path, `job number ${item.number} is already in this store (import with renumber to give new numbers)`);
    }
    return undefined;
  }

  take(item: ImportItem): void {
    const checked = checkItem(item);
    if (!checked.ok) return this.reject(checked.errors);
    const clash = this.numberError(checked.value);
    if (clash) return this.reject([clash]);
    if (this.failed) return;
    const c = checked.value;
    const id = writeNewJob(this.store, c, {
      number: this.renumber ? undefined : c.number, reason: 'imported', createdAt: c.createdAt, updatedAt: c.updatedAt,
    }, c.at);
    writeImportedFirstOff(this.store, id, c.firstOff);
    this.imported.push({ id, number: (this.store.sql('SELECT number FROM jobs WHERE id = ?').get(id) as { number: string }).number });
  }

  refusal(): StoreResult<never> {
    const first = this.errors[0]!;
    return failure(first.code, `${this.badRecords} record(s) are not valid, nothing was imported: ${first.path}: ${first.message}`, first.path, this.errors);
  }
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

const headerError = () => fieldError('invalid-csv', 'lines[1]', 'the first line must name the columns, including spec');

/** One CSV line as an import record; a column that does not read becomes the record's error. */
function csvItem(header: string[], row: CsvRecord): ImportItem | FieldError[] {
  const at: PropertyKey[] = ['lines', row.line];
  const raw: Record<string, unknown> = {};
  const errors: FieldError[] = [];
  header.forEach((column, i) => {
    const blankOptional = (row.fields[i] ?? '') === '' && ['number', 'createdAt', 'updatedAt'].includes(column);
    if (!CSV_IMPORTED.has(column) || blankOptional) return;
    const value = csvValue(column, unguarded(row.fields[i] ?? ''), at);
    if (value.ok) raw[column] = value.value;
    else errors.push(...value.errors);
  });
  return errors.length > 0 ? errors : { at, raw: withCustomerContact(raw) };
}

/** Feeds the run from CSV records (the first names the columns). */
function csvTaker(run: ImportRun) {
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
function jsonTaker(run: ImportRun) {
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

function detectFormat(start: string, file: string | undefined, given: 'json' | 'csv' | undefined): 'json' | 'csv' {
  if (given) return given;
  if (file?.toLowerCase().endsWith('.csv')) return 'csv';
  return start.replace(/^\uFEFF/, '').trimStart().startsWith('{') ? 'json' : 'csv';
}

/** A problem with the file as a whole (not JSON, no header, bad CSV syntax): nothing was imported. */
class WholeFileError extends Error {
  constructor(readonly errors: FieldError[]) {
    super(errors[0]?.message);
  }
}

const rollback = (store: Store) => {
  if (store.db.inTransaction) store.db.exec('ROLLBACK');
};

function fileText(file: string): Result<string> {
  try {
    return ok(readFileSync(file, 'utf8'));
  } catch (e) {
    return fail([fieldError('unreadable-file', 'file', `${file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`)]);
  }
}

/** Import from text held in memory (the screen's upload): checked and written in one transaction, or none. */
export function importJobs(store: Store, input: unknown): StoreResult<ImportResult> {
  const parsed = parseWith(importFileSchema, input);
  if (!parsed.ok) return invalid(parsed.errors);
  const text = parsed.value.text !== undefined ? ok(parsed.value.text) : fileText(parsed.value.file!);
  if (!text.ok) return invalid(text.errors);
  const format = detectFormat(text.value.slice(0, 64), parsed.value.file, parsed.value.format);
  const run = new ImportRun(store, parsed.value.renumber);
  const Refused = Symbol('refused');
  try {
    inTransaction(store, () => {
      if (format === 'json') {
        const json = jsonTaker(run);
        json.feed(text.value.replace(/^\uFEFF/, ''));
        const headErrors = json.end();
        if (headErrors.length > 0) throw new WholeFileError(headErrors);
      } else {
        const take = csvTaker(run);
        const records = parseCsv(text.value);
        const wrong = records.length === 0 ? headerError() : records.map(take).find((e) => e !== undefined);
        if (wrong) throw new WholeFileError([wrong]);
      }
      if (run.failed) throw Refused;
    });
  } catch (e) {
    return answerOf(e, run, Refused);
  }
  return success({ imported: run.imported });
}

function answerOf(e: unknown, run: ImportRun, refused?: symbol): StoreResult<never> {
  if (e === refused) return run.refusal();
  if (e instanceof WholeFileError) return invalid(e.errors);
  if (e instanceof CsvSyntaxError) return invalid([fieldError('invalid-csv', `lines[${e.line}]`, e.message)]);
  if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
  throw e;
}

/** Text of the file a piece at a time, counting the bytes read for progress. */
async function* pieces(file: string, onBytes: (bytes: number) => void): AsyncGenerator<string> {
  let bytes = 0;
  const stream = createReadStream(file, { highWaterMark: 256 * 1024 });
  stream.on('data', (chunk) => { bytes += chunk.length; });
  stream.setEncoding('utf8');
  for await (const piece of stream as AsyncIterable<string>) {
    yield piece;
    onBytes(bytes);
  }
}

async function feedFile(file: string, format: 'json' | 'csv', run: ImportRun, long: LongRun, total: number): Promise<void> {
  const check = (bytes: number) => {
    if (long.signal?.aborted) throw cancelled('import');
    long.onProgress?.(bytes, total);
  };
  if (format === 'json') {
    const json = jsonTaker(run);
    for await (const piece of pieces(file, check)) json.feed(piece);
    const headErrors = json.end();
    if (headErrors.length > 0) throw new WholeFileError(headErrors);
    return;
  }
  const take = csvTaker(run);
  let records = 0;
  for await (const record of csvRecords(pieces(file, check))) {
    records++;
    const wrong = take(record);
    if (wrong) throw new WholeFileError([wrong]);
  }
  if (records === 0) throw new WholeFileError([headerError()]);
}

/** The first bytes of the file, to tell JSON from CSV when neither the caller nor the name says. */
function readStart(file: string): string {
  const fd = openSync(file, 'r');
  try {
    const buffer = Buffer.alloc(64);
    return buffer.toString('utf8', 0, readSync(fd, buffer, 0, 64, 0));
  } finally {
    closeSync(fd);
  }
}

/**
 * Import from a file, streamed: the file is read in pieces, each record checked and written as it comes,
 * all inside one transaction on a connection of its own, committed only when every record was good. So
 * memory stays flat at any file size, a cancel or a bad record rolls everything back, and a process killed
 * half-way leaves the store as it was (SQLite drops the uncommitted transaction). Other saves meanwhile
 * wait for the import, up to the store's busy timeout.
 */
export async function importJobsFromFile(store: Store, input: unknown, long: LongRun = {}): Promise<StoreResult<ImportResult>> {
  const parsed = parseWith(importFileSchema, input);
  if (!parsed.ok) return invalid(parsed.errors);
  const { file, renumber } = parsed.value;
  if (file === undefined) return importJobs(store, parsed.value);
  if (store.readOnly) return { ok: false, error: readOnlyError(store, store.readOnly).toApiError() };
  let total: number;
  let start: string;
  try {
    total = statSync(file).size;
    start = readStart(file);
  } catch (e) {
    return invalid([fieldError('unreadable-file', 'file', `${file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`)]);
  }
  const writer = openStore(store.file, { check: 'none', clock: () => store.now() });
  const run = new ImportRun(writer, renumber);
  try {
    writer.db.exec('BEGIN IMMEDIATE');
    await feedFile(file, detectFormat(start, file, parsed.value.format), run, long, total);
    if (run.failed) {
      rollback(writer);
      return run.refusal();
    }
    writer.db.exec('COMMIT');
    long.onProgress?.(total, total);
    return success({ imported: run.imported });
  } catch (e) {
    rollback(writer);
    return answerOf(e instanceof StoreError || e instanceof WholeFileError || e instanceof CsvSyntaxError ? e : writeFailure(writer, e), run);
  } finally {
    writer.close();
  }
}
