import type Database from 'better-sqlite3';

/**
 * The numeric search columns (d, mean_diameter, free_length, active_coils, rate, and the R*Tree the
 * triggers keep from them) record which engine version computed them. Rows from before this migration
 * get NULL, "not known", so a re-index recomputes them along with any from an older engine.
 */
export function updateToVersion0005(db: Database.Database): void {
  db.exec(`
    ALTER TABLE jobs ADD COLUMN shape_engine INTEGER CHECK (shape_engine >= 1);
    CREATE INDEX jobs_by_shape_engine ON jobs (shape_engine);
  `);
}
