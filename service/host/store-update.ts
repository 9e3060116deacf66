import { LATEST_VERSION, inspectStoreFile, isPostgresLocation, storeBytes, tryOpenStore } from '../../db';

/**
 * From this size a store's update to a new schema can take long enough to look like a program that did not
 * start: the update rebuilding each kind's similar-jobs index (migration 0020) took 35 s on a store of a
 * million jobs (3.5 GB) and 1.3 s, with 0019, on one of 100 000 (0.35 GB).
 */
export const NOTICE_FROM_BYTES = 64 * 1024 * 1024;

export interface PendingUpdate {
  file: string;
  from: number;
  to: number;
  bytes: number;
}

/** The store file's schema update still to do when it opens, when the store is large enough for it to take a while. */
export function pendingLargeUpdate(location: string): PendingUpdate | null {
  if (isPostgresLocation(location)) return null;
  try {
    const info = inspectStoreFile(location);
    if (info.state !== 'store' || info.version >= LATEST_VERSION) return null;
    const bytes = storeBytes(location);
    return bytes < NOTICE_FROM_BYTES ? null : { file: location, from: info.version, to: LATEST_VERSION, bytes };
  } catch {
    // Anything wrong with the file is for the open itself to report.
    return null;
  }
}

/** What the user reads while the update runs: the headline, then what happens. */
export function updateNoticeText(pending: PendingUpdate): { headline: string; detail: string[] } {
  const gigabytes = pending.bytes / 1e9;
  const size = gigabytes >= 1 ? `${gigabytes.toFixed(1)} GB` : `${Math.round(pending.bytes / 1e6)} MB`;
  return {
    headline: 'Updating the job store for this version of Coilwright',
    detail: [
      `${pending.file} (${size}) is being brought from schema version ${pending.from} to ${pending.to}. This happens once, and can`
        + ' take a minute or more for a large store. Please do not switch the computer off.',
      'If the update stops part way, the store is left as it was.',
    ],
  };
}

export type UpdateOutcome = { ok: true } | { ok: false; code: string; message: string };

/**
 * Brings a store file to this version's schema and closes it again: the open's own path (an interrupted restore
 * finished, the file inspected, pending migrations in one transaction), without the damage check, which the
 * open that follows runs by its own rule. The desktop app runs this in a worker thread, so its windows keep
 * answering while a large store updates.
 */
export function updateStoreFile(file: string): UpdateOutcome {
  try {
    const opened = tryOpenStore(file, { check: 'none' });
    if (!opened.ok) return { ok: false, code: opened.error.code, message: opened.error.message };
    opened.value.close();
    return { ok: true };
  } catch (e) {
    return { ok: false, code: 'store-update-failed', message: (e as Error).message };
  }
}
