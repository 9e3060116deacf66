import { spawnSync } from 'node:child_process';
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { travellerDocument } from '../../../core/documents';
import { renderTraveller } from '../../../service/pdf';
import { settingsWith, specOf, valveSpec } from './fixtures';
import { ISSUED_AT, artifactDir } from './helpers';

interface Gray {
  width: number;
  height: number;
  pixels: Uint8Array;
}

/** A binary PGM (P5) as pdftoppm -gray writes it. */
function readPgm(file: string): Gray {
  const data = readFileSync(file);
  const header = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(data.subarray(0, 64).toString('latin1'));
  if (!header) throw new Error(`${file} is not a binary PGM`);
  return { width: Number(header[1]), height: Number(header[2]), pixels: data.subarray(header[0].length) };
}

/** Share of pixels darker than light grey inside a box given in fractions of the page. */
function inkShare(g: Gray, box = { left: 0, top: 0, right: 1, bottom: 1 }): number {
  let dark = 0;
  let all = 0;
  for (let y = Math.floor(box.top * g.height); y < Math.floor(box.bottom * g.height); y++) {
    for (let x = Math.floor(box.left * g.width); x < Math.floor(box.right * g.width); x++) {
      all++;
      if (g.pixels[y * g.width + x]! < 160) dark++;
    }
  }
  return dark / all;
}

/** Where the traveller's QR code prints on Letter: right margin, first 62 pt below the top margin. */
const QR_BOX = { left: 0.83, top: 0.05, right: 0.93, bottom: 0.12 };

function pdftoppm(args: string[]): void {
  const run = spawnSync('pdftoppm', args, { encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`pdftoppm ${args.join(' ')}: ${run.stderr || run.error?.message}`);
}

describe('rendered pages (poppler)', () => {
  it('renders every traveller page to a PNG that is not blank, with the QR code at the top right', async () => {
    const dir = artifactDir();
    const spec = specOf({ ...valveSpec, finish: 'zinc', bakeSpecification: 'ASTM B850, 22 h at 200 °C' });
    const job = { number: 'J-26-0077', customerName: 'Brightwater Test Instruments (demo)', partNumber: 'BTI-PR-15',
      drawingNumber: 'BT-5015', drawingRevision: '3', orderQuantity: 1000, dueDate: '2026-05-01' };
    const model = travellerDocument({ spec, settings: settingsWith(), job, printedAt: ISSUED_AT });
    const pdf = join(dir, 'traveller.pdf');
    writeFileSync(pdf, await renderTraveller(model));

    pdftoppm(['-png', '-r', '60', pdf, join(dir, 'traveller')]);
    const first = join(dir, 'traveller-1.png');
    expect(statSync(first).size).toBeGreaterThan(15_000);
    expect(readFileSync(first).subarray(1, 4).toString()).toBe('PNG');

    pdftoppm(['-gray', '-r', '50', '-f', '1', '-l', '1', pdf, join(dir, 'traveller-gray')]);
    const gray = readPgm(join(dir, 'traveller-gray-1.pgm'));
    expect(gray.width).toBe(Math.round((612 / 72) * 50));
    const ink = inkShare(gray);
    expect(ink).toBeGreaterThan(0.01);
    expect(ink).toBeLessThan(0.5);
    // The QR code sits in the top-right corner, inside the margins: about half its modules are dark.
    const qr = inkShare(gray, QR_BOX);
    expect(qr).toBeGreaterThan(0.3);
    expect(qr).toBeLessThan(0.75);

    const unstored = join(dir, 'traveller-unstored.pdf');
    writeFileSync(unstored, await renderTraveller({ ...model, qr: null, job: { ...model.job, number: null } }));
    pdftoppm(['-gray', '-r', '50', '-f', '1', '-l', '1', unstored, join(dir, 'traveller-unstored')]);
    // Without a code the title moves into that corner: text, far less ink than the code's modules.
    expect(inkShare(readPgm(join(dir, 'traveller-unstored-1.pgm')), QR_BOX)).toBeLessThan(qr / 2);
  });
});
