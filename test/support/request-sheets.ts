/**
 * Request sheets as a customer would send them, made with the general-purpose writers (csv-stringify,
 * exceljs). Demo data: Halden Valve Works and its part numbers are invented.
 */
import { stringify } from 'csv-stringify/sync';
import ExcelJS from 'exceljs';

export const DEMO_CUSTOMER = 'Halden Valve Works (demo)';

export const REQUEST_HEADERS = ['Part No.', 'Drawing', 'Type', 'Wire grade', 'Wire dia (mm)', 'OD (mm)', 'L0 (mm)', 'Total coils', 'Ends', 'Load @ length', 'Qty', 'Rate (N/mm)'];

/** One plausible compression spring per row, sizes stepping with the row; the free length clears solid. */
export function requestRows(count: number, options: { decimalMark?: '.' | ','; badRow?: number } = {}): string[][] {
  const mark = options.decimalMark ?? '.';
  const num = (v: number) => String(Number(v.toFixed(2))).replace('.', mark);
  const rows: string[][] = [];
  for (let i = 0; i < count; i++) {
    const d = 1 + (i % 8) * 0.25;
    const od = d * 8;
    const coils = 8 + (i % 5);
    const free = d * coils * 2.2;
    rows.push([
      `HV-${String(1000 + i)}`, `DRG-${String(5000 + i)}`, i % 7 === 3 ? 'extension' : 'compression',
      i % 2 === 0 ? 'EN 10270-1 SH' : 'music wire', num(d), num(od), num(free), num(coils),
      i % 7 === 3 ? 'machine loop' : 'closed & ground',
      i % 7 === 3 ? `${num(d * 10)} N @ ${num(free * 1.2)} mm` : `${num(d * 10)} N @ ${num(free * 0.8)} mm`,
      i % 3 === 0 ? '1 000' : '500', num(d * 1.5),
    ]);
  }
  if (options.badRow !== undefined) rows[options.badRow]![4] = '1,6.0x';
  return rows;
}

export const requestCsv = (rows: string[][], delimiter = ','): string => stringify([REQUEST_HEADERS, ...rows], { delimiter });

/** An XLSX with a title row above the headers, numbers stored as numbers where they are plain numbers. */
export async function requestXlsx(rows: string[][]): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet('Enquiry');
  sheet.addRow([`Enquiry from ${DEMO_CUSTOMER} (demo data)`]);
  sheet.addRow(REQUEST_HEADERS);
  for (const row of rows) sheet.addRow(row.map((c) => (/^\d+(\.\d+)?$/.test(c) ? Number(c) : c)));
  return Buffer.from(await book.xlsx.writeBuffer());
}
