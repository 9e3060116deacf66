import type { ApiResult, PrintedPdf } from '../../core/api';
import { useApi } from '../api';

export type DocumentKind = 'quote' | 'traveller';

export interface Printer {
  /** A new quote is issued (numbered, its prices kept) and printed; a traveller prints for `quantity` or the job's order. */
  print(kind: DocumentKind, jobId: number, quantity?: number, accept?: string): Promise<ApiResult<PrintedPdf>>;
  /** A quotation of several jobs of one customer, one line each in this order. */
  quotation(jobIds: number[], accept?: string): Promise<ApiResult<PrintedPdf>>;
  reprint(quoteNumber: string): Promise<ApiResult<PrintedPdf>>;
}

export function usePrinter(): Printer {
  const api = useApi();
  return {
    print: (kind, jobId, quantity, accept) => (kind === 'quote'
      ? api.printQuote({ jobId, ...(accept === undefined ? {} : { accept }) })
      : api.printTraveller({ jobId, quantity })),
    quotation: (jobIds, accept) => api.printQuote(jobIds.length === 1 ? { jobId: jobIds[0]!, ...(accept === undefined ? {} : { accept }) }
      : { jobIds, ...(accept === undefined ? {} : { accept }) }),
    reprint: (number) => api.reprintQuote({ number }),
  };
}
