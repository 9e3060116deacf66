import { parse } from 'csv-parse';
import type { Info, Parser } from 'csv-parse';
import { parse as parseAll } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';

/**
 * Text that a spreadsheet would run as a formula (=, +, -, @, tab or CR first, also after leading blanks or
 * line feeds, and their fullwidth forms ＝ ＋ － ＠) is written behind an apostrophe, which spreadsheets show
 * as plain text; reading strips it again. Text that itself starts with an apostrophe gets one more, so a
 * leading apostrophe of the user's survives the round trip. Numbers are written as numbers.
 */
const FORMULA_START = /^(['\t\r]|[\s\u3000]*[=+\-@\uff1d\uff0b\uff0d\uff20])/;

export const guarded = (value: unknown): string => {
  const raw = value === null || value === undefined ? '' : String(value);
  return typeof value === 'string' && FORMULA_START.test(raw) ? `'${raw}` : raw;
};

/** The text a field held before it was guarded. */
export const unguarded = (field: string): string => (field.startsWith("'") && FORMULA_START.test(field.slice(1)) ? field.slice(1) : field);

/** RFC 4180 as csv-stringify writes it: CRLF between rows, and any field with a line break quoted too. */
const WRITE_OPTIONS = { record_delimiter: 'windows', quoted_match: /[\r\n]/ } as const;

/** Guarded CSV lines, each ending in CRLF. */
export function csvLines(rows: readonly (readonly unknown[])[]): string {
  return stringify(rows.map((r) => r.map(guarded)), WRITE_OPTIONS);
}

/** One field as it is written (guarded, quoted when it must be). */
export const csvField = (value: unknown): string => csvLines([[value]]).replace(/\r\n$/, '');

export interface CsvRecord {
  /** Line of the file the record starts on, counting from 1. */
  line: number;
  fields: string[];
}

export class CsvSyntaxError extends Error {
  constructor(readonly line: number, message: string) {
    super(`line ${line}: ${message}`);
  }
}

const READ_OPTIONS = { bom: true, relax_column_count: true, skip_empty_lines: true, info: true } as const;

/** Turns csv-parse's end-of-record counters into the line each record starts on. */
function lineTracker(): (info: Info, fields: string[]) => CsvRecord {
  let endLine = 0;
  let emptyLines = 0;
  return (info, fields) => {
    const line = endLine + 1 + (info.empty_lines - emptyLines);
    endLine = info.lines;
    emptyLines = info.empty_lines;
    return { line, fields };
  };
}

interface CsvParseError { code?: string; lines?: number; message: string }

function syntaxError(e: unknown): CsvSyntaxError {
  const error = e as CsvParseError;
  const message = error.code === 'CSV_QUOTE_NOT_CLOSED' ? 'a quoted field is not closed' : error.message.replace(/^Invalid \w+:?\s*/, '');
  return new CsvSyntaxError(error.lines ?? 1, message);
}

/** Splits CSV text into records, keeping the line each starts on (quoted fields may span lines). */
export function parseCsv(text: string): CsvRecord[] {
  const track = lineTracker();
  try {
    return (parseAll(text, READ_OPTIONS) as unknown as { record: string[]; info: Info }[]).map((r) => track(r.info, r.record));
  } catch (e) {
    throw syntaxError(e);
  }
}

/** The records of a CSV stream as they arrive; a syntax error ends it with a CsvSyntaxError. */
export async function* csvRecords(source: AsyncIterable<Buffer | string>): AsyncGenerator<CsvRecord> {
  const track = lineTracker();
  const parser: Parser = parse(READ_OPTIONS);
  const feeding = (async () => {
    try {
      for await (const chunk of source) {
        if (!parser.write(chunk)) await new Promise((resolve) => parser.once('drain', resolve));
      }
      parser.end();
    } catch (e) {
      parser.destroy(e as Error);
    }
  })();
  try {
    for await (const r of parser as AsyncIterable<{ record: string[]; info: Info }>) yield track(r.info, r.record);
  } catch (e) {
    throw e instanceof Error && (e as CsvParseError).code?.startsWith('CSV_') ? syntaxError(e) : e;
  } finally {
    parser.destroy();
    await feeding;
  }
}
