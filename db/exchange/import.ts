import { closeSync, createReadStream, openSync, readFileSync, readSync, statSync } from 'node:fs';
import type { ImportResult } from '../../core/api/store';
import { importFileSchema } from '../../core/api/store';
import type { Result } from '../../core/result';
import { fail, fieldError, ok } from '../../core/result';
import { parseWith } from '../../core/validation';
import { StoreError, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { LongRun } from '../long-run';
import { cancelled } from '../long-run';
import { openStore } from '../open';
import type { SqliteStore, Store } from '../store';
import { inTransaction, isSqliteStore, writeFailure, writeRefusal } from '../store';
import { CsvSyntaxError, csvRecords, parseCsv } from './csv';
import { WholeFileError, csvTaker, detectFormat, headerError, jsonTaker } from './import-formats';
import { ImportRun } from './import-run';

const rollback = (store: SqliteStore) => {
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
      run.finish();
    });
  } catch (e) {
    return answerOf(e, run, Refused);
  }
  return success(run.result());
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
  // A store without a file of its own (in memory) cannot be opened twice: it imports on its own connection.
  // A server store imports in one transaction of its own connection, the server keeping others' reads consistent.
  if (file === undefined || !isSqliteStore(store) || store.file === ':memory:' || store.file === '') return importJobs(store, parsed.value);
  const refused = writeRefusal(store);
  if (refused) return { ok: false, error: refused.toApiError() };
  let total: number;
  let start: string;
  try {
    total = statSync(file).size;
    start = readStart(file);
  } catch (e) {
    return invalid([fieldError('unreadable-file', 'file', `${file}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`)]);
  }
  const writer = openStore(store.file, { check: 'none', clock: () => store.now() });
  writer.author = store.author;
  const run = new ImportRun(writer, renumber);
  try {
    writer.db.exec('BEGIN IMMEDIATE');
    await feedFile(file, detectFormat(start, file, parsed.value.format), run, long, total);
    if (run.failed) {
      rollback(writer);
      return run.refusal();
    }
    run.finish();
    writer.db.exec('COMMIT');
    long.onProgress?.(total, total);
    return success(run.result());
  } catch (e) {
    rollback(writer);
    return answerOf(e instanceof StoreError || e instanceof WholeFileError || e instanceof CsvSyntaxError ? e : writeFailure(writer, e), run);
  } finally {
    writer.close();
  }
}
