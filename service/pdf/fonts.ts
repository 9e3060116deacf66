/**
 * The embedded fonts: DejaVu Sans (licence beside the files) has ±, Ø, °, ≤ and µ, which the standard
 * PDF fonts lack in part. Each font is parsed once per process and handed to every document as the parsed
 * fontkit font, which pdfkit 0.20 accepts; every document still embeds its own subset.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { create } from 'fontkit';
import type { Font } from 'fontkit';

export const FONT = { body: 'Body', bold: 'Bold' } as const;

const FILES = { [FONT.body]: 'DejaVuSans.ttf', [FONT.bold]: 'DejaVuSans-Bold.ttf' } as const;

let chosen: string | null = null;

/** The packaged app names its fonts folder once at start-up (inside its resources). */
export function useFontDirectory(dir: string): void {
  chosen = dir;
}

/**
 * assets/fonts of the program's own tree, found by going up from this code wherever it runs: the sources
 * (service/pdf) or a bundle (dist/cli, dist/web, dist/electron). Never the working directory, so the
 * command line prints from any folder.
 */
function programFonts(): string {
  let dir = __dirname;
  for (let up = 0; up < 4; up++) {
    const candidate = join(dir, 'assets', 'fonts');
    if (existsSync(candidate)) return candidate;
    dir = dirname(dir);
  }
  return join(__dirname, 'assets', 'fonts');
}

/** Where the fonts are: the folder given to `useFontDirectory`, else COILWRIGHT_FONTS, else the program's assets/fonts. */
export function fontDirectory(): string {
  return chosen ?? process.env.COILWRIGHT_FONTS ?? programFonts();
}

// Parsing a TrueType font costs tens of milliseconds (tables, glyph cache): far more than a page.
const parsed = new Map<string, Font>();

function font(file: string): Font {
  const path = join(fontDirectory(), file);
  let f = parsed.get(path);
  if (!f) {
    f = create(readFileSync(path));
    parsed.set(path, f);
  }
  return f;
}

export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const [name, file] of Object.entries(FILES)) doc.registerFont(name, font(file) as unknown as PDFKit.Mixins.PDFFontSource);
  doc.font(FONT.body);
}
