import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ApiResult, EnquiryJobs, RequestImportResult, RequestPreviewResult, RequestSheet } from '../../../core/api';
import { openStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import type { Service } from '../../../service/api';
import { DEMO_CUSTOMER, requestCsv, requestRows, requestXlsx } from '../../support/request-sheets';
import { CUSTOMER_ENQUIRIES_SQL, ENQUIRY_JOBS_SQL } from '../../../db/enquiries/enquiries';
import { tempDir, tempStore } from './helpers';

const call = async <T>(service: Service, method: string, input: unknown): Promise<ApiResult<T>> =>
  (await dispatch(service.handlers, method, input)) as ApiResult<T>;

async function read(service: Service, fileName: string, bytes: Buffer): Promise<RequestSheet> {
  const r = await call<RequestSheet>(service, 'readRequestSheet', { fileName, dataBase64: bytes.toString('base64') });
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value;
}

describe('request sheets through the service', () => {
  it('reads a CSV with a semicolon separator and decimal commas, marks the bad cell, imports once it is fixed', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const sheet = await read(service, 'rfq-118.csv', Buffer.from(requestCsv(requestRows(10, { decimalMark: ',', badRow: 6 }), ';')));
    expect(sheet.rows).toHaveLength(11);
    const preview = await call<RequestPreviewResult>(service, 'previewRequestSheet', { sheet, customer: DEMO_CUSTOMER, decimalMark: ',' });
    expect(preview.ok && preview.value.counts).toEqual({ ready: 9, error: 1, skipped: 0, blank: 0 });
    expect(preview.ok && preview.value.rows[6]?.errors.map((e) => e.path)).toEqual(['E8']);
    expect(preview.ok && preview.value.savedMapping).toBe(false);

    const refused = await call<RequestImportResult>(service, 'importRequestSheet', { sheet, customer: DEMO_CUSTOMER, reference: 'RFQ-118', decimalMark: ',' });
    expect(refused).toMatchObject({ ok: false, error: { code: 'sheet-has-errors', path: 'E8' } });
    const none = await call<{ total: number }>(service, 'listJobs', {});
    expect(none.ok && none.value.total).toBe(0);

    const imported = await call<RequestImportResult>(service, 'importRequestSheet',
      { sheet, customer: DEMO_CUSTOMER, reference: 'RFQ-118', decimalMark: ',', fixes: { E8: '1,5' } });
    if (!imported.ok) throw new Error(JSON.stringify(imported.error));
    expect(imported.value.jobs).toHaveLength(10);
    expect(imported.value.enquiry).toMatchObject({ reference: 'RFQ-118', source: 'rfq-118.csv', jobCount: 10, customer: { name: DEMO_CUSTOMER } });

    const listed = await call<EnquiryJobs>(service, 'enquiryJobs', { id: imported.value.enquiry.id });
    if (!listed.ok) throw new Error(JSON.stringify(listed.error));
    expect(listed.value.jobs.map((j) => j.sheetRow)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
    expect(listed.value.jobs[6]?.shape.wireDiameter).toBe(1.5);
    expect(listed.value.jobs.every((j) => j.status === 'draft' && j.customer?.name === DEMO_CUSTOMER)).toBe(true);
    expect(listed.value.jobs[3]?.shape.kind).toBe('extension');
    service.close();
  });

  it('reads an XLSX under a title row, skips a row by choice and keeps the mapping for the customer', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const sheet = await read(service, 'rfq-119.xlsx', await requestXlsx(requestRows(10, { badRow: 2 })));
    const corrected = { columns: [{ header: 'Rate (N/mm)', field: 'ignore' }], units: 'metric', decimalMark: '.' };
    const imported = await call<RequestImportResult>(service, 'importRequestSheet',
      { sheet, customer: DEMO_CUSTOMER, reference: 'RFQ-119', mapping: corrected, skip: [5] });
    if (!imported.ok) throw new Error(JSON.stringify(imported.error));
    expect(imported.value.jobs.map((j) => j.row)).toEqual([3, 4, 6, 7, 8, 9, 10, 11, 12]);
    expect(imported.value.skipped).toEqual([{ row: 5, reason: expect.stringMatching(/E5: Wire diameter/) }]);

    const again = await call<RequestPreviewResult>(service, 'previewRequestSheet', { sheet, customer: DEMO_CUSTOMER.toUpperCase() });
    if (!again.ok) throw new Error(JSON.stringify(again.error));
    expect(again.value.savedMapping).toBe(true);
    expect(again.value.mapping.columns.find((c) => c.header === 'Rate (N/mm)')).toMatchObject({ field: 'ignore', origin: 'saved' });
    expect(again.value.headerRow).toBe(2);

    const enquiries = await call<{ reference: string }[]>(service, 'listEnquiries', {});
    expect(enquiries.ok && enquiries.value.map((e) => e.reference)).toEqual(['RFQ-119']);
    service.close();
  });

  it('refuses a file that is neither CSV nor XLSX, naming the field', async () => {
    const service = createService(openStore(join(tempDir(), 'shop.db')));
    const r = await call(service, 'readRequestSheet', { fileName: 'drawing.pdf', dataBase64: Buffer.from('%PDF-1.7').toString('base64') });
    expect(r).toMatchObject({ ok: false, error: { code: 'sheet-format', path: 'fileName' } });
    const broken = await call(service, 'readRequestSheet', { fileName: 'x.xlsx', dataBase64: Buffer.from('PK not a zip').toString('base64') });
    expect(broken).toMatchObject({ ok: false, error: { code: 'xlsx-unreadable' } });
    service.close();
  });
});

