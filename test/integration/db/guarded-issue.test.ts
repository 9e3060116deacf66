import { describe, expect, it } from 'vitest';
import type { Job, Quote } from '../../../core/api';
import type { QuoteDocument } from '../../../core/documents';
import { job } from './helpers';
import { pricedShop } from './priced-shop';

const shop = () => pricedShop();

// Working length 18 mm below the solid length 20 mm (10 coils × 2 mm, closed and ground): an open error.
const belowSolid = { loads: [{ length: 18 }] };

describe('a quote is issued by job id and priced by the service', () => {
  it('refuses caller-made prices and documents as unknown fields', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job());
    const forged = await call('issueQuote', { jobId: created.id, prices: { unit: -5 }, quantityBreaks: [1], document: { customer: 'made up' } });
    expect(forged).toMatchObject({ ok: false, error: { code: 'unknown-field' } });
    expect(await must<unknown[]>('listQuotes', {})).toEqual([]);
    service.close();
  });

  it('a clean job issues without a decision, at the service\'s own prices, and moves to "quoted"', async () => {
    const { service, must } = await shop();
    const created = await must<Job>('createJob', job());
    const quote = await must<Quote>('issueQuote', { jobId: created.id });
    expect(quote.decision).toBeNull();
    const estimate = await must<{ breaks: { unitPrice: number }[] }>('costEstimate', { spec: created.spec });
    expect((quote.prices as typeof estimate).breaks.map((b) => b.unitPrice)).toEqual(estimate.breaks.map((b) => b.unitPrice));
    expect((quote.document as QuoteDocument).lines[0]!.exceptions).toEqual([]);
    expect((await must<Job>('getJob', { id: created.id })).status).toBe('quoted');
    service.close();
  });
});

describe('open errors or an incomplete price need an explicit decision', () => {
  it('refuses without a reason, naming each problem, and uses no quote number', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job({}, belowSolid));
    const refused = await call('issueQuote', { jobId: created.id });
    expect(refused).toMatchObject({ ok: false, error: { code: 'issue-needs-decision', path: 'accept' } });
    if (refused.ok) return;
    expect(refused.error.message).toMatch(/working length 18\.00 mm is at or below the solid length/);
    expect(refused.error.details!.map((d) => d.code)).toEqual(['working-length-below-solid']);
    expect(refused.error.details![0]!.path).toBe('spec.loads[0].length');
    expect(await must<unknown[]>('listQuotes', {})).toEqual([]);
    expect((await must<Job>('getJob', { id: created.id })).status).toBe('draft');
    service.close();
  });

  it('issues with the reason, keeps it in the snapshot, and prints the exception in the customer\'s words', async () => {
    const { service, must } = await shop();
    const created = await must<Job>('createJob', job({}, belowSolid));
    const quote = await must<Quote>('issueQuote', { jobId: created.id, accept: 'customer confirmed the 18 mm is a stop, not a working length' });
    expect(quote.number).toBe('Q-26-0001');
    expect(quote.decision?.reason).toBe('customer confirmed the 18 mm is a stop, not a working length');
    expect(quote.decision?.problems.map((p) => p.code)).toEqual(['working-length-below-solid']);
    const exceptions = (quote.document as QuoteDocument).lines[0]!.exceptions;
    expect(exceptions).toEqual(['A working length on the drawing is shorter than the spring\'s solid length: the spring cannot reach it.']);
    expect(exceptions.join(' ')).not.toMatch(/working-length-below-solid|MPa|allowable/);
    const again = await must<Quote>('getQuote', { number: quote.number });
    expect(again.decision).toEqual(quote.decision);
    service.close();
  });

  it('an incomplete price (no wire price on file) is a problem too', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job({}, { material: 'en10270-1-dh' }));
    const refused = await call('issueQuote', { jobId: created.id });
    expect(refused.ok ? [] : refused.error.details!.map((d) => d.code)).toEqual(['no-wire-price']);
    const quote = await must<Quote>('issueQuote', { jobId: created.id, accept: 'wire price to follow from the mill; held at last order' });
    expect(quote.decision?.problems).toMatchObject([{ kind: 'price', code: 'no-wire-price', customerText: null }]);
    expect((quote.document as QuoteDocument).lines[0]!.exceptions).toEqual([]);
    service.close();
  });

  it('a reason of a word or two is not enough', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job({}, belowSolid));
    expect(await call('issueQuote', { jobId: created.id, accept: ' ' })).toMatchObject({ ok: false, error: { path: 'accept' } });
    service.close();
  });
});

describe('editing a quoted, ordered or done job', () => {
  it('asks whether an edit is a new drawing revision or a correction', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job());
    await must('issueQuote', { jobId: created.id });
    const edit = { id: created.id, spec: job({}, { totalCoils: 11 }).spec };
    expect(await call('updateJob', edit)).toMatchObject({ ok: false, error: { code: 'change-kind-needed', path: 'change' } });
    expect(await call('updateJob', { ...edit, change: 'drawing-revision' })).toMatchObject({ ok: false, error: { code: 'drawing-revision-needed', path: 'drawingRevision' } });
    const corrected = await must<Job>('updateJob', { ...edit, change: 'correction' });
    expect(corrected.status).toBe('quoted');
    const revised = await must<Job>('updateJob', { id: created.id, drawingRevision: 'B', change: 'drawing-revision' });
    expect(revised).toMatchObject({ status: 'draft', drawingRevision: 'B' });
    const history = await must<{ reason: string }[]>('jobRevisions', { id: created.id });
    expect(history.map((r) => r.reason)).toEqual(expect.arrayContaining(['quoted (Q-26-0001)', 'correction', 'drawing revision B']));
    expect(await must<Job>('updateJob', { id: created.id, notes: 'called the buyer' })).toMatchObject({ notes: 'called the buyer' });
    service.close();
  });

  it('never edits a done job in place; its status may still change', async () => {
    const { service, call, must } = await shop();
    const created = await must<Job>('createJob', job({ status: 'done' }));
    expect(await call('updateJob', { id: created.id, partNumber: 'FG-101', change: 'correction' }))
      .toMatchObject({ ok: false, error: { code: 'job-done', path: 'status' } });
    expect(await call('restoreRevision', { id: created.id, revision: 1 })).toMatchObject({ ok: false, error: { code: 'job-done' } });
    expect(await must<Job>('setJobStatus', { id: created.id, status: 'ordered' })).toMatchObject({ status: 'ordered' });
    service.close();
  });
});
