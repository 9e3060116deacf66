/** Printed documents as data: pure builders, no PDF library; service/pdf draws them. */
export type * from './types';
export { DOCUMENT_VERSION } from './types';
export { quotationDocument, quoteDocument, quoteIssue, withQuoteIssue, OVER_UNDER_PERCENT } from './quote';
export type { QuotationInput, QuoteInput, QuoteJob, QuoteLineInput } from './quote';
export { quoteTermsInputSchema, statedTerms } from './quote-terms';
export type { QuoteTermsInput, StatedTerms } from './quote-terms';
export { travellerDocument } from './traveller';
export type { TravellerInput, TravellerJob } from './traveller';
export { cautionNotice, safetyNotes, STORED_ENERGY_CAUTION, REVIEW_CAUTION } from './cautions';
export { isQuoteDocument, parseQuoteDocument } from './guards';
export * as documentText from './text';
export { parsePrintFile, travellerQuantity, isJobFile } from './job-file';
export type { PrintJob } from './job-file';
export { cleanLogoSvg } from './logo-svg';
