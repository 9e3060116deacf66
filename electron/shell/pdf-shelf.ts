import { randomUUID } from 'node:crypto';
import { APP_ORIGIN } from './origin';

export interface ShelvedPdf {
  bytes: Uint8Array;
  fileName: string;
}

/** PDFs being previewed, held in memory and served at app://coilwright/pdf/<id>/<name>; never written to disk. */
export interface PdfShelf {
  put(pdf: ShelvedPdf): string;
  get(id: string): ShelvedPdf | undefined;
  drop(id: string): void;
}

export function createPdfShelf(): PdfShelf {
  const pdfs = new Map<string, ShelvedPdf>();
  return {
    put(pdf) {
      const id = randomUUID();
      pdfs.set(id, pdf);
      return id;
    },
    get: (id) => pdfs.get(id),
    drop: (id) => void pdfs.delete(id),
  };
}

export const PDF_PATH_PREFIX = '/pdf/';

export const pdfUrl = (id: string, fileName: string): string =>
  `${APP_ORIGIN}${PDF_PATH_PREFIX}${id}/${encodeURIComponent(fileName)}`;

/** The shelf id in a /pdf/<id>/<name> path, or null. */
export function pdfIdOf(pathname: string): string | null {
  const match = /^\/pdf\/([0-9a-f-]{36})(?:\/[^/]*)?$/.exec(pathname);
  return match?.[1] ?? null;
}
