import { describe, expect, it } from 'vitest';
import type { Job, PrintedPdf, Quote, QuoteSummary } from '../../../core/api';
import type { QuoteDocument } from '../../../core/documents';
import { pdfText } from '../documents/helpers';
import { job } from './helpers';
import { demoMachines, demoWirePrice, pricedShop } from './priced-shop';

const machines = demoMachines;
const wirePrice = demoWirePrice;
const shop = () => pricedShop();

const customer = { name: 'Fernhill Gauges (demo)' };
// Working length 18 mm below the solid length 20 mm (10 coils × 2 mm, closed and ground): an open error.
const belowSolid = { loads: [{ length: 18 }] };

/** Three parts of one enquiry: a clean one, one with a tooling charge and its own breaks, one with an open error. */
async function enquiry(must: Awaited<ReturnType<typeof shop>>['must']) {
  const plain = await must<Job>('createJob', job({ customer, partNumber: 'FG-100', orderQuantity: 500 }));
  const tooled = await must<Job>('createJob', job({ customer, partNumber: 'FG-101', drawingNumber: 'FG-D-101', orderQuantity: 2000,
    judgement: { price: { charges: [{ label: 'Tooling', amount: 180 }], unitPrices: [{ quantity: 2000, unitPrice: 0.95, reason: 'matched the customer\'s target' }] } } },
  { totalCoils: 12, freeLength: 60 }));
  const stopped = await must<Job>('createJob', job({ customer, partNumber: 'FG-102', drawingNumber: 'FG-D-102', orderQuantity: 300 }, belowSolid));
  return { plain, tooled, stopped };
}

const bytes = (p: PrintedPdf) => Buffer.from(p.base64, 'base64');

describe('a quotation of several jobs of one customer', () => {
  it('is numbered once, keeps every line with its own breaks, charges and exceptions, and moves each job to "quoted"', async () => {
    const { service, must } = await shop();
    const { plain, tooled, stopped } = await enquiry(must);
    const quote = await must<Quote>('issueQuote', { jobIds: [plain.id, tooled.id, stopped.id], accept: 'customer fits a stop at 18 mm on FG-102' });
    expect(quote.number).toBe('Q-26-0001');
    expect(quote.lines.map((l) => [l.line, l.jobNumber, l.partNumber])).toEqual([
      [1, plain.number, 'FG-100'], [2, tooled.number, 'FG-101'], [3, stopped.number, 'FG-102']]);
    const doc = quote.document as QuoteDocument;
    expect(doc.lines.map((l) => l.title)).toEqual(['Item 1: FG-100', 'Item 2: FG-101', 'Item 3: FG-102']);
    expect(doc.items?.rows.map((r) => r[3])).toEqual([plain.number, tooled.number, stopped.number]);
    // Each line is priced at its own order quantity's breaks (order quantity × the shop's break factors 0.5, 1, 2, 5).
    expect(quote.lines[0]!.quantityBreaks).toEqual([250, 500, 1000, 2500]);
    expect(quote.lines[1]!.quantityBreaks).toEqual([1000, 2000, 4000, 10000]);
    expect(doc.lines[1]!.prices.table.rows).toContainEqual(['2,000', '0.9500', '1,900.00']);
    expect(doc.lines[1]!.prices.table.rows.at(-1)).toEqual(['Tooling, once per order', '', '180.00']);
    expect(doc.lines[0]!.prices.table.rows.some((r) => r[0]!.startsWith('Tooling'))).toBe(false);
    expect(doc.lines.map((l) => l.exceptions.length)).toEqual([0, 0, 1]);
    expect(doc.lines[2]!.exceptions[0]).toBe('A working length on the drawing is shorter than the spring\'s solid length: the spring cannot reach it.');
    expect(doc.caution.paragraphs.join(' ')).toMatch(/qualified engineer/);
    for (const j of [plain, tooled, stopped]) expect((await must<Job>('getJob', { id: j.id })).status).toBe('quoted');
    expect((await must<Quote>('issueQuote', { jobId: plain.id })).number).toBe('Q-26-0002');
    service.close();
  });

  it('reprints byte-identical after the shop\'s prices, rates, rounding and terms all change', async () => {
    const { service, must } = await shop();
    const { plain, tooled, stopped } = await enquiry(must);
    const jobIds = [plain.id, tooled.id, stopped.id];
    const printed = await must<PrintedPdf>('printQuote', { jobIds, accept: 'customer fits a stop at 18 mm on FG-102' });
    const first = bytes(printed);
    const text = (await pdfText(first)).all;
    expect(text).toContain('Item 2: FG-101');
    expect(text).toContain('Tooling, once per order');
    expect(text).toMatch(/qualified engineer/);
    const changes = [
      { materialPrices: wirePrice(9.5) },
      { machines: machines(140) },
      { costing: { marginPercent: 35, unitPriceRounding: { rule: 'step', step: 0.05 }, minimumOrderValue: 400 } },
      { defaults: { currency: 'EUR', paperSize: 'a4', units: 'metric', toleranceGrade: 1, quoteValidityDays: 60, setRemovalMethod: 'stricter' } },
      { shopProfile: { name: 'Renamed Springs (demo)', addressLines: ['1 Other Road'], phone: '', email: '' } },
    ];
    for (const settings of changes) {
      await must('saveSettings', { settings });
      const again = bytes(await must<PrintedPdf>('reprintQuote', { number: printed.reference }));
      expect(again.equals(first), JSON.stringify(settings)).toBe(true);
    }
    // The same jobs quoted today come out at today's figures: the reprint above did not just miss the changes.
    const today = await must<Quote>('issueQuote', { jobIds, accept: 'customer fits a stop at 18 mm on FG-102' });
    const todayText = (await pdfText(bytes(await must<PrintedPdf>('reprintQuote', { number: today.number })))).all;
    expect(todayText).toContain('Prices are in EUR');
    expect(text).toContain('Prices are in USD');
    service.close();
  });

  it('refuses jobs of different customers and a job named twice, naming the line', async () => {
    const { service, call, must } = await shop();
    const { plain, tooled } = await enquiry(must);
    const other = await must<Job>('createJob', job({ customer: { name: 'Ossory Test Hardware (demo)' }, partNumber: 'OTH-1' }));
    const mixed = await call('issueQuote', { jobIds: [plain.id, tooled.id, other.id] });
    expect(mixed).toMatchObject({ ok: false, error: { code: 'quote-customers-differ', path: 'jobIds[2]' } });
    expect(!mixed.ok && mixed.error.message).toContain('Ossory Test Hardware (demo)');
    expect(await call('issueQuote', { jobIds: [plain.id, plain.id] })).toMatchObject({ ok: false, error: { path: 'jobIds[1]' } });
    expect(await call('issueQuote', { jobIds: [] })).toMatchObject({ ok: false, error: { path: 'jobIds' } });
    expect(await call('issueQuote', { jobId: plain.id, jobIds: [tooled.id] })).toMatchObject({ ok: false, error: { path: 'jobIds' } });
    expect(await call('issueQuote', { jobIds: [plain.id, 999] })).toMatchObject({ ok: false, error: { code: 'not-found', path: 'jobIds[1]' } });
    expect(await must<unknown[]>('listQuotes', {})).toEqual([]);
    service.close();
  });

  it('with an open error on one line is refused without a reason, naming the job and line, and keeps the reason with it', async () => {
    const { service, call, must } = await shop();
    const { plain, stopped } = await enquiry(must);
    const refused = await call('issueQuote', { jobIds: [plain.id, stopped.id] });
    expect(refused).toMatchObject({ ok: false, error: { code: 'issue-needs-decision', path: 'accept' } });
    if (refused.ok) return;
    expect(refused.error.message).toContain(`open error on ${stopped.number}: working length 18.00 mm`);
    expect(refused.error.details).toEqual([expect.objectContaining({
      code: 'working-length-below-solid', path: 'jobIds[1].spec.loads[0].length', message: expect.stringMatching(new RegExp(`^${stopped.number}: `)) })]);
    expect(await must<unknown[]>('listQuotes', {})).toEqual([]);
    expect((await must<Job>('getJob', { id: plain.id })).status).toBe('draft');
    const quote = await must<Quote>('issueQuote', { jobIds: [plain.id, stopped.id], accept: 'the customer\'s stop holds FG-102 off solid' });
    expect(quote.decision).toMatchObject({ reason: 'the customer\'s stop holds FG-102 off solid',
      problems: [{ code: 'working-length-below-solid', job: stopped.number, path: 'jobIds[1].spec.loads[0].length' }] });
    expect((await must<Quote>('getQuote', { number: quote.number })).decision).toEqual(quote.decision);
    service.close();
  });
});

