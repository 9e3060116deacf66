/** Spreadsheet cell references as the customer's own sheet shows them: column letters and row numbers from 1. */

/** 0 → "A", 25 → "Z", 26 → "AA". */
export function columnLetter(index: number): string {
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** "C7" from column index 2 and sheet row 7. */
export const cellRef = (column: number, row: number): string => `${columnLetter(column)}${row}`;

/** The whole row, "A7:H7", for an error that no single cell holds. */
export const rowRef = (row: number, columns: number): string => `A${row}:${columnLetter(Math.max(columns, 1) - 1)}${row}`;

/** "c7" or "C7" → the column index and row; null when it is not a cell reference. */
export function parseCellRef(ref: string): { column: number; row: number } | null {
  const m = /^([A-Za-z]{1,3})(\d{1,7})$/.exec(ref.trim());
  if (!m) return null;
  let column = 0;
  for (const ch of m[1]!.toUpperCase()) column = column * 26 + (ch.charCodeAt(0) - 64);
  return { column: column - 1, row: Number(m[2]) };
}
