/** Proposes which column of a request sheet holds which field, from its header, and finds the header row. */
import type { RequestField } from './fields';
import { normaliseHeader, requestFieldTable, requestFields } from './fields';
import type { DecimalMark } from '../typed-number';

export type ColumnField = RequestField | 'ignore';

/** The bare header with bracketed units gone, case kept: "D (mm)" → "D". */
const bareSymbol = (header: string): string => header.replace(/\([^)]*\)|\[[^\]]*\]/g, '').replace(/[.:]/g, '').trim();

/** How well a header names a field: lower is better; null when it does not name it. */
function headerScore(header: string, field: RequestField): number | null {
  const entry = requestFieldTable[field];
  if (entry.symbols?.includes(bareSymbol(header))) return 1;
  const key = normaliseHeader(header);
  if (key === '') return null;
  if (entry.headers.includes(key)) return entry.weak?.includes(key) ? 2 : 1;
  const padded = ` ${key} `;
  const contained = entry.headers.filter((p) => p.length >= 3 && padded.includes(` ${p} `)).map((p) => p.length);
  return contained.length > 0 ? 1000 - Math.max(...contained) : null;
}

/**
 * One field per header, each field to the column that names it best: a symbol or a whole header word over a
 * weak word ("Part No." over "Item" for the part number) over a phrase inside a longer header. Equal names go
 * to the earlier column; a column whose field went elsewhere is ignored.
 */
export function guessColumns(headers: readonly string[]): ColumnField[] {
  const claims: { column: number; field: RequestField; score: number }[] = [];
  headers.forEach((header, column) => {
    for (const field of requestFields) {
      const score = headerScore(header, field);
      if (score !== null) claims.push({ column, field, score });
    }
  });
  claims.sort((a, b) => a.score - b.score || a.column - b.column);
  const out: ColumnField[] = headers.map(() => 'ignore');
  const taken = new Set<RequestField>();
  for (const c of claims) {
    if (out[c.column] !== 'ignore' || taken.has(c.field)) continue;
    out[c.column] = c.field;
    taken.add(c.field);
  }
  return out;
}

/**
 * The sheet's decimal mark, from the cells that can only be read one way: "1,6" or "8,25" (a comma before one,
 * two or four or more digits) are decimal commas; "1.6" likewise decimal points. "1,600" says nothing. The
 * more frequent wins; null when no cell tells.
 */
export function guessDecimalMark(rows: readonly (readonly unknown[])[]): DecimalMark | null {
  let comma = 0;
  let point = 0;
  for (const row of rows) {
    for (const cell of row) {
      if (typeof cell !== 'string') continue;
      const m = /^\s*-?\d+([.,])(\d+)(?!\d)/.exec(cell);
      if (!m || m[2]!.length === 3) continue;
      if (m[1] === ',') comma++;
      else point++;
    }
  }
  return comma === point ? null : comma > point ? ',' : '.';
}

const recognised = (row: readonly string[]): number => guessColumns(row).filter((f) => f !== 'ignore').length;

/**
 * The header row: among the first rows, the first where at least two headers are recognised (a title or the
 * customer's address often sits above); otherwise the first row with any text. 0-based; -1 for an empty sheet.
 */
export function findHeaderRow(rows: readonly (readonly string[])[], scan = 12): number {
  for (let i = 0; i < Math.min(rows.length, scan); i++) {
    if (recognised(rows[i]!) >= 2) return i;
  }
  return rows.findIndex((row) => row.some((cell) => cell.trim() !== ''));
}
