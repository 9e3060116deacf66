import type Database from 'better-sqlite3';

/**
 * One index per date the job list filters on, each holding, beside the date, every column the list filters
 * or sorts by. A date range is then read from its index alone: the jobs of the range are filtered by status,
 * kind, material and archived state and the first page picked in any sort without reading a job's row; only
 * the page's own jobs are read (db/search/list.ts). Reading the sort's own index instead, as before, read far
 * through it for a narrow old range (a month ten years back, sorted by last saved, passed every job since).
 */
const DATED_INDEXES = `
  CREATE INDEX jobs_dated_created ON jobs (created_at, archived_at, status, kind, material, updated_at, number, customer_key, id);
  CREATE INDEX jobs_dated_due ON jobs (due_date, archived_at, status, kind, material, updated_at, number, customer_key, id);
  CREATE INDEX jobs_dated_updated ON jobs (updated_at, archived_at, status, kind, material, number, customer_key, id);
`;

export function updateToVersion0019(db: Database.Database): void {
  db.exec(DATED_INDEXES);
}
