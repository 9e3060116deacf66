import { basename } from 'node:path';

/** How to get the shop's data back from a damaged store: one wording for every place that finds damage. */
function restoreAdvice(file: string): string {
  return `Restore your latest backup over it with db restore --db "${file}" --from BACKUP-FILE; `
    + `the damaged file is kept beside it as ${basename(file)}.damaged-…`;
}

/** The message for a store that fails its check: what is wrong, and how to get the shop's data back. */
export function damagedMessage(file: string, detail: string): string {
  return `${file} is damaged (${detail}) and was not opened. ${restoreAdvice(file)}`;
}

/**
 * The answer to a save after the check of an open store (run after opening, see db/damage-check.ts) found
 * damage: the store stays read-only for the rest of the time it is open.
 */
export function damagedWhileOpenMessage(file: string, detail: string): string {
  return `${file} is damaged (${detail}): nothing was saved, and it stays read-only while it is open. `
    + `Lists and prints still work where the damage allows: export what you need, close Coilwright, then ${restoreAdvice(file).replace(/^R/, 'r')}`;
}

/** Shown when a store opens read-only: what still works and what does not. */
export function readOnlyNotice(file: string, reason: string): string {
  return `note: ${file} is open read-only (${reason}): lists, searches and prints work; saves are refused until it is writable`;
}
