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
import { moneyText, piecesText, unitPriceText } from './text';
import { addCalendarDays, calendarDay } from '../calendar';
import type { Field, FigureModel, QuoteDocument, QuoteIssue, QuoteLineModel, TableModel } from './types';
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

/** One line of a quotation: a job's spring, its own estimate and its accepted exceptions. */
export interface QuoteLineInput {
  spec: Spec;
  job: QuoteJob;
  /** From `estimateCost`: the quote prints exactly the figures the store keeps with it. */
  estimate: CostEstimate;
  /** Engineering exceptions accepted at issue, already in the customer's words. */
  exceptions?: string[];
}

interface QuoteCommonInput {
  settings: Settings;
  /** ISO timestamp of issue. */
  issuedAt: string;
  /** The quote number; "DRAFT" until the store issues one (see `withQuoteIssue`). */
  number?: string;
  validityDays?: number;
  /** The enquiry reference and the terms the estimator set on this quote. */
  terms?: QuoteTermsInput;
}

/** A quotation of several lines for one customer (named by the first line's job). */
export interface QuotationInput extends QuoteCommonInput {
  lines: QuoteLineInput[];
}

/** A quotation of one job. */
export interface QuoteInput extends QuoteCommonInput, QuoteLineInput {}

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

function terms(currency: string, validityDays: number, lineCount: number): string[] {
  const held = lineCount === 1
    ? 'Prices hold for the drawing and revision named above; a change to the drawing, the quantity or the finish may change them.'
    : 'Each line\'s prices hold for the drawing and revision named on it; a change to a drawing, a quantity or a finish may change them.';
  return [
    `Prices are in ${currency} and exclude tax and freight unless stated.`,
    `Over/under shipment: up to ±${OVER_UNDER_PERCENT} % of the quantity ordered may be shipped and is invoiced as shipped, as is common practice for made-to-order springs.`,
    `This quote is valid for ${validityDays} days from its date (see "Valid until").`,
    held,
    'Lead time counts from receipt of the order and approval of the drawing, and is subject to wire availability.',
  ];
}

function leadTimeText(days: number | null): string {
  return days === null ? 'to be confirmed with the order' : `${days} days from order and drawing approval`;
}

/**
 * The enquiry, part, drawing and our job; a line of several leaves out the part number its title already
 * gives, and the enquiry the quotation names once.
 */
function partFields(job: QuoteJob, o: { enquiryReference?: string; titled?: boolean } = {}): Field[] {
  return present([
    { label: 'Your enquiry', value: o.enquiryReference ?? '' },
    { label: 'Part number', value: o.titled ? '' : job.partNumber },
    { label: 'Drawing', value: drawingText(job.drawingNumber, job.drawingRevision) },
    { label: 'Our job', value: job.number ?? '' },
  ]);
}

/** The quote's date and its last valid day, as days of the shop's time zone. */
export function quoteIssue(number: string, issuedAt: string, validityDays: number, timeZone: string): QuoteIssue {
  const date = calendarDay(issuedAt, timeZone);
  return { number, date, validUntil: addCalendarDays(date, validityDays), validityDays };
}

function quoteLine(line: QuoteLineInput, settings: Settings, index: number, count: number): QuoteLineModel {
  const { spec, job, estimate } = line;
  const spring = springContent(spec, settings, job.partNumber || kindTitle(spec.kind));
  return {
    item: String(index + 1),
    title: job.partNumber ? `Item ${index + 1}: ${job.partNumber}` : `Item ${index + 1}`,
    part: partFields(job, { titled: count > 1 }),
    specification: { heading: spring.heading, fields: spring.fields },
    drawing: spring.drawing,
    prices: { currency: estimate.currency, table: priceTable(estimate), notes: priceNotes(estimate) },
    exceptions: [...(line.exceptions ?? [])],
    leadTime: leadTimeText(job.leadTimeDays),
    priceCurve: settings.quoteTerms.priceCurveOnQuote ? priceCurveFigure(estimate) : null,
  };
}

function itemsTable(lines: readonly QuoteLineInput[]): TableModel {
  return {
    columns: [
      { header: 'Item', weight: 0.4, align: 'left' },
      { header: 'Part number', weight: 1.2, align: 'left' },
      { header: 'Drawing', weight: 1.2, align: 'left' },
      { header: 'Our job', weight: 0.9, align: 'left' },
      { header: 'Quantities (pcs)', weight: 2.3, align: 'right' },
    ],
    rows: lines.map((l, i) => [String(i + 1), l.job.partNumber, drawingText(l.job.drawingNumber, l.job.drawingRevision), l.job.number ?? '',
      l.estimate.breaks.map((b) => piecesText(b.quantity)).join(' / ')]),
  };
}

function overview(lines: readonly QuoteLineInput[], enquiryReference: string): Field[] {
  if (lines.length === 1) return partFields(lines[0]!.job, { enquiryReference });
  return present([{ label: 'Your enquiry', value: enquiryReference }, { label: 'Items', value: `${lines.length} parts, listed below` }]);
}

export function quotationDocument(input: QuotationInput): QuoteDocument {
  const { settings, lines } = input;
  if (lines.length === 0) throw new Error('a quotation needs at least one line');
  // Every line is priced with the same shop settings, so in the same currency.
  const currency = lines[0]!.estimate.currency;
  const validityDays = input.validityDays ?? settings.defaults.quoteValidityDays;
  const issue = quoteIssue(input.number ?? 'DRAFT', input.issuedAt, validityDays, settings.defaults.timeZone);
  const first = lines[0]!.job;
  const stated = statedTerms(settings.quoteTerms, first.customerPaymentTerms, input.terms);
  return {
    version: DOCUMENT_VERSION, type: 'quote', paperSize: settings.defaults.paperSize, createdAt: input.issuedAt,
    title: 'Quotation', reference: `Quotation ${issue.number}`, letterhead: letterhead(settings), caution: cautionNotice('customer'),
    issue,
    customer: { name: first.customerName ?? 'Customer not named', lines: [...(first.customerLines ?? [])] },
    overview: overview(lines, stated.enquiryReference),
    items: lines.length === 1 ? null : itemsTable(lines),
    lines: lines.map((l, i) => quoteLine(l, settings, i, lines.length)),
    commercial: commercialFields(stated),
    terms: terms(currency, validityDays, lines.length),
    signature: signatureBlock(stated),
  };
}

/** A one-line quotation. */
export function quoteDocument(input: QuoteInput): QuoteDocument {
  const { spec, job, estimate, exceptions, ...common } = input;
  return quotationDocument({ ...common, lines: [{ spec, job, estimate, ...(exceptions ? { exceptions } : {}) }] });
}

/**
 * The model as issued: the store's number and time of issue replace the draft's; validity and everything
 * else stay as the model has them.
 */
export function withQuoteIssue(model: QuoteDocument, issued: { number: string; issuedAt: string }, timeZone: string): QuoteDocument {
  const issue = quoteIssue(issued.number, issued.issuedAt, model.issue.validityDays, timeZone);
  return { ...model, issue, createdAt: issued.issuedAt, reference: `Quotation ${issue.number}` };
}
