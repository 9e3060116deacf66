import { inputError } from '../../core/api';
import type { ApiResult } from '../../core/api';
import type { documentMethods, PrintedPdf } from '../../core/api/documents';
import type { Result } from '../../core/result';
import { getJob, getQuote, getSettings, issueQuote, listCustomers } from '../../db';
import { draftQuote, issuedQuoteDocument, quoteSnapshot, storedPrintJob, travellerFor } from '../pdf/printing';
import type { StoreContext, TypedHandlers } from './store';

const asApi = <T>(r: Result<T>): ApiResult<T> => (r.ok ? r : { ok: false, error: inputError(r.errors) });

/** The PDF writers (pdfkit, fontkit, qrcode) load on the first print, not with the API. */
const writers = () => import('../pdf');

const pdf = (buffer: Buffer, fileName: string, reference: string, findings: PrintedPdf['findings'] = []): ApiResult<PrintedPdf> =>
  ({ ok: true, value: { base64: buffer.toString('base64'), fileName, reference, findings } });

/** Print handlers: the same steps as the command line's `print`, over the store the app has open. */
export function documentHandlers(ctx: StoreContext, now: () => Date = () => new Date()): TypedHandlers<keyof typeof documentMethods> {
  const jobAndSettings = (id: number) => {
    const job = getJob(ctx.store, id);
    if (!job.ok) return job;
    const print = storedPrintJob(job.value, listCustomers(ctx.store));
    const settings = getSettings(ctx.store);
    if (!settings.ok) return settings;
    return { ok: true as const, job: job.value, print, settings: settings.value };
  };
  return {
    printTraveller: async ({ jobId, quantity }) => {
      const j = jobAndSettings(jobId);
      if (!j.ok) return j;
      const model = asApi(travellerFor(j.print, j.settings, quantity, now()));
      if (!model.ok) return model;
      return pdf(await (await writers()).renderTraveller(model.value), `traveller-${j.job.number}.pdf`, j.job.number, model.value.findings);
    },
    printQuote: async ({ jobId }) => {
      const j = jobAndSettings(jobId);
      if (!j.ok) return j;
      const { model, estimate } = draftQuote(j.print, j.settings, now());
      const quote = issueQuote(ctx.store, quoteSnapshot(jobId, model, estimate));
      if (!quote.ok) return quote;
      const issued = asApi(issuedQuoteDocument(quote.value));
      if (!issued.ok) return issued;
      return pdf(await (await writers()).renderQuote(issued.value), `quote-${quote.value.number}.pdf`, quote.value.number);
    },
    reprintQuote: async ({ number }) => {
      const quote = getQuote(ctx.store, { number });
      if (!quote.ok) return quote;
      const issued = asApi(issuedQuoteDocument(quote.value));
      if (!issued.ok) return issued;
      return pdf(await (await writers()).renderQuote(issued.value), `quote-${number}.pdf`, number);
    },
  };
}
