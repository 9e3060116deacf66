/**
 * Text that a spreadsheet would run as a formula (=, +, -, @, tab or CR first, also after leading blanks or
 * line feeds, and their fullwidth forms ＝ ＋ － ＠) is written behind an apostrophe, which spreadsheets show
 * as plain text; reading strips it again. Text that itself starts with an apostrophe gets one more, so a
 * leading apostrophe of the user's survives the round trip.
 */
const FORMULA_START = /^(['\t\r]|[\s\u3000]*[=+\-@\uff1d\uff0b\uff0d\uff20])/;

/** RFC 4180 CSV: fields with a comma, quote or line break are quoted, quotes doubled; CRLF between rows. */
export function csvField(value: unknown): string {
  const raw = value === null || value === undefined ? '' : String(value);
  const text = typeof value === 'string' && FORMULA_START.test(raw) ? `'${raw}` : raw;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The text a field held before csvField guarded it. */
export const unguarded = (field: string): string => (field.startsWith("'") && FORMULA_START.test(field.slice(1)) ? field.slice(1) : field);

export function csvLine(values: readonly unknown[]): string {
  return values.map(csvField).join(',');
}

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

/** Splits CSV text into records, keeping the line each starts on (quoted fields may span lines). */
export function parseCsv(text: string): CsvRecord[] {
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = '';
  let quoted = false;
  let line = 1;
  let start = 1;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const endRecord = () => {
    fields.push(field);
    if (!(fields.length === 1 && fields[0] === '')) records.push({ line: start, fields });
    fields = [];
    field = '';
  };
  for (; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') { field += '"'; i++; }
      else if (ch === '"') quoted = false;
      else { if (ch === '\n') line++; field += ch; }
    } else if (ch === '"' && field === '') quoted = true;
    else if (ch === ',') { fields.push(field); field = ''; }
    else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      endRecord();
      line++;
      start = line;
    } else field += ch;
  }
  if (quoted) throw new CsvSyntaxError(start, 'a quoted field is not closed');
  if (field !== '' || fields.length > 0) endRecord();
  return records;
}
