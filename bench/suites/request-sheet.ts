import { previewRequestSheet } from '../../core/request-sheet';
import { readRequestFile } from '../../service/request-sheet/read';
import { requestCsv, requestRows, requestXlsx } from '../../test/support/request-sheets';
import type { BenchRow, BenchSuite } from '../harness';

const ROWS = 1000;
const RUNS = 5;

/** File bytes → sheet → preview of every row (each read and checked as a spec), the median of a few runs. */
async function fileToPreview(name: string, bytes: Uint8Array, decimalMark: '.' | ','): Promise<{ ms: number; ready: number }> {
  const times: number[] = [];
  let ready = 0;
  for (let i = 0; i < RUNS + 1; i++) {
    const t0 = performance.now();
    const sheet = await readRequestFile(name, bytes);
    if (!sheet.ok) throw new Error(sheet.error.message);
    ready = previewRequestSheet(sheet.value, { decimalMark }).counts.ready;
    if (i > 0) times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(times.length / 2)]!, ready };
}

/** A customer's 1 000-row request sheet (demo data) from file to preview, CSV and XLSX. */
export const requestSheetSuite: BenchSuite = {
  name: 'request-sheet',
  async run(): Promise<BenchRow[]> {
    const csv = Buffer.from(requestCsv(requestRows(ROWS, { decimalMark: ',' }), ';'));
    const xlsx = await requestXlsx(requestRows(ROWS));
    const rows: BenchRow[] = [];
    for (const [format, name, bytes, mark] of [['CSV', 'bench.csv', csv, ','], ['XLSX', 'bench.xlsx', xlsx, '.']] as const) {
      const { ms, ready } = await fileToPreview(name, bytes, mark);
      if (ready !== ROWS) throw new Error(`${format}: ${ready} of ${ROWS} rows read`);
      rows.push({ suite: 'request-sheet', name: `${ROWS}-row ${format} request sheet, file to preview (median of ${RUNS})`, value: ms, unit: 'ms', target: '< 1000', pass: ms < 1000 });
    }
    return rows;
  },
};
