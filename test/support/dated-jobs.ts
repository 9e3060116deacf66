/**
 * Jobs whose created, last-saved and due dates are spread over 2024 and 2025, as an exchange document
 * (db import / importJobs keep the stamps it gives). The customers are invented DEMO data.
 */
export interface DatedJob {
  partNumber: string;
  status: 'draft' | 'quoted' | 'ordered' | 'done';
  createdAt: string;
  updatedAt: string;
  dueDate: string;
}

const statuses = ['draft', 'quoted', 'ordered', 'done'] as const;
const customers = ['Larkspur Valve Works (DEMO)', 'Tidewell Pumps (DEMO)', 'Orrin Seating Ltd (DEMO)'];
const DAY = 86_400_000;
const iso = (ms: number) => new Date(ms).toISOString().replace(/\.\d{3}Z$/, 'Z');

/** `count` jobs, one every `stepDays` from 2024-01-02 10:00 UTC; saved 3 days and due 30 days after creation. */
export function datedJobs(count: number, stepDays = 7): DatedJob[] {
  const start = Date.parse('2024-01-02T10:00:00Z');
  return Array.from({ length: count }, (_, i) => {
    const created = start + i * stepDays * DAY;
    return {
      partNumber: `DR-${String(i).padStart(3, '0')}`, status: statuses[i % statuses.length]!,
      createdAt: iso(created), updatedAt: iso(created + 3 * DAY), dueDate: iso(created + 30 * DAY).slice(0, 10),
    };
  });
}

/** The jobs as the exchange document `db import` and importJobs read (format coilwright-jobs, version 2). */
export function datedJobsDocument(jobs: readonly DatedJob[]): string {
  return JSON.stringify({
    format: 'coilwright-jobs', version: 2,
    jobs: jobs.map((j, i) => ({
      ...j, customer: { name: customers[i % customers.length] }, notes: 'DEMO data: an invented job for the date range checks',
      spec: { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.5, outerDiameter: 12 + (i % 10) / 2, totalCoils: 9, ends: 'closed-ground', freeLength: 40 },
    })),
  });
}

/** The jobs a range holds, read the plain way: the date part of each stamp, both ends included. */
export function inRange(jobs: readonly DatedJob[], field: 'created' | 'updated' | 'due', from?: string, to?: string): DatedJob[] {
  const at = (j: DatedJob) => (field === 'created' ? j.createdAt : field === 'updated' ? j.updatedAt : j.dueDate).slice(0, 10);
  return jobs.filter((j) => (from === undefined || at(j) >= from) && (to === undefined || at(j) <= to));
}
