import type Database from 'better-sqlite3';
import type { SyncConnection } from '../../db/pg';

/**
 * The logical schema of a store, the same shape from either backend: each table's columns (name, type class,
 * NOT NULL, default given or not), primary key, unique keys, foreign keys and number of CHECK constraints.
 * Search structures differ by design (FTS5 and R*Tree on SQLite; a tsvector table and views on PostgreSQL)
 * and are left out, as is PostgreSQL's version mark (SQLite keeps it in PRAGMAs).
 */
export interface LogicalTable {
  columns: string[];
  primaryKey: string[];
  unique: string[];
  foreignKeys: string[];
  checks: number;
}
export type LogicalSchema = Record<string, LogicalTable>;

const LEFT_OUT = /^(sqlite_|job_text|job_shape|coilwright_store$)/;

const SQLITE_TYPES: Record<string, string> = { INTEGER: 'integer', REAL: 'real', TEXT: 'text', BLOB: 'blob' };
const PG_TYPES: Record<string, string> = { bigint: 'integer', 'double precision': 'real', text: 'text', bytea: 'blob' };

/** CHECK constraints in a CREATE TABLE text (ALTER TABLE ADD COLUMN appends to it). */
const checkCount = (sql: string): number => (sql.match(/\bCHECK\s*\(/gi) ?? []).length;

export function sqliteSchema(db: Database.Database): LogicalSchema {
  const tables = db.prepare("SELECT name, sql FROM sqlite_master WHERE type = 'table' ORDER BY name").all() as { name: string; sql: string }[];
  const out: LogicalSchema = {};
  for (const t of tables.filter((x) => !LEFT_OUT.test(x.name))) {
    const cols = db.prepare(`SELECT * FROM pragma_table_info('${t.name}')`).all() as
      { name: string; type: string; notnull: number; dflt_value: string | null; pk: number }[];
    const indexes = db.prepare(`SELECT name, origin, "unique" AS u FROM pragma_index_list('${t.name}')`).all() as { name: string; origin: string; u: number }[];
    const unique = indexes.filter((i) => i.u === 1 && i.origin === 'u').map((i) =>
      (db.prepare(`SELECT name FROM pragma_index_info('${i.name}') ORDER BY seqno`).all() as { name: string }[]).map((c) => c.name).join(','));
    const fks = db.prepare(`SELECT * FROM pragma_foreign_key_list('${t.name}') ORDER BY id, seq`).all() as { id: number; table: string; from: string; to: string }[];
    const byId = new Map<number, string[]>();
    for (const fk of fks) byId.set(fk.id, [...(byId.get(fk.id) ?? []), `${fk.from}->${fk.table}.${fk.to}`]);
    out[t.name] = {
      // An INTEGER PRIMARY KEY is NOT NULL in effect (it is the rowid); the declared flag does not say so.
      columns: cols.map((c) => `${c.name} ${SQLITE_TYPES[c.type] ?? c.type}${c.notnull || c.pk ? ' not null' : ''}${c.dflt_value !== null ? ' default' : ''}`).sort(),
      primaryKey: cols.filter((c) => c.pk > 0).sort((a, b) => a.pk - b.pk).map((c) => c.name),
      unique: unique.sort(),
      foreignKeys: [...byId.values()].map((parts) => parts.join(',')).sort(),
      checks: checkCount(t.sql),
    };
  }
  return out;
}

export function pgSchema(c: SyncConnection): LogicalSchema {
  const q = (sql: string) => c.query(sql, []).rows as Record<string, string>[];
  const tables = q(`SELECT table_name FROM information_schema.tables WHERE table_schema = current_schema() AND table_type = 'BASE TABLE'`)
    .map((r) => r.table_name!).filter((n) => !LEFT_OUT.test(n)).sort();
  const out: LogicalSchema = {};
  for (const t of tables) {
    const cols = q(`SELECT column_name, data_type, is_nullable, column_default, is_identity FROM information_schema.columns
      WHERE table_schema = current_schema() AND table_name = '${t}'`);
    const constraints = q(`SELECT con.contype, array_to_string(array(SELECT a.attname FROM unnest(con.conkey) WITH ORDINALITY k(n, i)
        JOIN pg_attribute a ON a.attrelid = con.conrelid AND a.attnum = k.n ORDER BY k.i), ',') AS cols,
        array_to_string(array(SELECT a.attname FROM unnest(con.confkey) WITH ORDINALITY k(n, i)
        JOIN pg_attribute a ON a.attrelid = con.confrelid AND a.attnum = k.n ORDER BY k.i), ',') AS fcols,
        con.confrelid::regclass::text AS ftable
      FROM pg_constraint con WHERE con.conrelid = '${t}'::regclass`);
    const fk = (r: Record<string, string>) => {
      const from = r.cols!.split(','), to = r.fcols!.split(',');
      return from.map((f, i) => `${f}->${r.ftable}.${to[i]}`).join(',');
    };
    out[t] = {
      columns: cols.map((col) => `${col.column_name} ${PG_TYPES[col.data_type!] ?? col.data_type}${col.is_nullable === 'NO' ? ' not null' : ''}`
        + `${col.column_default !== null && col.is_identity !== 'YES' ? ' default' : ''}`).sort(),
      primaryKey: constraints.filter((r) => r.contype === 'p').flatMap((r) => r.cols!.split(',')),
      unique: constraints.filter((r) => r.contype === 'u').map((r) => r.cols!).sort(),
      foreignKeys: constraints.filter((r) => r.contype === 'f').map(fk).sort(),
      checks: constraints.filter((r) => r.contype === 'c').length,
    };
  }
  return out;
}
