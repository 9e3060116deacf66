import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Customer, Job, Quote } from '../../../core/api';
import type { QuoteDocument } from '../../../core/documents';
import { createDemoShop, openStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import type { Service } from '../../../service/api';
import { norm, pdfText } from './helpers';

/** The customer's details and the quote's terms, from the customer screen and the Print panel to the paper. */
describe('customer details and quote terms through the API', () => {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-terms-api-'));
  let service: Service;
  let job: Job;

  const value = async <T>(method: string, input: unknown): Promise<T> => {
    const r = await dispatch(service.handlers, method as never, input);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    return r.value as T;
  };

  beforeAll(async () => {
    const store = openStore(join(dir, 'shop.db'));
    createDemoShop(store);
    service = createService(store);
    const customer = await value<Customer>('saveCustomer', {
      name: 'Demo Quarry Gates', contact: 'A. Bell', addressLines: ['1 Pit Road', 'Demo Vale'], paymentTerms: '45 days net',
    });
    const page = await value<{ jobs: { id: number }[] }>('listJobs', { kind: 'compression', limit: 1 });
    job = await value<Job>('getJob', { id: page.jobs[0]!.id });
    job = await value<Job>('updateJob', { id: job.id, customerId: customer.id, expectedRevision: job.revision, ...(job.status === 'draft' ? {} : { change: 'correction' }) });
  });
  afterAll(() => {
    service.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('the issued quote keeps the customer\'s contact, address and terms, and the quote\'s own enquiry and delivery', async () => {
    const printed = await value<{ base64: string; reference: string }>('printQuote', {
      jobId: job.id, accept: 'accepted for the test', terms: { enquiryReference: 'QG/RFQ/2211', deliveryTerms: 'Delivered to site, Demo Vale' },
    });
    const quote = await value<Quote>('getQuote', { number: printed.reference });
    const doc = quote.document as QuoteDocument;
    expect(doc.customer).toEqual({ name: 'Demo Quarry Gates', lines: ['Attn. A. Bell', '1 Pit Road', 'Demo Vale'] });
    expect(doc.commercial.slice(0, 2)).toEqual([
      { label: 'Payment', value: '45 days net' }, { label: 'Delivery', value: 'Delivered to site, Demo Vale' },
    ]);
    const text = (await pdfText(Buffer.from(printed.base64, 'base64'))).all;
    expect(text).toContain(norm('Your enquiry QG/RFQ/2211'));
  });

  it('the traveller names the customer\'s order', async () => {
    const printed = await value<{ base64: string }>('printTraveller', { jobId: job.id, quantity: 500, customerOrder: 'PO 4471' });
    expect((await pdfText(Buffer.from(printed.base64, 'base64'))).all).toContain('Customer order no. PO 4471');
  });

  it('refuses quote terms it cannot print, naming the field', async () => {
    const r = await dispatch(service.handlers, 'printQuote', { jobId: job.id, terms: { certificates: 'one' } });
    expect(r).toMatchObject({ ok: false, error: { path: 'terms.certificates' } });
  });
});
