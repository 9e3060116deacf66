import type { ApiError, MethodInput, MethodName, MethodOutput, Contract } from '../../core/api';
import { CHECK_BEFORE_OPEN_MAX_BYTES, STORE_VARIABLE, StoreError, openStoreAt, readOnlyNotice } from '../../db';
import type { OpenOptions } from '../../db';
import { chosenStore } from '../host/first-run';
import { pendingLargeUpdate, updateNoticeText } from '../host/store-update';
import { createService, dispatch } from '../api';
import type { Service } from '../api';
import type { ParsedArgs } from './io';
import { InputError } from './io';
import { checkNotice } from './progress';

/** Bad input becomes exit 2 with every field error; anything unexpected is exit 1. */
export function raise(error: ApiError): never {
  if (error.code === 'unexpected') throw new Error(error.message);
  const head = { code: error.code, message: error.message, path: error.path };
  const details = error.details ?? [];
  // A refusal that stands above its details (e.g. a quote with open problems) is printed first, then each detail.
  throw new InputError(details.length === 0 ? [head] : details[0]!.code === head.code ? details : [head, ...details]);
}

/** --store (a postgres:// connection string or a file), --db FILE, or COILWRIGHT_STORE; one is required. */
export function storeOption(args: ParsedArgs): { location: string; path: string } {
  const given = (name: string) => {
    const v = args.options.get(name);
    return typeof v === 'string' ? v : undefined;
  };
  const location = chosenStore({ store: given('store'), db: given('db') });
  if (location === undefined) {
    throw new InputError([{ code: 'missing-option', path: '--db',
      message: `--db FILE or --store LOCATION (a file or a postgres:// connection string) is required, or set ${STORE_VARIABLE}` }]);
  }
  return { location, path: given('store') !== undefined ? '--store' : given('db') !== undefined ? '--db' : STORE_VARIABLE };
}

/**
 * How the command line opens a store file: within the size rule (db/damage-check.ts) the damage check runs
 * before opening, as always; a larger store opens after the cheap checks, so a command that only reads (list,
 * find, export, print) starts at once, and its check runs just before the first save. --no-check skips
 * quick_check altogether (the header, application id and schema version are still checked).
 */
export function cliOpenOptions(args: ParsedArgs): OpenOptions {
  if (args.options.has('no-check')) return { check: 'none' };
  return { check: 'by-size', deferredCheck: 'first-save', onCheck: checkNotice('checking the store for damage before saving') };
}

/** The help's words for cliOpenOptions. */
export const storeCheckHelp = [
  `Damage check: a store file up to ${CHECK_BEFORE_OPEN_MAX_BYTES / 2 ** 20} MB is checked (PRAGMA quick_check) before it opens. A larger one`,
  '  opens after the quick checks of its header and schema, so commands that only read (jobs list, find and show,',
  '  db export, a print that keeps nothing) start at once; a command that saves (jobs add, jobs status, db import,',
  '  print quote of stored jobs, which keeps the quotation, …) runs the check just before its first save, about 3 s',
  '  a GB, with a note on a terminal, and saves nothing into a damaged store. --no-check (given last, or before',
  '  another option) skips quick_check, the header and schema still checked. db check runs the full check',
  '  (integrity_check) on its own.',
].join('\n');

/** A large store brought up to this version's schema as it opens says so first (on standard error). */
function tellLargeUpdate(location: string): void {
  const pending = pendingLargeUpdate(location);
  if (!pending) return;
  const { headline, detail } = updateNoticeText(pending);
  process.stderr.write(`${headline}: ${detail.join(' ')}\n`);
}

export function openService(args: ParsedArgs): Service {
  const { location, path } = storeOption(args);
  tellLargeUpdate(location);
  try {
    const store = openStoreAt(location, cliOpenOptions(args));
    if (store.readOnly) process.stderr.write(`${readOnlyNotice(store.file, store.readOnly)}\n`);
    return createService(store);
  } catch (e) {
    if (e instanceof StoreError) throw new InputError([{ code: e.code, message: e.message, path }]);
    throw e;
  }
}

/** Opens the store named by --db, runs fn with a caller of the API, and always closes the store. */
export async function withStore<T>(args: ParsedArgs, fn: (call: Caller, service: Service) => Promise<T>): Promise<T> {
  const service = openService(args);
  try {
    return await fn(async (name, input) => {
      const result = await dispatch(service.handlers, name, input);
      if (!result.ok) raise(result.error);
      return result.value as never;
    }, service);
  } finally {
    service.close();
  }
}

export type Caller = <K extends MethodName>(name: K, input: MethodInput<Contract[K]>) => Promise<MethodOutput<Contract[K]>>;

export function intOption(args: ParsedArgs, name: string): number | undefined {
  const v = args.options.get(name);
  if (v === undefined) return undefined;
  if (typeof v !== 'string' || !/^\d+$/.test(v)) {
    throw new InputError([{ code: 'invalid-option', path: `--${name}`, message: `--${name} needs a whole number` }]);
  }
  return Number(v);
}

export function positional(args: ParsedArgs, index: number, name: string, command: string): string {
  const v = args.positional[index];
  if (v === undefined) throw new InputError([{ code: 'missing-argument', path: name, message: `${command} needs ${name}` }]);
  return v;
}

/** "12" is a job id; anything else is a job number such as "J-26-0012". */
export function jobRef(text: string): { id: number } | { number: string } {
  return /^\d+$/.test(text) ? { id: Number(text) } : { number: text };
}
