import type { Command } from './commands';
import { subcommandOf } from './commands';
import type { ParsedArgs } from './io';
import { InputError, requireOption, toJson } from './io';
import type { ApiResult } from '../../core/api';
import type { FileActions } from '../api';
import type { Caller } from './store-session';
import { positional, raise, storeOption, withStore } from './store-session';
import {
  StoreError, copyStore, createDemoShop, inspectStoreFile, isPostgresLocation, openStoreAt, restoreDamagedStore, storeBytes, writeExport,
} from '../../db';
import type { Store } from '../../db';
import type { JobStatus } from '../../core/api/store';
import { jobStatuses } from '../../core/api/store';
import { bytesRead, checkNotice, withProgress } from './progress';

type Sub = (args: ParsedArgs, files: FileActions, out: (text: string) => void, call: Caller, store: Store) => Promise<void>;

const jobsDone = (done: number, total: number) => `${done} of ${total} jobs`;
const pagesCopied = (done: number, total: number) => `${done} of ${total} pages`;

/** The command line names its files itself: it reaches the host's file actions, which the window cannot. */
async function must<T>(result: Promise<ApiResult<T>>): Promise<T> {
  const r = await result;
  if (!r.ok) raise(r.error);
  return r.value;
}

/** --status S[,S]: the export's jobs by status (every job without it). */
function statusOption(args: ParsedArgs): JobStatus[] | undefined {
  const given = args.options.get('status');
  if (given === undefined) return undefined;
  const statuses = typeof given === 'string' ? given.split(',').map((s) => s.trim()) : [];
  const unknown = statuses.length === 0 ? '' : statuses.find((s) => !(jobStatuses as readonly string[]).includes(s));
  if (unknown !== undefined) throw new InputError([{ code: 'invalid-status', path: 'status', message: `--status takes ${jobStatuses.join(', ')} (several with commas), not "${unknown}"` }]);
  return statuses as JobStatus[];
}

/** Standard output as the export's sink, waiting whenever the pipe is full. */
const stdoutSink = {
  write: (text: string) => new Promise<void>((resolve, reject) => {
    process.stdout.write(text, (e) => (e ? reject(e) : resolve()));
  }),
};

const subcommands: Record<string, Sub> = {
  backup: async (args, files, out) => out(toJson(await must(withProgress('Backing up', (p) => files.run('backup', { file: requireOption(args, 'out') }, p), pagesCopied)))),
  restore: async (args, files, out) => out(toJson(await must(files.run('restore', { file: requireOption(args, 'from') })))),
  export: async (args, files, out, _call, store) => {
    const file = args.options.get('out');
    const format = args.options.has('csv') ? 'csv' : 'json';
    const status = statusOption(args);
    if (typeof file !== 'string') {
      // Straight to standard output, a chunk at a time, so a million jobs never sit in memory.
      await withProgress('Exporting', (p) => writeExport(store, { format, status }, stdoutSink, p), jobsDone);
      return;
    }
    const result = await must(withProgress('Exporting', (p) => files.run('exportJobs', { format, status, force: args.options.has('force'), file }, p), jobsDone));
    out(toJson({ format: result.format, count: result.count, file: result.file, ...(result.problems ? { problems: result.problems } : {}) }));
  },
  import: async (args, files, out) => {
    const result = await must(withProgress('Importing', (p) => files.run('importJobs', {
      file: positional(args, 1, 'FILE', 'db import'), renumber: args.options.has('renumber'),
    }, p), bytesRead));
    out(toJson({ count: result.imported.length, imported: result.imported, ...(result.problems ? { problems: result.problems } : {}) }));
  },
  reindex: async (args, _files, out, call) => out(toJson(await call('reindexJobs', { all: args.options.has('all') }))),
};

