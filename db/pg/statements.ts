import type { Statement } from '../store';
import type { SyncConnection } from './connection';

/** `?` placeholders as PostgreSQL's `$1, $2, …`, leaving string literals and quoted names alone. */
export function numberedPlaceholders(sql: string): string {
  let out = '';
  let n = 0;
  let quote: string | null = null;
  for (const ch of sql) {
    if (quote) {
      if (ch === quote) quote = null;
      out += ch;
    } else if (ch === "'" || ch === '"') {
      quote = ch;
      out += ch;
    } else if (ch === '?') {
      n += 1;
      out += `$${n}`;
    } else {
      out += ch;
    }
  }
  return out;
}

const INSERT_INTO = /^\s*INSERT\s+INTO\s+([a-z_][a-z0-9_]*)/i;

/**
 * One statement over the connection, in better-sqlite3's shape. An INSERT into a table with an `id` column
 * returns the new id, which SQLite reports as lastInsertRowid.
 */
export function pgStatement(connection: SyncConnection, sql: string, idTables: ReadonlySet<string>): Statement {
  const table = INSERT_INTO.exec(sql)?.[1]?.toLowerCase();
  const returning = table !== undefined && idTables.has(table) && !/\bRETURNING\b/i.test(sql);
  const text = numberedPlaceholders(sql) + (returning ? ' RETURNING id' : '');
  const query = (params: unknown[]) => connection.query(text, params);
  return {
    get: (...params) => query(params).rows[0],
    all: (...params) => query(params).rows,
    run: (...params) => {
      const r = query(params);
      return { changes: r.rowCount, lastInsertRowid: returning ? Number(r.rows[0]?.id ?? 0) : 0 };
    },
  };
}
