/**
 * The preview of a request sheet: the mapping in force, and every row as a draft job or with its errors
 * named by cell. Fixes typed in the preview replace a cell's text; rows may be skipped by choice.
 */
import type { FieldError } from '../result';
import type { JobInput } from '../api/store-schemas';
import type { UnitSystem } from '../units';
import type { DecimalMark } from '../typed-number';
import { typedText } from '../typed-number';
import { cellRef, parseCellRef } from './cells';
import { findHeaderRow, guessDecimalMark } from './guess';
import type { ColumnMap, RequestMapping } from './mapping';
import { mapColumns, mappingErrors } from './mapping';
import { readRequestRow } from './row';

/**
 * A cell as read from its file: text, or a number where a spreadsheet stored one (its decimal mark is then
 * no question; it is shown with the sheet's mark).
 */
export type SheetCell = string | number;

/** A sheet as read from its file, rows as they stand in it (row 1 first). */
export interface RequestSheet {
  name: string;
  rows: SheetCell[][];
}

export interface PreviewOptions {
  given?: RequestMapping | undefined;
  saved?: RequestMapping | undefined;
  units?: UnitSystem | undefined;
  decimalMark?: DecimalMark | undefined;
  /** Replacement text by cell reference ("C7"). */
  fixes?: Readonly<Record<string, string>> | undefined;
  /** Sheet row numbers left out by choice. */
  skip?: readonly number[] | undefined;
}

export type PreviewRowStatus = 'ready' | 'error' | 'skipped';

export interface PreviewRow {
  /** The row number in the customer's sheet. */
  row: number;
  status: PreviewRowStatus;
  /** The cells' text, fixes applied. */
  cells: string[];
  /** What does not read; a skipped row keeps its errors so the import can say what was left out. */
  errors: FieldError[];
  understood: { path: string; message: string }[];
  /** Cells whose text was replaced in the preview. */
  fixed: string[];
  /** The draft job a ready row becomes (null otherwise, and in an answer that did not ask for jobs). */
  job: JobInput | null;
}

export interface RequestPreview {
  sheet: string;
  /** The header row's number in the sheet (0 when the sheet is empty). */
  headerRow: number;
  mapping: ColumnMap;
  mappingErrors: FieldError[];
  rows: PreviewRow[];
  counts: { ready: number; error: number; skipped: number; blank: number };
}

function fixedCells(cells: readonly string[], row: number, fixes: Readonly<Record<string, string>>): { cells: string[]; fixed: string[] } {
  const out = [...cells];
  const fixed: string[] = [];
  for (const [ref, text] of Object.entries(fixes)) {
    const at = parseCellRef(ref);
    if (!at || at.row !== row) continue;
    while (out.length <= at.column) out.push('');
    out[at.column] = text;
    fixed.push(cellRef(at.column, row));
  }
  return { cells: out, fixed };
}

/** Fixes grouped by sheet row, so each row looks only at its own. */
function fixesByRow(fixes: Readonly<Record<string, string>>): Map<number, Record<string, string>> {
  const byRow = new Map<number, Record<string, string>>();
  for (const [ref, text] of Object.entries(fixes)) {
    const at = parseCellRef(ref);
    if (!at) continue;
    const group = byRow.get(at.row) ?? {};
    group[ref] = text;
    byRow.set(at.row, group);
  }
  return byRow;
}

const blank = (cells: readonly string[]): boolean => cells.every((c) => c.trim() === '');

/** A stored number as the estimator would type it with the sheet's mark, so it reads back exactly. */
const cellText = (cell: SheetCell, decimalMark: DecimalMark): string =>
  typeof cell === 'number' ? typedText(cell, { decimalMark, grouping: 'none' }) : cell;

export function previewRequestSheet(sheet: RequestSheet, options: PreviewOptions = {}): RequestPreview {
  const headerIndex = findHeaderRow(sheet.rows.slice(0, 12).map((r) => r.map(String)));
  const headerRow = headerIndex + 1;
  const headers = headerIndex < 0 ? [] : sheet.rows[headerIndex]!.map((h) => String(h).trim());
  const body = headerIndex < 0 ? [] : sheet.rows.slice(headerIndex + 1);
  const fallback = { units: 'metric' as const, decimalMark: options.decimalMark ?? guessDecimalMark(body) ?? '.' };
  const mapping = mapColumns(headers, headerRow, options.given, options.saved, fallback);
  if (options.units) mapping.units = options.units;
  if (options.decimalMark) mapping.decimalMark = options.decimalMark;
  const skip = new Set(options.skip ?? []);
  const fixes = fixesByRow(options.fixes ?? {});
  const rows: PreviewRow[] = [];
  const counts = { ready: 0, error: 0, skipped: 0, blank: 0 };
  for (let i = headerIndex + 1; i < sheet.rows.length && headerIndex >= 0; i++) {
    const row = i + 1;
    const texts = sheet.rows[i]!.map((c) => cellText(c, mapping.decimalMark));
    const { cells, fixed } = fixedCells(texts, row, fixes.get(row) ?? {});
    if (blank(cells)) { counts.blank++; continue; }
    const read = readRequestRow(cells, { row, columns: mapping.columns, units: mapping.units, decimalMark: mapping.decimalMark });
    const status: PreviewRowStatus = skip.has(row) ? 'skipped' : read.job ? 'ready' : 'error';
    counts[status]++;
    rows.push({ row, status, cells, errors: read.errors, understood: read.understood, fixed, job: status === 'ready' ? read.job : null });
  }
  return { sheet: sheet.name, headerRow: Math.max(headerRow, 0), mapping, mappingErrors: mappingErrors(mapping, headerRow), rows, counts };
}
