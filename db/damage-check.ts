import Database from 'better-sqlite3';
import { existsSync, statSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
import type { DamageCheckInfo } from '../core/api/store-types';
import { StoreError } from './errors';
import { damagedWhileOpenMessage } from './messages';
import { openForReading } from './read-only';

/**
 * The size rule: a store file (with its -wal) up to this size gets PRAGMA quick_check before it opens; a
 * larger one opens after the cheap checks (header, application id, schema version, reading sqlite_schema) and
 * gets its check after opening. quick_check reads every page: measured with `npm run bench -- store` at
 * 0.9 s for 286 MB (100 000 jobs) and about 9 s for 2.8 GB (1 000 000 jobs), about 3 ms a megabyte, so 64 MB
 * adds about 0.2 s to an open, while the job list's first page takes about 5 ms at any size.
 */
export const CHECK_BEFORE_OPEN_MAX_BYTES = 64 * 1024 * 1024;

/**
 * Where a large store's check runs: 'background' on a read-only connection of its own in a worker thread
 * while the program works (the app, the web transport); 'first-save' synchronously just before the first
 * save, so a command that only reads never waits for it (the command line).
 */
export type DeferredCheck = 'background' | 'first-save';

/** Told when a check run just before a save starts and ends (the command line's progress text). */
export type CheckProgress = (event: 'start' | 'end', bytes: number) => void;

/** The bytes quick_check reads: the file and the pages its -wal holds. */
export function storeBytes(file: string): number {
  const size = (name: string) => (existsSync(name) ? statSync(name).size : 0);
  return size(file) + size(`${file}-wal`);
}

/** What quick_check answered: its lines, or the error it stopped with. */
type CheckAnswer = { lines: string[] } | { error: { code: string; message: string } };

/**
 * The worker is plain JavaScript loading the better-sqlite3 this thread loaded, by its path, with the same
 * native addon (the Electron build inside the app, the Node build elsewhere), so it runs the same from the
 * sources, the CLI bundle and the app bundle.
 */
const WORKER_SOURCE = `
const { workerData, parentPort } = require('node:worker_threads');
const Database = require(workerData.sqlitePath);
let db;
try {
  const binding = workerData.nativeBinding ? { nativeBinding: workerData.nativeBinding } : {};
  db = new Database(workerData.file, { readonly: true, fileMustExist: true, timeout: 5000, ...binding });
  parentPort.postMessage({ lines: db.pragma('quick_check').map((row) => String(Object.values(row)[0])) });
} catch (e) {
  parentPort.postMessage({ error: { code: String((e && e.code) || ''), message: String(e && e.message) } });
} finally {
  if (db) db.close();
}
`;

/** Where this thread's better-sqlite3 and its native addon were loaded from; undefined when they were not. */
function loadedSqlite(): { sqlitePath: string; nativeBinding?: string } | undefined {
  const loaded = Object.keys(require.cache);
  const sqlitePath = loaded.find((name) => /better-sqlite3[\\/]lib[\\/]index\.js$/.test(name));
  const nativeBinding = loaded.find((name) => /better_sqlite3\.node$/.test(name));
  if (sqlitePath === undefined) return undefined;
  return nativeBinding === undefined ? { sqlitePath } : { sqlitePath, nativeBinding };
}

function quickCheckNow(file: string): CheckAnswer {
  let db: Database.Database | undefined;
  try {
    db = openForReading(file);
    return { lines: (db.pragma('quick_check') as Record<string, unknown>[]).map((row) => String(Object.values(row)[0])) };
  } catch (e) {
    return { error: { code: e instanceof Database.SqliteError ? e.code : '', message: (e as Error).message } };
  } finally {
    db?.close();
  }
}

/** The first three lines of quick_check's report, without the line naming the database (always "main"). */
function firstLines(rows: string[]): string[] {
  return rows.flatMap((row) => row.split('\n')).map((line) => line.trim()).filter((line) => line !== '' && !/^\*\*\* in database/.test(line)).slice(0, 3);
}

/** The answer as a state: only SQLite's own word for damage fails the store; a check that could not run says why. */
function stateOf(answer: CheckAnswer, at: string): DamageCheckInfo {
  if ('lines' in answer) {
    if (answer.lines.length === 1 && answer.lines[0] === 'ok') return { state: 'passed', at };
    return { state: 'failed', at, problem: `quick_check: ${firstLines(answer.lines).join('; ')}` };
  }
  const { code, message } = answer.error;
  if (code.startsWith('SQLITE_CORRUPT') || code === 'SQLITE_NOTADB') return { state: 'failed', at, problem: message };
  return { state: 'not-checked', reason: `the damage check could not run (${message})` };
}

/** One open store's damage check: its state, and the refusal of saves once it found damage. */
export class DamageCheck {
  private current: DamageCheckInfo;
  private worker: Worker | undefined;
  private waiting: ((state: DamageCheckInfo) => void)[] = [];
  private pendingBeforeSave: CheckProgress | undefined;

  private constructor(private readonly file: string, private readonly clock: () => Date, initial: DamageCheckInfo) {
    this.current = initial;
  }

  /** Checked before opening (or a new file): passed at the open. */
  static passedAtOpen(file: string, clock: () => Date): DamageCheck {
    return new DamageCheck(file, clock, { state: 'passed', at: clock().toISOString() });
  }

  static notChecked(file: string, clock: () => Date, reason: string): DamageCheck {
    return new DamageCheck(file, clock, { state: 'not-checked', reason });
  }

  /** Starts the check on its own read-only connection in a worker thread; WAL lets it read while the store works. */
  static inBackground(file: string, clock: () => Date): DamageCheck {
    const sqlite = loadedSqlite();
    if (sqlite === undefined) return DamageCheck.notChecked(file, clock, 'the damage check could not find SQLite to run in the background');
    const check = new DamageCheck(file, clock, { state: 'running', since: clock().toISOString() });
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { file, ...sqlite } });
    check.worker = worker;
    worker.unref();
    worker.once('message', (answer: CheckAnswer) => check.settle(stateOf(answer, clock().toISOString())));
    worker.once('error', (e) => check.settle({ state: 'not-checked', reason: `the damage check could not run (${e.message})` }));
    worker.once('exit', () => check.settle({ state: 'not-checked', reason: 'the damage check stopped before it answered' }));
    return check;
  }

  /** The check waits for the first save and runs just before it, synchronously. */
  static beforeFirstSave(file: string, clock: () => Date, progress?: CheckProgress): DamageCheck {
    const check = new DamageCheck(file, clock, { state: 'not-checked', reason: 'it runs before the first save' });
    check.pendingBeforeSave = progress ?? (() => {});
    return check;
  }

  state(): DamageCheckInfo {
    return this.current;
  }

  /** Resolves once the check is no longer running (at once when it is not). */
  settled(): Promise<DamageCheckInfo> {
    if (this.current.state !== 'running') return Promise.resolve(this.current);
    return new Promise((resolve) => this.waiting.push(resolve));
  }

  /** Why nothing can be saved because the check found damage, or undefined. */
  damage(): string | undefined {
    return this.current.state === 'failed' ? `it is damaged (${this.current.problem})` : undefined;
  }

  /** The refusal of a save once damage was found: the same error value for every save of this store. */
  refusal(): StoreError | undefined {
    const found = this.current;
    return found.state === 'failed' ? new StoreError('store-corrupt', damagedWhileOpenMessage(this.file, found.problem)) : undefined;
  }

  /** Runs a check that waits for the first save (once), then answers as refusal() does. */
  beforeSave(): StoreError | undefined {
    const progress = this.pendingBeforeSave;
    if (progress) {
      this.pendingBeforeSave = undefined;
      const bytes = storeBytes(this.file);
      progress('start', bytes);
      try {
        this.current = stateOf(quickCheckNow(this.file), this.clock().toISOString());
      } finally {
        progress('end', bytes);
      }
    }
    return this.refusal();
  }

  close(): void {
    this.pendingBeforeSave = undefined;
    if (this.worker) void this.worker.terminate();
  }

  private settle(state: DamageCheckInfo): void {
    if (this.current.state !== 'running') return;
    this.current = state;
    this.worker = undefined;
    for (const resolve of this.waiting.splice(0)) resolve(state);
  }
}
