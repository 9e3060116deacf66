import type Database from 'better-sqlite3';

/**
 * The triggers that keep the search structures as jobs are added: the text index (FTS5, migration 0014)
 * and the shape trees (R*Tree, migration 0009).
 */
const FILLED_TRIGGERS = ['jobs_text_insert', 'jobs_shape_insert'] as const;

interface SchemaRow {
  name: string;
  sql: string;
}

const TRIGGER_BODY = /^\s*CREATE\s+TRIGGER\s+\S+\s+AFTER\s+INSERT\s+ON\s+jobs\s+BEGIN\s([\s\S]*)\bEND\s*$/i;
const INSERT_VALUES = /^\s*INSERT\s+INTO\s+(\w+)\s*(\([^()]*\))\s*VALUES\s*\(([\s\S]*)\)\s*$/i;
const INSERT_SELECT = /^\s*INSERT\s+INTO\s+\w+\s+SELECT\s/i;
/** Clauses whose meaning one statement over many jobs would not keep. */
const NOT_FILLED = /\b(ON\s+CONFLICT|RETURNING|FROM|GROUP\s+BY|ORDER\s+BY|LIMIT)\b/i;

/**
 * The SQL with its quoted and parenthesised parts blanked, at the same places: only the statement's own
 * clauses and separators are left to look at.
 */
function topLevel(sql: string): string {
  let out = '';
  let depth = 0;
  let quoted = false;
  for (let i = 0; i < sql.length; i++) {
    const c = sql[i]!;
    if (c === "'") quoted = !quoted;
    if (!quoted && c === ')') depth--;
    out += quoted || c === "'" || depth > 0 ? ' ' : c;
    if (!quoted && c === '(') depth++;
  }
  return out;
}

/** A trigger body's statements: split at the semicolons outside quotes and parentheses. */
function statementsOf(body: string): string[] {
  const top = topLevel(body);
  const out: string[] = [];
  let from = 0;
  for (let i = top.indexOf(';'); i >= 0; i = top.indexOf(';', i + 1)) {
    out.push(body.slice(from, i));
    from = i + 1;
  }
  out.push(body.slice(from));
  return out.filter((s) => s.trim() !== '');
}

/**
 * One statement of a trigger, as one statement over many jobs: the trigger's own expressions over the
 * jobs table named `new`, for the jobs after the id bound to `?`. Undefined for any other form.
 */
function fillStatement(statement: string): string | undefined {
  const top = topLevel(statement);
  if (NOT_FILLED.test(top)) return undefined;
  const values = INSERT_VALUES.exec(statement);
  if (values) return `INSERT INTO ${values[1]} ${values[2]} SELECT ${values[3]} FROM jobs AS new WHERE new.id > ? ORDER BY new.id`;
  const where = top.search(/\bWHERE\b/i);
  if (!INSERT_SELECT.test(statement) || where < 0) return undefined;
  return `${statement.slice(0, where)} FROM jobs AS new WHERE (${statement.slice(where + 5)}) AND new.id > ? ORDER BY new.id`;
}

/**
 * A trigger's body as statements over many jobs, read from the store's own schema (so a later migration's
 * trigger is followed as it is). Undefined when any statement is not of a form above: that trigger then
 * stays in place, job by job.
 */
function fillsOf(trigger: SchemaRow): string[] | undefined {
  const body = TRIGGER_BODY.exec(trigger.sql)?.[1];
  if (body === undefined) return undefined;
  const fills = statementsOf(body).map(fillStatement);
  return fills.length > 0 && fills.every((f) => f !== undefined) ? fills as string[] : undefined;
}

/** Whether SQLite reads the statement (a form this file misread would not). */
function prepares(db: Database.Database, sql: string): boolean {
  try {
    db.prepare(sql);
    return true;
  } catch {
    return false;
  }
}

const schemaRow = (db: Database.Database, type: 'trigger', name: string) =>
  db.prepare('SELECT name, sql FROM sqlite_master WHERE type = ? AND name = ?').get(type, name) as SchemaRow | undefined;

/**
 * Search upkeep that an import of many jobs sets aside and does once, inside its one transaction, just
 * before the commit:
 * - the text index and the shape trees are filled for every job written since begin() by one statement
 *   each, from their triggers' own expressions. Row by row, FTS5 also writes its pending terms out at
 *   every statement of the import: a segment per job, merged again and again;
 * - when asked (dropListIndexes), the job list's indexes are built afresh: one sort each instead of a
 *   B-tree insert per index per job, which costs more than the whole rebuild once the import brings as
 *   many jobs as the store held.
 * The schema comes back exactly as it was (the store's own CREATE statements). All of it happens between
 * BEGIN and COMMIT: a rollback, or a process killed half-way, leaves the store as it was.
 */
export class DeferredUpkeep {
  private readonly indexes: SchemaRow[] = [];

  private constructor(
    private readonly db: Database.Database,
    private readonly afterId: number,
    private readonly triggers: { trigger: SchemaRow; fills: string[] }[],
  ) {}

  /** Sets the triggers' upkeep aside; call inside the import's transaction. */
  static begin(db: Database.Database): DeferredUpkeep {
    const afterId = (db.prepare('SELECT coalesce(max(id), 0) AS id FROM jobs').get() as { id: number }).id;
    const triggers = FILLED_TRIGGERS.flatMap((name) => {
      const trigger = schemaRow(db, 'trigger', name);
      const fills = trigger && fillsOf(trigger);
      return trigger && fills && fills.every((fill) => prepares(db, fill)) ? [{ trigger, fills }] : [];
    });
    for (const { trigger } of triggers) db.exec(`DROP TRIGGER "${trigger.name}"`);
    return new DeferredUpkeep(db, afterId, triggers);
  }

  get listIndexesDropped(): boolean {
    return this.indexes.length > 0;
  }

  /** Drops the job list's indexes (every index of jobs but the unique ones), to be built again by finish(). */
  dropListIndexes(): void {
    if (this.listIndexesDropped) return;
    this.indexes.push(...this.db.prepare(`SELECT name, sql FROM sqlite_master WHERE type = 'index' AND tbl_name = 'jobs'
                                          AND sql IS NOT NULL AND sql NOT LIKE 'CREATE UNIQUE%' ORDER BY name`).all() as SchemaRow[]);
    for (const index of this.indexes) this.db.exec(`DROP INDEX "${index.name}"`);
  }

  /** Does what was set aside, for every job written since begin(); call before the commit. */
  finish(): void {
    for (const { trigger, fills } of this.triggers) {
      for (const fill of fills) this.db.prepare(fill).run(this.afterId);
      this.db.exec(trigger.sql);
    }
    for (const index of this.indexes) this.db.exec(index.sql);
  }
}
