import type Database from 'better-sqlite3';

/**
 * Drops jobs_by_kind_d (kind, wire size), made by 0001 for the first similar-jobs search. Each kind's R*Tree
 * (0009, 0020) has answered that search since, and nothing reads the index: it only cost every save, every
 * import (about 0.1 s a 100 000 jobs) and about 25 MB a million jobs. PostgreSQL dropped its own in 0016.
 */
export function updateToVersion0022(db: Database.Database): void {
  db.exec('DROP INDEX jobs_by_kind_d');
}
