import { randomBytes } from 'node:crypto';
import { addAttachment } from '../../db';
import type { Store } from '../../db';

/** Size of one scanned drawing sheet: two take a store over the 64 MB size rules of the damage check and the update notice. */
const SHEET_BYTES = 34 * 1024 * 1024;

/** Makes a store large the way a shop's grows fastest: scanned drawing sheets attached to one of its jobs. */
export function attachScannedDrawings(store: Store, jobId: number, sheets = 2): void {
  for (let i = 1; i <= sheets; i++) {
    const added = addAttachment(store, { jobId, name: `drawing-sheet-${i}.tif`, mimeType: 'image/tiff', dataBase64: randomBytes(SHEET_BYTES).toString('base64') });
    if (!added.ok) throw new Error(added.error.message);
  }
}
