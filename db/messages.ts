import { basename } from 'node:path';

/** The message for a store that fails its check: what is wrong, and how to get the shop's data back. */
export function damagedMessage(file: string, detail: string): string {
  return `${file} is damaged (${detail}) and was not opened. Restore your latest backup over it with `
    + `db restore --db "${file}" --from BACKUP-FILE; the damaged file is kept beside it as ${basename(file)}.damaged-…`;
}

/** Shown when a store opens read-only: what still works and what does not. */
export function readOnlyNotice(file: string, reason: string): string {
  return `note: ${file} is open read-only (${reason}): lists, searches and prints work; saves are refused until it is writable`;
}
