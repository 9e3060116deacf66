/** The quotation a customer receives: who, what part, the spring in trade terms, prices, terms, cautions. */
import type { CostEstimate } from '../costing/types';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import { cautionNotice } from './cautions';
import { drawingText, kindTitle, letterhead, present } from './common';
import { springContent } from './spring';
import { commercialFields, signatureBlock, statedTerms } from './quote-terms';
import type { QuoteTermsInput } from './quote-terms';
import { priceCurve } from '../drawing';
import { addDays, dayOf, moneyText, piecesText, unitPriceText } from './text';
import type { Field, FigureModel, QuoteDocument, QuoteIssue, TableModel } from './types';
import { DOCUMENT_VERSION } from './types';

export interface QuoteJob {
  /** The shop's job number, or null for a spring not in the store. */
  number: string | null;
  customerName: string | null;
  /** Contact or address lines printed under the customer's name. */
  customerLines?: string[];
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  leadTimeDays: number | null;
  /** Payment terms agreed with this customer; empty or absent for the shop's. */
  customerPaymentTerms?: string;
}

export interface QuoteInput {
  spec: Spec;
  settings: Settings;
  job: QuoteJob;
  /** From `estimateCost`: the quote prints exactly the figures the store keeps with it. */
  estimate: CostEstimate;
  /** ISO timestamp of issue. */
  issuedAt: string;
  /** The quote number; "DRAFT" until the store issues one (see `withQuoteIssue`). */
  number?: string;
  validityDays?: number;
  /** Engineering exceptions accepted at issue, already in the customer's words. */
  exceptions?: string[];
  /** The enquiry reference and the terms the estimator set on this quote. */
  terms?: QuoteTermsInput;
}

export const OVER_UNDER_PERCENT = 10;

function priceTable(estimate: CostEstimate): TableModel {
  const c = estimate.currency;
  return {
    columns: [
      { header: 'Quantity (pcs)', weight: 1, align: 'right' },
      { header: `Unit price (${c})`, weight: 1, align: 'right' },
      { header: `Total (${c})`, weight: 1, align: 'right' },
    ],
    rows: [
      ...estimate.breaks.map((b) => [piecesText(b.quantity), unitPriceText(b.unitPrice), moneyText(b.total)]),
      ...(estimate.charges ?? []).map((ch) => [`${ch.item}, once per order`, '', moneyText(ch.amount)]),
    ],
  };
}

const PRICE_CURVE = { width: 480, height: 240 };

function priceCurveFigure(estimate: CostEstimate): FigureModel {
  const points = estimate.breaks.map((b) => ({ quantity: b.quantity, unitPrice: b.unitPrice }));
  return { caption: `Unit price (${estimate.currency}) against quantity`, svg: priceCurve(points, estimate.currency, PRICE_CURVE), ...PRICE_CURVE };
}

function priceNotes(estimate: CostEstimate): string[] {
  if (estimate.minimumOrderValue <= 0) return [];
  return [`Minimum order value ${estimate.currency} ${moneyText(estimate.minimumOrderValue)}: a smaller order is charged at the minimum.`];
}

function terms(currency: string, validityDays: number): string[] {
  return [
    `Prices are in ${currency} and exclude tax and freight unless stated.`,
    `Over/under shipment: up to ±${OVER_UNDER_PERCENT} % of the quantity ordered may be shipped and is invoiced as shipped, as is common practice for made-to-order springs.`,
    `This quote is valid for ${validityDays} days from its date (see "Valid until").`,
    'Prices hold for the drawing and revision named above; a change to the drawing, the quantity or the finish may change them.',
    'Lead time counts from receipt of the order and approval of the drawing, and is subject to wire availability.',
  ];
}

function leadTimeText(days: number | null): string {
  return days === null ? 'to be confirmed with the order' : `${days} days from order and drawing approval`;
}

function partFields(job: QuoteJob, enquiryReference: string): Field[] {
  return present([
    { label: 'Your enquiry', value: enquiryReference },
    { label: 'Part number', value: job.partNumber },
    { label: 'Drawing', value: drawingText(job.drawingNumber, job.drawingRevision) },
    { label: 'Our job', value: job.number ?? '' },
  ]);
}

export function quoteIssue(number: string, issuedAt: string, validityDays: number): QuoteIssue {
  return { number, date: dayOf(issuedAt), validUntil: addDays(issuedAt, validityDays), validityDays };
}

export function quoteDocument(input: QuoteInput): QuoteDocument {
  const { spec, settings, job, estimate } = input;
  const validityDays = input.validityDays ?? settings.defaults.quoteValidityDays;
  const issue = quoteIssue(input.number ?? 'DRAFT', input.issuedAt, validityDays);
  const spring = springContent(spec, settings, job.partNumber || kindTitle(spec.kind));
  const stated = statedTerms(settings.quoteTerms, job.customerPaymentTerms, input.terms);
  return {
    version: DOCUMENT_VERSION, type: 'quote', paperSize: settings.defaults.paperSize, createdAt: input.issuedAt,
    title: 'Quotation', reference: `Quotation ${issue.number}`, letterhead: letterhead(settings), caution: cautionNotice('customer'),
    issue,
    customer: { name: job.customerName ?? 'Customer not named', lines: [...(job.customerLines ?? [])] },
    part: partFields(job, stated.enquiryReference),
    specification: { heading: spring.heading, fields: spring.fields },
    drawing: spring.drawing,
    prices: { currency: estimate.currency, table: priceTable(estimate), notes: priceNotes(estimate) },
    exceptions: [...(input.exceptions ?? [])],
    leadTime: leadTimeText(job.leadTimeDays),
    commercial: commercialFields(stated),
    terms: terms(estimate.currency, validityDays),
    priceCurve: settings.quoteTerms.priceCurveOnQuote ? priceCurveFigure(estimate) : null,
    signature: signatureBlock(stated),
  };
}

/**
 * The model as issued: the store's number and time of issue replace the draft's; validity and everything
 * else stay as the model has them.
 */
export function withQuoteIssue(model: QuoteDocument, issued: { number: string; issuedAt: string }): QuoteDocument {
  const issue = quoteIssue(issued.number, issued.issuedAt, model.issue.validityDays);
  return { ...model, issue, createdAt: issued.issuedAt, reference: `Quotation ${issue.number}` };
}
