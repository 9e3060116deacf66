import { exportJobsToFile, importJobsFromFile, openStore } from '../../db';

/** What a child reports: its wall time and its peak resident memory (getrusage ru_maxrss). */
export interface ChildReport {
  seconds: number;
  peakMegabytes: number;
  count: number;
}

/**
 * The child's side: one export or import in a fresh process, so its peak memory is its own. Runs as
 * `exchange-child.cjs export|import STORE FILE`.
 */
export async function exchangeChild(args: string[]): Promise<void> {
  const [what, storeFile, file] = args as ['export' | 'import', string, string];
  const store = openStore(storeFile, { check: 'none' });
  const t0 = performance.now();
  const result = what === 'export'
    ? await exportJobsToFile(store, { file, format: file.endsWith('.csv') ? 'csv' : 'json', force: true })
    : await importJobsFromFile(store, { file, renumber: true });
  const seconds = (performance.now() - t0) / 1000;
  store.close();
  if (!result.ok) throw new Error(`${what} failed: ${result.error.message}`);
  const count = 'count' in result.value ? result.value.count : result.value.imported.length;
  const report: ChildReport = { seconds, peakMegabytes: process.resourceUsage().maxRSS / 1024, count };
  process.stdout.write(`${JSON.stringify(report)}\n`);
}

