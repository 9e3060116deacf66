import type Database from 'better-sqlite3';

/**
 * One index per date the job list filters on, each holding, beside the date, every column the list filters
 * or sorts by. A date range is then read from its index alone: the jobs of the range are filtered by status,
 * kind, material and archived state and the first page picked in any sort without reading a job's row; only
 * the page's own jobs are read (db/search/list.ts). Reading the sort's own index instead, as before, read far
 * through it for a narrow old range (a month ten years back, sorted by last saved, passed every job since).
 *
 * Each index is partial on its date being present: SQLite reads a partial index only for a query that compares
 * that date, so the plain list (and the list's sorted route, which writes the date as `substr(column, 1)`) can
 * never be planned through it. Without that, statistics on a store of many due dates a day led the planner to read the
 * whole due-date index (skip-scan on archived_at) and sort every listed job for the plain list.
 */
const DATED_INDEXES = `
  CREATE INDEX jobs_dated_created ON jobs (created_at, archived_at, status, kind, material, updated_at, number, customer_key, id)
    WHERE created_at IS NOT NULL;
  CREATE INDEX jobs_dated_due ON jobs (due_date, archived_at, status, kind, material, updated_at, number, customer_key, id)
    WHERE due_date IS NOT NULL;
  CREATE INDEX jobs_dated_updated ON jobs (updated_at, archived_at, status, kind, material, number, customer_key, id)
    WHERE updated_at IS NOT NULL;
`;

export function updateToVersion0019(db: Database.Database): void {
  db.exec(DATED_INDEXES);
}
