/** A QR code drawn as vector squares, so it prints sharp at any size and scans from a photocopy. */
import QRCode from 'qrcode';
import type { Doc } from './layout';

/** Modules of light margin the QR specification asks for around the symbol. */
const QUIET_ZONE = 2;

/** Dark modules merged into horizontal runs: fewer path operations than one square per module. */
function runs(text: string): { size: number; runs: [row: number, start: number, length: number][] } {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const out: [number, number, number][] = [];
  for (let r = 0; r < modules.size; r++) {
    let start = -1;
    for (let c = 0; c <= modules.size; c++) {
      const dark = c < modules.size && modules.get(r, c) === 1;
      if (dark && start < 0) start = c;
      if (!dark && start >= 0) {
        out.push([r, start, c - start]);
        start = -1;
      }
    }
  }
  return { size: modules.size, runs: out };
}

/** Draws the code with its top-left corner at (x, y) in a square of `side` points, quiet zone included. */
export function drawQr(doc: Doc, text: string, x: number, y: number, side: number): void {
  const code = runs(text);
  const unit = side / (code.size + 2 * QUIET_ZONE);
  const origin = { x: x + QUIET_ZONE * unit, y: y + QUIET_ZONE * unit };
  doc.save();
  for (const [row, start, length] of code.runs) {
    doc.rect(origin.x + start * unit, origin.y + row * unit, length * unit, unit);
  }
  doc.fill('#000000');
  doc.restore();
}
