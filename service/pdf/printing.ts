import type { Customer, Job, Quote } from '../../core/api/store';
import { estimateCost } from '../../core/costing/estimate';
import type { CostEstimate } from '../../core/costing/types';
import { parseQuoteDocument, quotationDocument, travellerDocument, travellerQuantity, withQuoteIssue } from '../../core/documents';
import { snapshotTimeZone } from '../../core/calendar';
import type { PrintJob, QuoteDocument, QuoteTermsInput, TravellerDocument } from '../../core/documents';
import type { Result } from '../../core/result';
import type { Settings } from '../../core/settings/schema';

/**
 * The printing steps shared by the API (the app's Print menu) and the command line: what a document
 * says about a stored job, the draft and issued quote, and the traveller for a quantity.
 */
export function storedPrintJob(job: Job, customers: readonly Customer[]): PrintJob {
  const customer = job.customer && customers.find((c) => c.id === job.customer!.id);
  return {
    number: job.number, customerName: job.customer?.name ?? null,
    customerLines: customer ? customerLines(customer) : [],
    ...(customer && customer.paymentTerms !== '' ? { customerPaymentTerms: customer.paymentTerms } : {}),
    partNumber: job.partNumber, drawingNumber: job.drawingNumber, drawingRevision: job.drawingRevision,
    orderQuantity: job.orderQuantity, dueDate: job.dueDate, leadTimeDays: job.leadTimeDays, spec: job.spec, judgement: job.judgement,
  };
}

/** The customer under its name on a quote: who it is for, the address, then how to reach them. */
export function customerLines(c: Customer): string[] {
  return [c.contact && `Attn. ${c.contact}`, ...c.addressLines, c.email, c.phone && `Tel. ${c.phone}`].filter(Boolean);
}

/** What a job's price depends on besides its spec and the shop: its order quantity and the estimator's overrides. */
export const jobPricing = (print: Pick<PrintJob, 'orderQuantity' | 'judgement'>) =>
  ({ orderQuantity: print.orderQuantity, ...(print.judgement ? { judgement: print.judgement } : {}) });

export interface DraftOptions {
  /** An estimate already worked (the issue prints exactly the figures it checked). */
  estimate?: CostEstimate;
  exceptions?: string[];
  validityDays?: number;
  terms?: QuoteTermsInput;
}

/** One line of a draft quotation: the job and, when the issue has already worked them, its estimate and exceptions. */
export interface DraftLine {
  print: PrintJob;
  estimate?: CostEstimate;
  exceptions?: string[];
}

/** A quotation of one or several lines, each priced with today's settings unless its estimate is given. */
export function draftQuotation(lines: readonly DraftLine[], settings: Settings, now: Date,
  options: Pick<DraftOptions, 'validityDays' | 'terms'> = {}): { model: QuoteDocument; estimates: CostEstimate[] } {
  const estimates = lines.map((l) => l.estimate ?? estimateCost(l.print.spec, settings, undefined, jobPricing(l.print)));
  const model = quotationDocument({
    settings, issuedAt: now.toISOString(), validityDays: options.validityDays ?? settings.defaults.quoteValidityDays,
    ...(options.terms ? { terms: options.terms } : {}),
    lines: lines.map((l, i) => ({ spec: l.print.spec, job: l.print, estimate: estimates[i]!, exceptions: l.exceptions ?? [] })),
  });
  return { model, estimates };
}

export function draftQuote(print: PrintJob, settings: Settings, now: Date, options: DraftOptions = {}): { model: QuoteDocument; estimate: CostEstimate } {
  const line: DraftLine = { print, ...(options.estimate ? { estimate: options.estimate } : {}), exceptions: options.exceptions ?? [] };
  const { model, estimates } = draftQuotation([line], settings, now, {
    ...(options.validityDays === undefined ? {} : { validityDays: options.validityDays }), ...(options.terms ? { terms: options.terms } : {}),
  });
  return { model, estimate: estimates[0]! };
}

/** An issued quote prints from its snapshot alone, whatever the prices are today. */
export function issuedQuoteDocument(quote: Quote): Result<QuoteDocument> {
  const model = parseQuoteDocument(quote.document);
  return model.ok ? { ok: true, value: withQuoteIssue(model.value, quote, snapshotTimeZone(quote.settings)) } : model;
}

export function travellerFor(print: PrintJob, settings: Settings, quantity: number | undefined, now: Date): Result<TravellerDocument> {
  const q = travellerQuantity(print, quantity);
  if (!q.ok) return q;
  return { ok: true, value: travellerDocument({ spec: print.spec, settings, printedAt: now.toISOString(), job: { ...print, orderQuantity: q.value } }) };
}