export const dbCommand: Command = {
  name: 'db',
  usage: [
    'db backup --db DB --out FILE     online backup of the store to a new file, verified',
    '  db restore --db DB --from FILE  replace the store\'s contents with a verified backup, also while other programs',
    '                                  have it open; the old store (or a damaged one) is kept beside it',
    '  db export --db DB [--out FILE [--force]] [--csv] [--status S[,S]]   jobs as a coilwright-jobs JSON document (archive',
    '                                  state, links and enquiries included), or the job list as CSV; an existing FILE is',
    '                                  replaced only with --force; --status: only jobs of these statuses',
    '  db import FILE --db DB [--renumber]      add jobs from JSON or CSV: every record checked, all or nothing',
    '  db reindex --db DB [--all]      recompute the search numbers of jobs indexed by another engine version (--all: every job)',
    '  db check --db DB                the full damage check of a store file (PRAGMA integrity_check, every page and index',
    '                                  entry; it opens nothing for writing); exit 2 with the way to restore when damaged',
    '  db copy --from STORE --to STORE every job, revision, quote, attachment, setting and record into an empty store, in one',
    '                                  transaction, counts and checksums verified; STORE is a file or a postgres:// connection string',
  ].join('\n'),
  async run(args, out) {
    const name = args.positional[0];
    if (name === 'copy') return copyBetween(args, out);
    if (name === 'check') return checkStoreFile(args, out);
    const sub = subcommandOf('db', args, subcommands);
    try {
      await withStore(args, (call, service) => sub(args, service.files, out, call, service.store()));
    } catch (e) {
      if (name !== 'restore' || !(e instanceof InputError) || e.errors[0]?.code !== 'store-corrupt') throw e;
      await restoreOverDamaged(args, out);
    }
  },
};

function openNamed(args: ParsedArgs, option: 'from' | 'to'): Store {
  try {
    return openStoreAt(requireOption(args, option));
  } catch (e) {
    if (e instanceof StoreError) throw new InputError([{ code: e.code, message: e.message, path: `--${option}` }]);
    throw e;
  }
}

/** `db copy`: both stores are named by file or host/database in the output, never by their connection strings. */
async function copyBetween(args: ParsedArgs, out: (text: string) => void): Promise<void> {
  const source = openNamed(args, 'from');
  try {
    const target = openNamed(args, 'to');
    try {
      const result = copyStore(source, target);
      if (!result.ok) raise(result.error);
      out(toJson({ from: source.file, to: target.file, tables: result.value.tables }));
    } finally {
      target.close();
    }
  } finally {
    source.close();
  }
}

/** `db check`: reads the file only, as the checks before opening do, with integrity_check instead of quick_check. */
function checkStoreFile(args: ParsedArgs, out: (text: string) => void): void {
  const { location, path } = storeOption(args);
  if (isPostgresLocation(location)) {
    throw new InputError([{ code: 'not-a-file', path, message: 'db check reads a store file; a PostgreSQL server checks its own pages' }]);
  }
  const notice = checkNotice('checking the store for damage');
  const bytes = storeBytes(location);
  notice('start', bytes);
  try {
    const { state, version } = inspectStoreFile(location, { check: 'full' });
    if (state === 'new') throw new InputError([{ code: 'store-missing', path, message: `there is no store at ${location}` }]);
    out(toJson({ file: location, version, bytes, check: 'integrity_check', result: 'ok' }));
  } catch (e) {
    if (e instanceof StoreError) throw new InputError([{ code: e.code, message: e.message, path }]);
    throw e;
  } finally {
    notice('end', bytes);
  }
}

/** A damaged store cannot be opened, so its restore puts the backup in its place and keeps it beside. */
async function restoreOverDamaged(args: ParsedArgs, out: (text: string) => void): Promise<void> {
  const result = await restoreDamagedStore(requireOption(args, 'db'), requireOption(args, 'from'));
  if (!result.ok) raise(result.error);
  out(toJson(result.value));
}

export const demoCommand: Command = {
  name: 'demo',
  usage: 'demo --db FILE            create the DEMO shop (settings, customers, about 30 jobs) in a new store',
  async run(args, out) {
    const { file, result } = await withStore(args, async (_call, service) => ({ file: service.store().file, result: createDemoShop(service.store()) }));
    if (!result.ok) raise(result.error);
    out(toJson({ file, ...result.value }));
  },
};
