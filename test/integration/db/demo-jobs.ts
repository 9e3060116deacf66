import { job } from './helpers';

/** Jobs of an invented shop (demo data) for import tests: every kind, both unit systems, four customers. */
const customers = ['Demo Larkspur Valves', 'Demo Quarry Lane Pumps', 'Demo Tidewater Marine', 'Demo Orchard Gauges'];

/** An invented shop's job (demo data), of each kind in turn, in both unit systems. */
export function demoJob(i: number): Record<string, unknown> {
  const base = { customer: { name: customers[i % customers.length]! }, partNumber: `DEMO-${i}`, drawingNumber: `DRG-${i}`, drawingRevision: 'A' };
  if (i % 10 === 3) {
    return { ...base, notes: `extension demo ${i}`, spec: {
      kind: 'extension', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1 + (i % 7) / 10, outerDiameter: 10 + (i % 5),
      bodyCoils: 12.5 + (i % 9), ends: ['full-loop', 'full-loop'],
    } };
  }
  if (i % 10 === 7) {
    return { ...base, notes: `torsion demo ${i}`, spec: {
      kind: 'torsion', units: 'metric', material: 'astm-a228', wireDiameter: 1.2, outerDiameter: 11 + (i % 4),
      bodyCoils: 6.25 + (i % 5), legs: [{ length: 15 }, { length: 18 }], windDirection: 'right', loadDirection: 'closing',
    } };
  }
  if (i % 10 === 5) return job({ ...base, notes: `inch demo ${i}` }, { units: 'inch', material: 'astm-a228', wireDiameter: 0.0625, outerDiameter: 0.75, totalCoils: 12, freeLength: 2 + (i % 8) / 8 });
  return job({ ...base, notes: `compression demo ${i}` }, { wireDiameter: 1.5 + (i % 11) / 10, freeLength: 30 + (i % 40), notes: `spec note ${i}` });
}

export function document(count: number, bad?: number): { format: string; version: number; jobs: Record<string, unknown>[] } {
  const jobs = Array.from({ length: count }, (_, i) => demoJob(i));
  if (bad !== undefined) jobs[bad] = job({ partNumber: 'BAD' }, { totalCoils: 1.5 });
  return { format: 'coilwright-jobs', version: 1, jobs };
}