describe('enquiry queries', () => {
  it('find a customer\'s enquiries and an enquiry\'s jobs through their indexes, not a scan', () => {
    const store = tempStore();
    const plan = (sql: string, params: unknown[]) =>
      (store.db.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...params) as { detail: string }[]).map((r) => r.detail).join('\n');
    expect(plan(CUSTOMER_ENQUIRIES_SQL, [1, 50])).toMatch(/SEARCH e USING INDEX enquiries_by_customer \(customer_id=\?\)/);
    expect(plan(ENQUIRY_JOBS_SQL, [1])).toMatch(/SEARCH x USING PRIMARY KEY \(enquiry_id=\?\)/);
    expect(plan(ENQUIRY_JOBS_SQL, [1])).not.toMatch(/SCAN j\b/);
  });
});

describe('writing an enquiry', () => {
  it('writes all the accepted rows or none: a row the store refuses leaves no enquiry, job, customer or mapping', async () => {
    const { createEnquiry, listJobs, listCustomers } = await import('../../../db');
    const store = tempStore();
    const good = { spec: { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, outerDiameter: 12, totalCoils: 8, ends: 'closed-ground', freeLength: 40 } };
    const bad = { spec: { ...good.spec, freeLength: -1 } };
    const r = createEnquiry(store, {
      customer: DEMO_CUSTOMER, reference: 'RFQ-1', source: 'x.csv', mapping: { columns: [], units: 'metric', decimalMark: '.' },
      rows: [{ row: 2, ref: 'A2', job: good }, { row: 3, ref: 'A3', job: bad }],
    });
    expect(r).toMatchObject({ ok: false, error: { path: 'A3', message: expect.stringMatching(/^row 3: /) } });
    expect((listJobs(store, {}) as { ok: true; value: { total: number } }).value.total).toBe(0);
    expect(listCustomers(store)).toEqual([]);
    expect(store.db.prepare('SELECT count(*) AS n FROM enquiries').get()).toEqual({ n: 0 });
    expect(store.db.prepare('SELECT count(*) AS n FROM request_mappings').get()).toEqual({ n: 0 });
  });
});

describe('deleting an imported draft', () => {
  it('takes the job out of its enquiry, and undoing the deletion puts it back in its sheet row', async () => {
    const { createEnquiry, deleteJob, undoDeleteJob, enquiryJobs: jobsOf } = await import('../../../db');
    const store = tempStore();
    const spec = { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, outerDiameter: 12, totalCoils: 8, ends: 'closed-ground', freeLength: 40 };
    const made = createEnquiry(store, { customer: DEMO_CUSTOMER, reference: 'RFQ-2', source: 'x.csv', rows: [{ row: 2, ref: 'A2', job: { spec } }, { row: 3, ref: 'A3', job: { spec } }] });
    if (!made.ok) throw new Error(JSON.stringify(made.error));
    const [first] = made.value.jobs;
    expect(deleteJob(store, first!.id)).toMatchObject({ ok: true });
    const after = jobsOf(store, made.value.enquiry.id);
    expect(after.ok && after.value.jobs.map((j) => j.sheetRow)).toEqual([3]);
    expect(undoDeleteJob(store, first!.id)).toMatchObject({ ok: true });
    const back = jobsOf(store, made.value.enquiry.id);
    expect(back.ok && back.value.jobs.map((j) => j.sheetRow)).toEqual([2, 3]);
  });
});
