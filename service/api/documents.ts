import { inputError } from '../../core/api';
import type { ApiResult } from '../../core/api';
import type { documentMethods, PrintedPdf } from '../../core/api/documents';
import type { Result } from '../../core/result';
import { getJob, getQuote, getSettings, listCustomers } from '../../db';
import { issuedQuoteDocument, storedPrintJob, travellerFor } from '../pdf/printing';
import { issueQuotation } from './quoting';
import type { StoreContext, TypedHandlers } from './store';

const asApi = <T>(r: Result<T>): ApiResult<T> => (r.ok ? r : { ok: false, error: inputError(r.errors) });

/** The PDF writers (pdfkit, fontkit, qrcode) load on the first print, not with the API. */
const writers = () => import('../pdf');

const pdf = (buffer: Buffer, fileName: string, reference: string, findings: PrintedPdf['findings'] = []): ApiResult<PrintedPdf> =>
  ({ ok: true, value: { base64: buffer.toString('base64'), fileName, reference, findings } });

/** Print handlers, and the issue of a quote: the same steps as the command line's, over the store the app has open. */
export function documentHandlers(ctx: StoreContext, now: () => Date = () => new Date()): TypedHandlers<keyof typeof documentMethods | 'issueQuote'> {
  const jobAndSettings = (id: number) => {
    const job = getJob(ctx.store, id);
    if (!job.ok) return job;
    const print = storedPrintJob(job.value, listCustomers(ctx.store));
    const settings = getSettings(ctx.store);
    if (!settings.ok) return settings;
    return { ok: true as const, job: job.value, print, settings: settings.value };
  };
  return {
    issueQuote: (input) => {
      const issued = issueQuotation(ctx.store, input, now());
      return issued.ok ? { ok: true, value: issued.value.quote } : issued;
    },
    printTraveller: async ({ jobId, quantity, customerOrder }) => {
      const j = jobAndSettings(jobId);
      if (!j.ok) return j;
      const print = customerOrder ? { ...j.print, purchaseOrder: customerOrder } : j.print;
      const model = asApi(travellerFor(print, j.settings, quantity, now()));
      if (!model.ok) return model;
      return pdf(await (await writers()).renderTraveller(model.value), `traveller-${j.job.number}.pdf`, j.job.number, model.value.findings);
    },
    printQuote: async (input) => {
      const issued = issueQuotation(ctx.store, input, now());
      if (!issued.ok) return issued;
      const number = issued.value.quote.number;
      return pdf(await (await writers()).renderQuote(issued.value.model), `quote-${number}.pdf`, number);
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
