import type { z } from 'zod';
import type { importRequestSheetSchema, previewRequestSheetSchema, requestSheetMethods, RequestImportResult, RequestPreviewResult } from '../../core/api/request-sheet';
import type { ApiResult } from '../../core/api';
import { mappingToSave, previewRequestSheet } from '../../core/request-sheet';
import type { RequestPreview } from '../../core/request-sheet';
import { createEnquiry, enquiryJobs, listEnquiries, savedRequestMapping } from '../../db';
import type { Store } from '../../db';
import type { StoreContext, TypedHandlers } from './store';

type PreviewInput = z.output<typeof previewRequestSheetSchema>;

/** The preview with the customer's saved mapping (if any) under the one given. */
export function previewFor(store: Store, input: PreviewInput): RequestPreviewResult {
  const saved = input.customer && input.useSavedMapping ? savedRequestMapping(store, input.customer) : undefined;
  const preview = previewRequestSheet(input.sheet, {
    given: input.mapping, saved, units: input.units, decimalMark: input.decimalMark, fixes: input.fixes, skip: input.skip,
  });
  return { ...preview, savedMapping: saved !== undefined };
}

/** Why the import cannot go ahead: a mapping fault, or rows with errors that were neither fixed nor skipped. */
function blockers(preview: RequestPreview): ApiResult<never> | null {
  const errors = [...preview.mappingErrors, ...preview.rows.filter((r) => r.status === 'error').flatMap((r) => r.errors)];
  if (errors.length === 0) return null;
  const rows = preview.rows.filter((r) => r.status === 'error').map((r) => r.row);
  const first = errors[0]!;
  const message = rows.length > 0
    ? `${rows.length} row${rows.length === 1 ? '' : 's'} (${rows.slice(0, 10).join(', ')}${rows.length > 10 ? ', …' : ''}) ${rows.length === 1 ? 'has' : 'have'} cells that do not read: fix them in the preview or skip the rows. First: ${first.path} ${first.message}`
    : `the mapping needs correcting: ${first.path} ${first.message}`;
  return { ok: false, error: { code: 'sheet-has-errors', message, path: first.path, details: errors } };
}

export function importRequest(store: Store, input: z.output<typeof importRequestSheetSchema>): ApiResult<RequestImportResult> {
  const preview = previewFor(store, input);
  const blocked = blockers(preview);
  if (blocked) return blocked;
  const ready = preview.rows.filter((r) => r.status === 'ready');
  const created = createEnquiry(store, {
    customer: input.customer, reference: input.reference, source: input.sheet.name,
    rows: ready.map((r) => ({ row: r.row, ref: `A${r.row}`, job: r.job! })),
    mapping: input.saveMapping ? mappingToSave(preview.mapping) : undefined,
  });
  if (!created.ok) return created;
  const skipped = preview.rows.filter((r) => r.status === 'skipped').map((r) => ({
    row: r.row,
    reason: r.errors.length === 0 ? 'skipped in the preview' : `skipped in the preview; it had ${r.errors.map((e) => `${e.path}: ${e.message}`).join('; ')}`,
  }));
  return { ok: true, value: { ...created.value, skipped, mappingSaved: input.saveMapping } };
}

/** Request sheets and enquiries over the store the service has open; the file reader loads on first use. */
export function requestSheetHandlers(ctx: StoreContext): TypedHandlers<keyof typeof requestSheetMethods> {
  return {
    readRequestSheet: async (input) => {
      const { readRequestFile } = await import('../request-sheet/read');
      return readRequestFile(input.fileName, Buffer.from(input.dataBase64, 'base64'));
    },
    previewRequestSheet: (input) => {
      const preview = previewFor(ctx.store, input);
      return { ok: true, value: input.includeJobs ? preview : { ...preview, rows: preview.rows.map((r) => ({ ...r, job: null })) } };
    },
    importRequestSheet: (input) => importRequest(ctx.store, input),
    listEnquiries: (input) => listEnquiries(ctx.store, input),
    enquiryJobs: (input) => enquiryJobs(ctx.store, input.id),
  };
}
