import { createReadStream } from 'node:fs';
import { createInterface } from 'node:readline';
import type { Readable } from 'node:stream';
import { specOfCells } from '../../core/spec/columns';
import { EXIT, InputError } from './io';
import type { ParsedArgs } from './io';
import { terminalProgress } from './progress';

/** Where a spec sits in the batch: its place (from 0) and, for JSON lines and CSV, the line it starts on. */
interface Place {
  spec: number;
  line?: number;
}

type BatchItem = Place & ({ raw: unknown } | { errors: { code: string; path: string; message: string }[] });

/** The file or standard input as a stream; an unreadable file is an input error for the whole batch. */
async function openInput(file: string): Promise<Readable> {
  if (file === '-') return process.stdin;
  const stream = createReadStream(file);
  await new Promise<void>((resolve, reject) => {
    stream.once('open', () => resolve());
    stream.once('error', (e: NodeJS.ErrnoException) => reject(new InputError([
      { code: 'unreadable-file', path: 'FILE', message: `${file}: cannot be read (${e.code ?? e.message})` }])));
  });
  return stream;
}

/** The stream's text a piece at a time. */
async function* textPieces(stream: Readable): AsyncGenerator<string, void, undefined> {
  stream.setEncoding('utf8');
  for await (const piece of stream as AsyncIterable<string>) yield piece;
}

async function* jsonList(pieces: AsyncIterable<string>): AsyncGenerator<BatchItem> {
  let text = '';
  for await (const piece of pieces) text += piece;
  let list: unknown;
  try {
    list = JSON.parse(text);
  } catch (e) {
    throw new InputError([{ code: 'invalid-json', path: '', message: `the batch is not valid JSON (${(e as Error).message})` }]);
  }
  const specs = Array.isArray(list) ? list : [list];
  for (let i = 0; i < specs.length; i++) yield { spec: i, raw: specs[i] };
}

async function* jsonLines(pieces: AsyncIterable<string>): AsyncGenerator<BatchItem> {
  const { Readable: R } = await import('node:stream');
  let index = 0;
  let line = 0;
  for await (const text of createInterface({ input: R.from(pieces), crlfDelay: Infinity })) {
    line++;
    if (text.trim() === '') continue;
    try {
      yield { spec: index, line, raw: JSON.parse(text) };
    } catch (e) {
      yield { spec: index, line, errors: [{ code: 'invalid-json', path: '', message: `line ${line} is not valid JSON (${(e as Error).message})` }] };
    }
    index++;
  }
}

/** A CSV of specs: the first line names the fields; a "spec" column (the job list's) holds the whole spec as JSON. */
async function* csvSpecs(pieces: AsyncIterable<string>): AsyncGenerator<BatchItem> {
  const { csvRecords, unguarded } = await import('../../db/exchange/csv');
  let header: string[] | undefined;
  let index = 0;
  for await (const record of csvRecords(pieces)) {
    const cells = record.fields.map(unguarded);
    if (!header) {
      header = cells;
      continue;
    }
    const specColumn = header.indexOf('spec');
    if (specColumn < 0) yield { spec: index++, line: record.line, raw: specOfCells(header, cells) };
    else {
      try {
        yield { spec: index, line: record.line, raw: JSON.parse(cells[specColumn] ?? '') };
      } catch (e) {
        yield { spec: index, line: record.line, errors: [{ code: 'invalid-json', path: 'spec', message: `the spec column is not valid JSON (${(e as Error).message})` }] };
      }
      index++;
    }
  }
}

/** Reads the specs of a batch, whichever of the three forms it comes in. */
export async function* batchItems(file: string): AsyncGenerator<BatchItem> {
  const pieces = textPieces(await openInput(file));
  // The first piece tells a JSON list, JSON lines and CSV apart; it is put back in front.
  const first = await pieces.next();
  if (first.done) return;
  const start = first.value.replace(/^\uFEFF/, '');
  async function* all(): AsyncGenerator<string> {
    yield start;
    yield* pieces;
  }
  const lead = start.trimStart()[0];
  if (lead === '[') yield* jsonList(all());
  else if (lead === '{') yield* jsonLines(all());
  else yield* csvSpecs(all());
}

/** One line of output: compact JSON, non-finite numbers as null. */
const jsonLine = (value: unknown): string => JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v));

/**
 * Runs `each` on every spec of the batch and writes one JSON line per spec, in order: its place and the
 * result, or its errors with their field paths. A bad spec never stops the batch. Exit 2 when any spec
 * had errors (counted on standard error), 0 otherwise.
 */
export async function runBatch(args: ParsedArgs, out: (text: string) => void, each: (raw: unknown) => unknown): Promise<number> {
  const file = args.options.get('batch');
  if (typeof file !== 'string') throw new InputError([{ code: 'missing-file', path: '--batch', message: '--batch needs a file of specs, or - for standard input' }]);
  let count = 0;
  let failed = 0;
  const progress = terminalProgress('Batch', (done) => `${done} specs done`);
  try {
    for await (const item of batchItems(file)) {
      if (progress.signal?.aborted) break;
      count++;
      await one(item);
      progress.onProgress?.(count, 0);
    }
  } finally {
    progress.done();
  }
  if (failed > 0) process.stderr.write(`${failed} of ${count} specs have errors (ok: false lines)\n`);
  return failed > 0 ? EXIT.badInput : EXIT.ok;

  async function one(item: BatchItem): Promise<void> {
    const place: Place = item.line === undefined ? { spec: item.spec } : { spec: item.spec, line: item.line };
    if ('errors' in item) {
      failed++;
      out(jsonLine({ ...place, ok: false, errors: item.errors }));
      return;
    }
    try {
      out(jsonLine({ ...place, ok: true, result: await each(item.raw) }));
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      failed++;
      out(jsonLine({ ...place, ok: false, errors: e.errors }));
    }
  }
}
