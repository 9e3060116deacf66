/** Proposes which column of a request sheet holds which field, from its header, and finds the header row. */
import type { RequestField } from './fields';
import { normaliseHeader, requestFieldTable, requestFields } from './fields';

export type ColumnField = RequestField | 'ignore';

/** The bare header with bracketed units gone, case kept: "D (mm)" → "D". */
const bareSymbol = (header: string): string => header.replace(/\([^)]*\)|\[[^\]]*\]/g, '').replace(/[.:]/g, '').trim();

function exactField(header: string): RequestField | null {
  const symbol = bareSymbol(header);
  for (const field of requestFields) {
    if (requestFieldTable[field].symbols?.includes(symbol)) return field;
  }
  const key = normaliseHeader(header);
  if (key === '') return null;
  for (const field of requestFields) {
    if (requestFieldTable[field].headers.includes(key)) return field;
  }
  return null;
}

/** The field whose longest header phrase appears as whole words in the header ("spring free length" → freeLength). */
function containedField(header: string): RequestField | null {
  const key = ` ${normaliseHeader(header)} `;
  let best: { field: RequestField; length: number } | null = null;
  for (const field of requestFields) {
    for (const phrase of requestFieldTable[field].headers) {
      if (phrase.length < 3 || !key.includes(` ${phrase} `)) continue;
      if (!best || phrase.length > best.length) best = { field, length: phrase.length };
    }
  }
  return best?.field ?? null;
}

/** One field per header; a field claimed by an earlier column leaves later ones ignored. */
export function guessColumns(headers: readonly string[]): ColumnField[] {
  const taken = new Set<RequestField>();
  return headers.map((header) => {
    const field = exactField(header) ?? containedField(header);
    if (field === null || taken.has(field)) return 'ignore';
    taken.add(field);
    return field;
  });
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
