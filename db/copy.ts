import { createHash } from 'node:crypto';
import { StoreError, failure, success } from './errors';
import type { StoreResult } from './errors';
import type { Store } from './store';

/**
 * Tables the target's own triggers fill as rows arrive (the job counts; the text and shape search structures
 * are not base tables on either side, or are left out by name): copying them would count every job twice.
 */
const DERIVED = new Set(['job_counts', 'job_text', 'coilwright_store']);
const SEARCH = /^(job_text|job_shape)/;

interface TableInfo { name: string; columns: string[]; key: string[]; parents: string[] }

/** The base tables of a store with their columns, primary key and the tables their foreign keys name. */
function tables(store: Store): TableInfo[] {
  if (store.dialect === 'sqlite') {
    const names = (store.sql("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name").all() as { name: string }[])
      .map((r) => r.name).filter((n) => !DERIVED.has(n) && !SEARCH.test(n));
    return names.map((name) => {
      const cols = store.sql('SELECT name, pk FROM pragma_table_info(?)').all(name) as { name: string; pk: number }[];
      const parents = (store.sql('SELECT "table" AS parent FROM pragma_foreign_key_list(?)').all(name) as { parent: string }[]).map((r) => r.parent);
      return { name, columns: cols.map((c) => c.name), key: cols.filter((c) => c.pk > 0).sort((a, b) => a.pk - b.pk).map((c) => c.name), parents };
    });
  }
  const names = (store.sql(`SELECT table_name AS name FROM information_schema.tables WHERE table_schema = current_schema()
    AND table_type = 'BASE TABLE' ORDER BY table_name`).all() as { name: string }[]).map((r) => r.name).filter((n) => !DERIVED.has(n) && !SEARCH.test(n));
  return names.map((name) => {
    const cols = (store.sql(`SELECT column_name AS name FROM information_schema.columns WHERE table_schema = current_schema()
      AND table_name = ? AND is_generated = 'NEVER' ORDER BY ordinal_position`).all(name) as { name: string }[]).map((r) => r.name);
    const key = (store.sql(`SELECT a.attname AS name FROM pg_index i JOIN pg_attribute a ON a.attrelid = i.indrelid AND a.attnum = ANY(i.indkey)
      WHERE i.indrelid = ?::regclass AND i.indisprimary`).all(name) as { name: string }[]).map((r) => r.name);
    const parents = (store.sql(`SELECT confrelid::regclass::text AS parent FROM pg_constraint WHERE conrelid = ?::regclass AND contype = 'f'`)
      .all(name) as { parent: string }[]).map((r) => r.parent);
    return { name, columns: cols, key, parents };
  });
}

/** Parents before children, so every foreign key finds its row. */
function inDependencyOrder(list: TableInfo[]): TableInfo[] {
  const byName = new Map(list.map((t) => [t.name, t]));
  const out: TableInfo[] = [];
  const seen = new Set<string>();
  const visit = (t: TableInfo) => {
    if (seen.has(t.name)) return;
    seen.add(t.name);
    for (const p of t.parents) if (p !== t.name && byName.has(p)) visit(byName.get(p)!);
    out.push(t);
  };
  list.forEach(visit);
  return out;
}

const PAGE = 400;

/**
 * Values one INSERT carries at most: a page of jobs goes in one statement (the server's per-statement
 * triggers then count and index the page at once); PostgreSQL takes 65 535 parameters, SQLite 32 766.
 */
const MAX_PARAMETERS = 30_000;

/** Every row of a table in primary-key order, a page at a time (keyset on an id, else the whole small table). */
function* rowsOf(store: Store, t: TableInfo): Generator<Record<string, unknown>[]> {
  const cols = t.columns.map((c) => `"${c}"`).join(', ');
  const order = (t.key.length > 0 ? t.key : t.columns).map((c) => `"${c}"`).join(', ');
  if (t.key.length === 1 && t.key[0] === 'id') {
    let after = -1;
    for (;;) {
      const page = store.sql(`SELECT ${cols} FROM ${t.name} WHERE id > ? ORDER BY id LIMIT ${PAGE}`).all(after) as Record<string, unknown>[];
      if (page.length === 0) return;
      yield page;
      after = Number(page[page.length - 1]!.id);
    }
  }
  yield store.sql(`SELECT ${cols} FROM ${t.name} ORDER BY ${order}`).all() as Record<string, unknown>[];
}

