/**
 * Reads a customer's request sheet file, CSV or XLSX, into rows of cells. Text stays as written (the preview
 * reads it with the sheet's decimal mark and units); numbers a spreadsheet stored as numbers stay numbers.
 */
import { parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import type { RequestSheet, SheetCell } from '../../core/request-sheet';
import type { ApiResult } from '../../core/api';

export type SheetFormat = 'csv' | 'xlsx';

const failure = (code: string, message: string, path = 'dataBase64'): ApiResult<never> => ({ ok: false, error: { code, message, path } });

/** XLSX files are ZIP archives: they start "PK". */
const looksZipped = (bytes: Uint8Array): boolean => bytes[0] === 0x50 && bytes[1] === 0x4b;

export function sheetFormat(fileName: string, bytes: Uint8Array): SheetFormat | null {
  const lower = fileName.toLowerCase();
  if (lower.endsWith('.xlsx') || lower.endsWith('.xlsm')) return 'xlsx';
  if (lower.endsWith('.csv') || lower.endsWith('.txt') || lower.endsWith('.tsv')) return looksZipped(bytes) ? 'xlsx' : 'csv';
  return looksZipped(bytes) ? 'xlsx' : null;
}

/** UTF-8 when it decodes, else Windows-1252 (what spreadsheet programs on Windows write by default). */
function decodeText(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return new TextDecoder('windows-1252').decode(bytes);
  }
}

/** The separator of the first lines: a semicolon where the comma is the decimal mark, a tab from a paste. */
function delimiterOf(text: string): string {
  const head = text.split(/\r?\n/, 5).join('\n').replace(/"[^"]*"/g, '');
  const counts = [',', ';', '\t'].map((d) => ({ d, n: head.split(d).length - 1 }));
  counts.sort((a, b) => b.n - a.n);
  return counts[0]!.n > 0 ? counts[0]!.d : ',';
}

export function readCsv(name: string, bytes: Uint8Array): ApiResult<RequestSheet> {
  const text = decodeText(bytes);
  try {
    const rows = parse(text, { delimiter: delimiterOf(text), relax_column_count: true, skip_empty_lines: false, bom: true, trim: false }) as string[][];
    return { ok: true, value: { name, rows } };
  } catch (e) {
    const line = (e as { lines?: number }).lines;
    return failure('csv-unreadable', `${name} is not a CSV file that reads${line ? ` (line ${line})` : ''}: ${(e as Error).message}`);
  }
}

/** A spreadsheet cell's value as the customer sees it: a formula's result, rich text joined, a date as YYYY-MM-DD. */
function cellValue(value: ExcelJS.CellValue): SheetCell {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if ('result' in value) return cellValue((value as { result?: ExcelJS.CellValue }).result ?? '');
  if ('richText' in value) return value.richText.map((r) => r.text).join('');
  if ('text' in value) return String(value.text);
  if ('error' in value) return String(value.error);
  return '';
}

/** The first worksheet with any cell filled; each row as long as its last filled cell. */
export async function readXlsx(name: string, bytes: Uint8Array): Promise<ApiResult<RequestSheet>> {
  const book = new ExcelJS.Workbook();
  try {
    await book.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch (e) {
    return failure('xlsx-unreadable', `${name} is not an XLSX workbook that reads: ${(e as Error).message}`);
  }
  const sheet = book.worksheets.find((w) => w.actualRowCount > 0);
  if (!sheet) return failure('sheet-empty', `${name} has no filled cells`);
  const rows: SheetCell[][] = [];
  sheet.eachRow({ includeEmpty: true }, (row, number) => {
    const cells: SheetCell[] = [];
    row.eachCell({ includeEmpty: true }, (cell, column) => { cells[column - 1] = cellValue(cell.value); });
    rows[number - 1] = Array.from(cells, (c) => c ?? '');
  });
  return { ok: true, value: { name: `${name}${book.worksheets.length > 1 ? ` (${sheet.name})` : ''}`, rows: Array.from(rows, (r) => r ?? []) } };
}

/** Reads either format, told by the name's extension or, failing that, by the bytes. */
export async function readRequestFile(name: string, bytes: Uint8Array): Promise<ApiResult<RequestSheet>> {
  const format = sheetFormat(name, bytes);
  if (format === null) return failure('sheet-format', `${name}: a request sheet is a CSV or XLSX file`, 'fileName');
  const read = format === 'xlsx' ? await readXlsx(name, bytes) : readCsv(name, bytes);
  if (read.ok && read.value.rows.every((r) => r.every((c) => String(c).trim() === ''))) return failure('sheet-empty', `${name} has no filled cells`);
  return read;
}
