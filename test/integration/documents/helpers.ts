import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { PDFParse } from 'pdf-parse';

/** Text as compared: NFKC (the µ/μ and ligature cases) with runs of white space made one space. */
export const norm = (text: string): string => text.normalize('NFKC').replace(/\s+/g, ' ').trim();

export interface PdfText {
  pages: string[];
  all: string;
}

export async function pdfText(pdf: Buffer): Promise<PdfText> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const result = await parser.getText();
    const pages = result.pages.map((p) => norm(p.text));
    return { pages, all: pages.join(' ') };
  } finally {
    await parser.destroy();
  }
}

export async function pageSizes(pdf: Buffer): Promise<{ width: number; height: number }[]> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const info = await parser.getInfo({ parsePageInfo: true });
    return info.pages.map((p) => ({ width: p.width, height: p.height }));
  } finally {
    await parser.destroy();
  }
}

export const ISSUED_AT = '2026-03-02T09:30:00.000Z';

export const root = join(__dirname, '..', '..', '..');

/** Rendered pages for people to look at, kept after the run (ignored by git and lint). */
export function artifactDir(): string {
  const dir = join(root, 'test-artifacts', 'documents');
  mkdirSync(dir, { recursive: true });
  return dir;
}