/** A row as text both backends agree on: numbers as JSON numbers, bytes as hex, text as is. */
const canonical = (row: Record<string, unknown>, columns: string[]): string =>
  JSON.stringify(columns.map((c) => {
    const v = row[c];
    return Buffer.isBuffer(v) || v instanceof Uint8Array ? `bytes:${Buffer.from(v).toString('hex')}` : v ?? null;
  }));

export interface TableCopy { table: string; rows: number; sha256: string }

/**
 * Rows and checksum of a table. Tables keyed by id hash in id order; the small others are sorted as text
 * here, so the two servers' collations cannot change the order the checksum sees.
 */
function summary(store: Store, t: TableInfo, columns: string[]): TableCopy {
  const hash = createHash('sha256');
  const byId = t.key.length === 1 && t.key[0] === 'id';
  const held: string[] = [];
  let rows = 0;
  for (const page of rowsOf(store, { ...t, columns })) {
    for (const row of page) {
      if (byId) hash.update(`${canonical(row, columns)}\n`);
      else held.push(canonical(row, columns));
    }
    rows += page.length;
  }
  for (const line of held.sort()) hash.update(`${line}\n`);
  return { table: t.name, rows, sha256: hash.digest('hex') };
}

function insertPage(target: Store, table: string, columns: string[], page: Record<string, unknown>[]): void {
  const one = `(${columns.map(() => '?').join(', ')})`;
  const sql = `INSERT INTO ${table} (${columns.map((c) => `"${c}"`).join(', ')}) VALUES ${page.map(() => one).join(', ')}`;
  target.sql(sql).run(...page.flatMap((row) => columns.map((c) => row[c] ?? null)));
}

/** A server's identity sequences move past the copied ids, so the next job gets the next number. */
function advanceSequences(target: Store, list: TableInfo[]): void {
  if (target.dialect !== 'postgres') return;
  for (const t of list.filter((x) => x.columns.includes('id') && x.key.join() === 'id')) {
    target.sql(`SELECT setval(pg_get_serial_sequence('${t.name}', 'id'), coalesce((SELECT max(id) FROM ${t.name}), 0) + 1, false)`).get();
  }
}

/**
 * Copies every row of every table (jobs, revisions, quotes, attachments, settings and their history, first-off
 * records, and whatever tables later versions add) from one store into an empty one, in one transaction on
 * the target. Inside it, each table's row count and a SHA-256 over its rows in key order are compared with
 * the source's; any difference rolls the copy back. The search structures are rebuilt by the target's triggers.
 */
export function copyStore(source: Store, target: Store): StoreResult<{ tables: TableCopy[] }> {
  const from = inDependencyOrder(tables(source));
  const to = new Map(tables(target).map((t) => [t.name, t]));
  const missing = from.filter((t) => !to.has(t.name)).map((t) => t.name);
  if (missing.length > 0) return failure('copy-schema-differs', `${target.file} has no table ${missing.join(', ')}: open it with this version first`, 'to');
  const taken = from.filter((t) => (target.sql(`SELECT count(*) AS n FROM ${t.name}`).get() as { n: number }).n > 0).map((t) => t.name);
  if (taken.length > 0) {
    return failure('copy-target-not-empty', `${target.file} already holds data (${taken.join(', ')}): a copy goes into an empty store only`, 'to');
  }
  try {
    const copied = target.transaction(() => {
      const out: TableCopy[] = [];
      for (const t of from) {
        const columns = t.columns.filter((c) => to.get(t.name)!.columns.includes(c));
        const perStatement = Math.max(1, Math.floor(MAX_PARAMETERS / columns.length));
        for (const page of rowsOf(source, t)) {
          for (let i = 0; i < page.length; i += perStatement) insertPage(target, t.name, columns, page.slice(i, i + perStatement));
        }
        const before = summary(source, t, columns);
        const after = summary(target, { ...t, key: to.get(t.name)!.key }, columns);
        if (before.rows !== after.rows || before.sha256 !== after.sha256) {
          throw new StoreError('copy-verify-failed', `${t.name}: ${before.rows} rows read, ${after.rows} written, checksums ${before.sha256 === after.sha256 ? 'equal' : 'differ'}: nothing was copied`, 'to');
        }
        out.push(before);
      }
      advanceSequences(target, from);
      return out;
    });
    return success({ tables: copied });
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
