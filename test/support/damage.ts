import { closeSync, openSync, writeSync } from 'node:fs';
import type { SqliteStore as Store } from '../../db';

/**
 * Closes the store and overwrites one index page of its jobs table with junk, past the page header, so the
 * file still opens as SQLite but PRAGMA quick_check finds the damage.
 */
export function damageIndexPage(store: Store): void {
  const { rootpage } = store.db.prepare("SELECT rootpage FROM sqlite_schema WHERE name = 'jobs_by_material'").get() as { rootpage: number };
  const pageSize = store.db.pragma('page_size', { simple: true }) as number;
  const file = store.file;
  store.close();
  const fd = openSync(file, 'r+');
  writeSync(fd, Buffer.alloc(pageSize - 8, 0xa5), 0, pageSize - 8, (rootpage - 1) * pageSize + 8);
  closeSync(fd);
}
