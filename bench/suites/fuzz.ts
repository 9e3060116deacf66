/**
 * `npm run bench -- fuzz`: prints 500 random valid jobs (a traveller and a quote each) and reads 2000
 * damaged job files, then reports crashes, NaN/∞ in documents, errors without a field path and the
 * slowest document against the 5 s limit a print may take.
 */
import { settingsSchema } from '../../core/settings/schema';
import { fuzzPrint } from '../../test/support/fuzz-print';
import type { BenchRow, BenchSuite } from '../harness';

/** DEMO DATA: an invented shop for the run only. */
const settings = settingsSchema.parse({
  shopProfile: { name: 'Fuzz Bench Springs (demo)', addressLines: ['DEMO DATA'], phone: '', email: '' },
  machines: [
    { id: 'c', name: 'Bench coiler', operation: 'coil', wireRange: { min: 0.02, max: 100 }, hourlyRate: 70, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 50, maxPiecesPerMinute: 80 } },
    { id: 'o', name: 'Bench oven', operation: 'stress-relieve', wireRange: { min: 0, max: 100 }, hourlyRate: 30, setupMinutes: 10,
      batch: { capacityPieces: 10000, cycleMinutes: 45 } },
  ],
  finishes: [{ id: 'zinc', name: 'Zinc plate', vendor: 'Demo Platers', pricePerKg: 3, electroplated: true, bakeSpecification: 'ASTM B850' }],
});

const LIMIT_MS = 5000;

export const fuzzSuite: BenchSuite = {
  name: 'fuzz',
  async run(): Promise<BenchRow[]> {
    const jobs = Number(process.env.FUZZ_JOBS ?? 500);
    const t0 = performance.now();
    const o = await fuzzPrint({ jobs, damaged: 4 * jobs, seed: Date.now() % 1_000_000, limitMs: LIMIT_MS, settings });
    const seconds = (performance.now() - t0) / 1000;
    for (const line of [...o.crashes, ...o.nonFinite, ...o.errorsWithoutPath, ...o.overTime].slice(0, 20)) console.log(line);
    const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow => ({ suite: 'fuzz', name, value, unit, target, pass });
    return [
      row('jobs printed', o.jobs, 'jobs'),
      row('documents printed', o.documents, 'documents'),
      row('damaged job files read', o.damaged, 'files'),
      row('crashes', o.crashes.length, 'count', '0', o.crashes.length === 0),
      row('NaN/∞ in documents', o.nonFinite.length, 'count', '0', o.nonFinite.length === 0),
      row('errors without a path', o.errorsWithoutPath.length, 'count', '0', o.errorsWithoutPath.length === 0),
      row('documents over the time limit', o.overTime.length, 'count', '0', o.overTime.length === 0),
      row('slowest document', o.slowestMs, 'ms', `< ${LIMIT_MS}`, o.slowestMs < LIMIT_MS),
      row('run time', seconds, 's'),
    ];
  },
};
