import { z } from 'zod';
import type { ApiResult } from '../../core/api';
import { inputError } from '../../core/api';
import { formatPath } from '../../core/result';

/** 40 MB of PDF is far past any quote or traveller; the cap keeps a runaway document from eating memory. */
export const MAX_PDF_BYTES = 40 * 1024 * 1024;

export const pdfFileSchema = z.object({
  base64: z.string().min(1).max(Math.ceil(MAX_PDF_BYTES / 3) * 4).regex(/^[A-Za-z0-9+/]*={0,2}$/, 'base64 data'),
  fileName: z.string().trim().min(1).max(180),
}).strict();

/** A file name that is safe on every desktop: no folders, no reserved characters, ending in .pdf. */
export function safePdfFileName(name: string): string {
  const cleaned = name.replace(/[\\/:*?"<>|\u0000-\u001f]/g, '-').replace(/^[.\s]+/, '').trim();
  const base = cleaned.replace(/\.pdf$/i, '') || 'document';
  return `${base}.pdf`;
}

export interface PdfBytes {
  bytes: Buffer;
  fileName: string;
}

/** Checks what crossed the bridge: the schema, then that the bytes really are a PDF. */
export function parsePdfFile(raw: unknown): ApiResult<PdfBytes> {
  const parsed = pdfFileSchema.safeParse(raw);
  if (!parsed.success) {
    return {
      ok: false,
      error: inputError(parsed.error.issues.map((i) => ({ code: `invalid-${i.code}`, message: i.message, path: formatPath(i.path) }))),
    };
  }
  const bytes = Buffer.from(parsed.data.base64, 'base64');
  if (bytes.subarray(0, 5).toString('latin1') !== '%PDF-') {
    return { ok: false, error: { code: 'not-a-pdf', message: 'the document is not a PDF', path: 'base64' } };
  }
  return { ok: true, value: { bytes, fileName: safePdfFileName(parsed.data.fileName) } };
}