describe('every line in its own job\'s units', () => {
  it('prints an inch job\'s line in inches and a metric job\'s line in millimetres on the same quotation', async () => {
    const { service, must } = await shop();
    const metric = await must<Job>('createJob', job({ customer, partNumber: 'FG-100' }));
    const inch = await must<Job>('createJob', job({ customer, partNumber: 'FG-100-IN' }, {
      units: 'inch', wireDiameter: 0.08, outerDiameter: 0.8, freeLength: 2, loads: [{ length: 1.5 }] }));
    const quote = await must<Quote>('issueQuote', { jobIds: [metric.id, inch.id], accept: 'inch line checked by the engineer' });
    const [first, second] = (quote.document as QuoteDocument).lines;
    const values = (l: typeof first) => l!.specification.fields.map((f) => `${f.label} ${f.value}`).join('; ');
    expect(values(first)).toContain('Free length L0 50.00 mm');
    expect(values(second)).toContain('Free length L0 2.000 in');
    expect(values(second)).not.toMatch(/\bmm\b/);
    expect(values(first)).not.toMatch(/\bin\b/);
    service.close();
  });
});

describe('a job\'s quote history', () => {
  it('lists every quotation the job is a line of, newest first, with the other lines named', async () => {
    const { service, must } = await shop();
    const { plain, tooled, stopped } = await enquiry(must);
    const alone = await must<Quote>('issueQuote', { jobId: tooled.id });
    const pair = await must<Quote>('issueQuote', { jobIds: [plain.id, tooled.id] });
    await must<Quote>('issueQuote', { jobIds: [stopped.id, plain.id], accept: 'customer fits a stop at 18 mm' });
    const history = await must<QuoteSummary[]>('listQuotes', { jobId: tooled.id });
    expect(history.map((q) => q.number)).toEqual([pair.number, alone.number]);
    expect(history[0]!.lines.map((l) => l.partNumber)).toEqual(['FG-100', 'FG-101']);
    expect(history[1]!.lines.map((l) => l.jobNumber)).toEqual([tooled.number]);
    expect((await must<QuoteSummary[]>('listQuotes', { jobId: plain.id })).map((q) => q.lines.length)).toEqual([2, 2]);
    expect((await must<QuoteSummary[]>('listQuotes', {})).length).toBe(3);
    service.close();
  });
});
