import type { ApiResult, PrintedPdf } from '../../core/api';
import type { QuoteTermsInput } from '../../core/documents/quote-terms';
import { useApi } from '../api';

export type DocumentKind = 'quote' | 'traveller';

/** What the estimator adds at printing: the quote's enquiry reference and terms, the customer's order on the traveller. */
export interface PrintExtras {
  terms?: QuoteTermsInput;
  customerOrder?: string;
}

export interface Printer {
  /** A new quote is issued (numbered, its prices kept) and printed; a traveller prints for `quantity` or the job's order. */
  print(kind: DocumentKind, jobId: number, quantity?: number, accept?: string, extras?: PrintExtras): Promise<ApiResult<PrintedPdf>>;
  /** A quotation of several jobs of one customer, one line each in this order. */
  quotation(jobIds: number[], accept?: string, extras?: PrintExtras): Promise<ApiResult<PrintedPdf>>;
  reprint(quoteNumber: string): Promise<ApiResult<PrintedPdf>>;
}

export function usePrinter(): Printer {
  const api = useApi();
  return {
    print: (kind, jobId, quantity, accept, extras = {}) => (kind === 'quote'
      ? api.printQuote({ jobId, ...(accept === undefined ? {} : { accept }), ...(extras.terms ? { terms: extras.terms } : {}) })
      : api.printTraveller({ jobId, quantity, ...(extras.customerOrder ? { customerOrder: extras.customerOrder } : {}) })),
    quotation: (jobIds, accept, extras = {}) => api.printQuote({
      ...(jobIds.length === 1 ? { jobId: jobIds[0]! } : { jobIds }), ...(accept === undefined ? {} : { accept }), ...(extras.terms ? { terms: extras.terms } : {}),
    }),
    reprint: (number) => api.reprintQuote({ number }),
  };
}
