import { z } from 'zod';
import { method } from './contract';
import { issueQuoteSchema } from './store-schemas';

const jobId = z.number().int().positive();

/** A printed document: the PDF as base64 (it crosses IPC and HTTP as JSON), a file name, and what it printed. */
export interface PrintedPdf {
  base64: string;
  fileName: string;
  /** The quote number for an issued quote; the job number for a traveller. */
  reference: string;
  /** Open review findings printed on the document, as printed. */
  findings: string[];
}

const travellerInput = z.object({ jobId, quantity: jobId.optional(), customerOrder: z.string().trim().max(64).optional() }).strict();

/** Documents for stored jobs: the traveller, a newly issued quote, and the reprint of an issued one. */
export const documentMethods = {
  /** `customerOrder`: the customer's order number, printed in the job block. */
  printTraveller: method<typeof travellerInput, PrintedPdf>(travellerInput),
  /** Issues the job's quote (priced by the service, guarded as `issueQuote`) and prints it. */
  printQuote: method<typeof issueQuoteSchema, PrintedPdf>(issueQuoteSchema),
  reprintQuote: method<z.ZodObject<{ number: z.ZodString }>, PrintedPdf>(z.object({ number: z.string().min(1).max(40) }).strict()),
};
