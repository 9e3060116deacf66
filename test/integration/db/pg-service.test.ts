import { describe, expect, it } from 'vitest';
import { createDemoShop } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { usePgCluster } from '../../support/pg-stores';
import { job, steppingClock, value } from './helpers';

const pg = usePgCluster();

/**
 * The service over a PostgreSQL store, through the same dispatch as the app, the web transport and the CLI:
 * the methods added with the customer screen, jobs from past jobs and request sheets answer as on SQLite.
 */
describe('the service on a PostgreSQL store', () => {
  it('keeps customers, copies, archives, deletes and brings back jobs, and imports a request sheet under an enquiry', async () => {
    const store = pg.freshStore({ clock: steppingClock() });
    value(createDemoShop(store));
    const service = createService(store);
    const call = async (method: string, input: unknown) => value(await dispatch(service.handlers, method as never, input)) as Record<string, unknown>;
    try {
      const customer = await call('saveCustomer', { name: 'Demo Lakeside Valves', contact: 'Q. Demo', addressLines: ['1 Demo Quay'], paymentTerms: '30 days net' });
      const again = await dispatch(service.handlers, 'saveCustomer', { name: 'demo lakeside valves' });
      expect(again).toMatchObject({ ok: false, error: { path: 'name' } });
      const source = await call('createJob', job({ customer: { name: 'Demo Lakeside Valves' } }));
      const copy = await call('copyJob', { id: source.id });
      expect(copy.number).not.toBe(source.number);
      expect((copy.customer as { id: number }).id).toBe(customer.id);
      await call('archiveJob', { id: source.id, archived: true });
      const archived = await call('listJobs', { archived: true });
      expect((archived.jobs as { id: number }[]).map((j) => j.id)).toEqual([source.id]);
      const deleted = await call('deleteJob', { id: copy.id });
      expect(deleted.number).toBe(copy.number);
      expect(await dispatch(service.handlers, 'getJob', { id: copy.id })).toMatchObject({ ok: false });
      expect((await call('undoDeleteJob', { id: copy.id })).number).toBe(copy.number);
      const sheet = { name: 'demo-enquiry.csv', rows: [
        ['Part No.', 'd', 'OD', 'L0', 'total coils', 'qty', 'grade', 'ends'],
        ['DEMO-LV-1', '1,6', '12,5', '38', '9', '2 000', 'music wire', 'closed and ground'],
        ['DEMO-LV-2', '2', '16', '45,5', '8,5', '500', 'music wire', 'closed and ground'],
      ] };
      const imported = await call('importRequestSheet', { sheet, customer: 'Demo Lakeside Valves', reference: 'DEMO-ENQ-7' });
      expect((imported.jobs as unknown[]).length).toBe(2);
      const enquiry = imported.enquiry as { id: number; reference: string };
      expect(enquiry.reference).toBe('DEMO-ENQ-7');
      const held = await call('enquiryJobs', { id: enquiry.id });
      expect(JSON.stringify(held)).toContain('DEMO-LV-2');
      const preview = await call('previewRequestSheet', { sheet, customer: 'Demo Lakeside Valves' });
      expect((preview.mapping as { columns: { origin: string }[] }).columns.every((c) => c.origin === 'saved')).toBe(true);
    } finally {
      service.close();
    }
  });
});
