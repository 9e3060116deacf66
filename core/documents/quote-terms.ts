/**
 * What a quotation states besides the spring and its prices: the customer's enquiry, payment, delivery,
 * packaging and certificates, and who signs it. The shop's settings give each; a customer's own payment
 * terms replace the shop's; the estimator may change any of them on one quote.
 */
import { z } from 'zod';
import type { QuoteTerms } from '../settings/schema';
import { present } from './common';
import type { Field, SignatureBlock } from './types';

const line = z.string().trim().max(200);

/** What the estimator may set on one quote; anything left out comes from the customer or the shop. */
export const quoteTermsInputSchema = z.object({
  enquiryReference: z.string().trim().max(64).optional(),
  paymentTerms: line.optional(),
  deliveryTerms: line.optional(),
  packaging: line.optional(),
  certificates: z.array(line).max(6).optional(),
  estimator: z.string().trim().max(120).optional(),
}).strict();
export type QuoteTermsInput = z.infer<typeof quoteTermsInputSchema>;

/** The terms one quote states, each already chosen between the quote, the customer and the shop. */
export interface StatedTerms {
  enquiryReference: string;
  paymentTerms: string;
  deliveryTerms: string;
  packaging: string;
  certificates: string[];
  estimator: string;
}

const given = (v: string | undefined): v is string => v !== undefined && v.trim() !== '';

export function statedTerms(shop: QuoteTerms, customerPaymentTerms: string | undefined, quote: QuoteTermsInput = {}): StatedTerms {
  return {
    enquiryReference: quote.enquiryReference ?? '',
    paymentTerms: given(quote.paymentTerms) ? quote.paymentTerms : given(customerPaymentTerms) ? customerPaymentTerms : shop.paymentTerms,
    deliveryTerms: given(quote.deliveryTerms) ? quote.deliveryTerms : shop.deliveryTerms,
    packaging: given(quote.packaging) ? quote.packaging : shop.packaging,
    certificates: (quote.certificates ?? shop.certificates).filter((c) => c.trim() !== ''),
    estimator: given(quote.estimator) ? quote.estimator : shop.estimator,
  };
}

/** Payment, delivery, packaging and certificates as the quote prints them; a term left empty is left off. */
export function commercialFields(t: StatedTerms): Field[] {
  return present([
    { label: 'Payment', value: t.paymentTerms },
    { label: 'Delivery', value: t.deliveryTerms },
    { label: 'Packaging', value: t.packaging },
    { label: 'Certificates', value: t.certificates.join('; ') || 'none unless ordered' },
  ]);
}

export function signatureBlock(t: StatedTerms): SignatureBlock {
  return { preparedBy: t.estimator === '' ? 'Estimator' : `${t.estimator}, estimator`, boxes: ['Signature', 'Date'] };
}
