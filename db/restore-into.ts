import type Database from 'better-sqlite3';
import type { Settings } from '../core/settings/schema';
import { StoreError } from './errors';
import { readSetting, writeSetting } from './settings';
import type { SqliteStore as Store } from './store';

interface TableEntry { name: string; type: string }

const schemaOf = (db: Database.Database, schema: string) =>
  db.prepare(`SELECT type, name, tbl_name, sql FROM ${schema}.sqlite_schema WHERE name NOT LIKE 'sqlite_%' ORDER BY type, name`).all();

/** Ordinary tables and virtual tables; the virtual tables' own shadow tables follow their contents. */
function tablesToCopy(db: Database.Database): TableEntry[] {
  const list = db.pragma('main.table_list') as TableEntry[];
  return list.filter((t) => (t.type === 'table' || t.type === 'virtual') && (!t.name.startsWith('sqlite_') || t.name === 'sqlite_sequence'));
}

function copyTable(db: Database.Database, table: TableEntry): void {
  const columns = (db.pragma(`main.table_info("${table.name}")`) as { name: string }[]).map((c) => `"${c.name}"`);
  const sql = (db.prepare('SELECT sql FROM main.sqlite_schema WHERE name = ?').get(table.name) as { sql: string | null } | undefined)?.sql ?? '';
  // An FTS5 table keys its rows by a rowid that is not among its columns.
  if (/USING\s+fts5/i.test(sql)) columns.unshift('rowid');
  const list = columns.join(', ');
  db.exec(`DELETE FROM main."${table.name}"; INSERT INTO main."${table.name}" (${list}) SELECT ${list} FROM incoming."${table.name}"`);
}

/** Numbers already handed out are never handed out again: each sequence keeps the higher of its two values. */
function keepHigherSequences(store: Store, before: Settings['numbering']): void {
  const restored = readSetting(store, 'numbering');
  writeSetting(store, 'numbering', {
    ...restored,
    next: Math.max(restored.next, before.next),
    quotes: { ...restored.quotes, next: Math.max(restored.quotes.next, before.quotes.next) },
  });
}

/**
 * Replaces every row of the live store with the rows of the attached `incoming` store, inside the write
 * transaction the caller holds. Triggers are set aside while the rows move (they would refuse to delete
 * issued quotes and would index each row twice) and put back from their own SQL before the commit, so
 * every other connection sees either the store as it was or the restored one.
 */
export function replaceRows(store: Store): void {
  const { db } = store;
  if (JSON.stringify(schemaOf(db, 'main')) !== JSON.stringify(schemaOf(db, 'incoming'))) {
    throw new StoreError('backup-schema-differs', 'the backup\'s tables differ from this store\'s after updating: nothing was restored', 'file');
  }
  const numbering = readSetting(store, 'numbering');
  const triggers = db.prepare("SELECT name, sql FROM main.sqlite_schema WHERE type = 'trigger'").all() as { name: string; sql: string }[];
  db.pragma('defer_foreign_keys = ON');
  for (const t of triggers) db.exec(`DROP TRIGGER main."${t.name}"`);
  for (const table of tablesToCopy(db)) copyTable(db, table);
  for (const t of triggers) db.exec(t.sql.replace(/^CREATE\s+TRIGGER\s+/i, 'CREATE TRIGGER main.'));
  keepHigherSequences(store, numbering);
}
