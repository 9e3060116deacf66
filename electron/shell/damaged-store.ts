import type { DamageCheckInfo } from '../../core/api/store-types';
import { dialog } from 'electron';
import { restoreDamagedStore } from '../../db';

/**
 * At start, a store that fails its damage check cannot be opened, so File > Restore is out of reach:
 * offer to put a backup in its place (the damaged file is kept beside it). True when a backup was
 * restored and the store can be opened again.
 */
export async function offerRestoreOfDamagedStore(file: string, problem: string): Promise<boolean> {
  const asked = await dialog.showMessageBox({
    type: 'error', title: 'Coilwright', message: 'The job store is damaged',
    detail: `${problem}\n\nChoose your latest backup to put in its place; the damaged file is kept beside it.`,
    buttons: ['Restore a backup…', 'Quit'], defaultId: 0, cancelId: 1,
  });
  if (asked.response !== 0) return false;
  const choice = await dialog.showOpenDialog({
    title: 'Choose a backup of the job store', properties: ['openFile'],
    filters: [{ name: 'Coilwright backup', extensions: ['db', 'sqlite', 'bak'] }, { name: 'All files', extensions: ['*'] }],
  });
  const from = choice.canceled ? undefined : choice.filePaths[0];
  if (!from) return false;
  const restored = await restoreDamagedStore(file, from);
  if (!restored.ok) {
    await dialog.showMessageBox({ type: 'error', title: 'Coilwright', message: 'The backup was not restored', detail: restored.error.message, buttons: ['OK'] });
    return false;
  }
  await dialog.showMessageBox({
    type: 'info', title: 'Coilwright', message: 'Backup restored',
    detail: `Restored from ${from}. The damaged store was kept as ${restored.value.damagedKeptAs}.`, buttons: ['OK'],
  });
  return true;
}

/** How often main asks whether a large store's damage check, running in the background, has answered. */
export const DAMAGE_CHECK_POLL_MS = 2000;

const waitFor = (ms: number) => new Promise<void>((resolve) => { setTimeout(resolve, ms).unref(); });

/**
 * A large store opens before its damage check ends (db/damage-check.ts). When the check then finds damage,
 * the desktop says so at once and offers to put a backup in its place (the damaged store is kept beside it);
 * declined, the store stays open read-only and the status line keeps the warning.
 */
export async function offerRestoreWhenDamageFound(
  damageCheck: () => Promise<DamageCheckInfo | null>, restore: () => Promise<unknown>, pollMs = DAMAGE_CHECK_POLL_MS,
): Promise<void> {
  let check = await damageCheck();
  while (check?.state === 'running') {
    await waitFor(pollMs);
    check = await damageCheck();
  }
  if (check?.state !== 'failed') return;
  const asked = await dialog.showMessageBox({
    type: 'error', title: 'Coilwright', message: 'The job store is damaged',
    detail: `The damage check found damage (${check.problem}). Nothing more can be saved to it; lists and prints still work `
      + 'where the damage allows.\n\nPut your latest backup in its place now? The damaged store is kept beside it.',
    buttons: ['Restore a backup…', 'Keep it open read-only'], defaultId: 0, cancelId: 1,
  });
  if (asked.response === 0) await restore();
}
