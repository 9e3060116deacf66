import { existsSync, readdirSync, renameSync, statSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import type { RestoreResult } from '../core/api/store';
import { StoreError, failure, success } from './errors';
import type { StoreResult } from './errors';
import { inspectStoreFile } from './inspect';
import { prepareIncoming, removeStoreFiles } from './restore-copy';

/** FILE + this + pid: a restore's working copy of the backup. */
export const INCOMING = '.restore-incoming-';
/** FILE + this: a complete, checked copy of the backup waiting to take the place of a damaged store. */
const READY = '.restore-ready';

const stampNow = () => new Date().toISOString().replace(/[:.]/g, '-');

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Names beside FILE that start with FILE + infix, newest first. */
function beside(file: string, infix: string): string[] {
  const dir = dirname(resolve(file));
  const prefix = `${basename(file)}${infix}`;
  // Companion files and unfinished copies (.partial) are never candidates.
  return readdirSync(dir).filter((n) => n.startsWith(prefix) && !/(-wal|-shm|-journal|\.partial)$/.test(n))
    .map((n) => join(dir, n)).sort((a, b) => statSync(b).mtimeMs - statSync(a).mtimeMs);
}

function moveWithCompanions(from: string, to: string): void {
  for (const suffix of ['-wal', '-shm', '-journal']) if (existsSync(`${from}${suffix}`)) renameSync(`${from}${suffix}`, `${to}${suffix}`);
  renameSync(from, to);
}

const isMissing = (file: string) => !existsSync(file) || statSync(file).size === 0;

/**
 * Before a store is opened: a restore that stopped half way is finished or rolled back, and where no
 * store is left but a previous store's remnants are, nothing new is created over them.
 * - FILE.restore-ready (a complete, checked copy) with no FILE: the restore is finished.
 * - FILE.before-restore-* with no FILE (a restore that moved the store aside and stopped): the newest is
 *   put back.
 * - FILE.damaged-* alone: refused, with the way to restore.
 * Working copies of restores whose process is gone are removed.
 */
export function finishInterruptedRestore(file: string): void {
  if (!existsSync(dirname(resolve(file)))) return;
  for (const copy of beside(file, INCOMING)) {
    const pid = Number(copy.slice(copy.lastIndexOf('-') + 1));
    if (Number.isInteger(pid) && !alive(pid)) removeStoreFiles(copy);
  }
  if (!isMissing(file)) return;
  const ready = `${file}${READY}`;
  if (existsSync(ready)) return moveWithCompanions(ready, file);
  const kept = beside(file, '.before-restore-');
  if (kept[0]) return moveWithCompanions(kept[0], file);
  const damaged = beside(file, '.damaged-');
  if (damaged[0]) {
    throw new StoreError('store-missing',
      `there is no store at ${file}, only the damaged store kept as ${damaged[0]}: restore a backup with `
      + `db restore --db "${file}" --from BACKUP-FILE (a new empty store is not created over it)`);
  }
}

/**
 * A restore that failed after the damaged store was moved aside (the copy could not be put in its place):
 * the damaged store goes back where it was and the copy is dropped, so the store is as before the attempt
 * (still damaged, still refused for saves) and the next open neither finishes the failed restore nor finds
 * no store. Should even this fail, the next open finds the copy or the damaged store (finishInterruptedRestore).
 */
function putBack(damagedKeptAs: string, file: string, ready: string): void {
  try {
    moveWithCompanions(damagedKeptAs, file);
    removeStoreFiles(ready);
  } catch {
    // Left for the next open, which finishes the restore from the copy or refuses the damaged store.
  }
}

/**
 * Restores a backup where the store cannot be opened because it is damaged (so nothing can have it
 * open through this program): the backup is copied and checked as FILE.restore-ready, the damaged file is
 * moved aside as FILE.damaged-*, and the copy takes its place. A crash at any point is finished by the
 * next open (finishInterruptedRestore).
 */
export async function restoreDamagedStore(file: string, from: string, pause?: (stage: 'ready' | 'moved') => Promise<void>):
  Promise<StoreResult<RestoreResult & { damagedKeptAs: string }>> {
  const ready = `${file}${READY}`;
  const partial = `${file}${INCOMING}${process.pid}`;
  const damagedKeptAs = `${file}.damaged-${stampNow()}`;
  let movedAside = false;
  try {
    const { version } = inspectStoreFile(from, { check: 'full' });
    await prepareIncoming(from, partial);
    moveWithCompanions(partial, ready);
    await pause?.('ready');
    if (existsSync(file)) {
      moveWithCompanions(file, damagedKeptAs);
      movedAside = true;
    }
    await pause?.('moved');
    moveWithCompanions(ready, file);
    return success({ restoredFrom: from, previousKeptAs: damagedKeptAs, damagedKeptAs, version });
  } catch (e) {
    removeStoreFiles(partial);
    if (movedAside && !existsSync(file)) putBack(damagedKeptAs, file, ready);
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    return failure('restore-failed', (e as Error).message, 'file');
  }
}
