import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createJob, exportJobs, getJob, importJobs, jobRevisions, openStore, updateJob } from '../../../db';
import { job, tempDir, track, value } from './helpers';

const judgement = {
  routing: [{ operation: 'grind', machine: 'g-fast', setupMinutes: 25, reason: 'slow grinder booked; fixture ready' }],
  added: [{ operation: 'tumble', reason: 'burr-free ends asked on the order' }],
  price: {
    marginPercent: { value: 14, reason: 'repeat order' },
    unitPrices: [{ quantity: 1000, unitPrice: 0.415, reason: 'customer target' }],
    charges: [{ label: 'Tooling', amount: 250 }],
  },
};

describe('the estimator\'s judgement is kept with the job', () => {
  it('survives a save, a reload of the store, and stays in the revision it was saved in', () => {
    const file = join(tempDir(), 'shop.db');
    const store = track(openStore(file));
    const created = value(createJob(store, job()));
    expect(created.judgement).toEqual({ routing: [], added: [], price: { unitPrices: [], charges: [] } });
    value(updateJob(store, { id: created.id, judgement }));
    store.close();
    const reopened = track(openStore(file));
    expect(value(getJob(reopened, created.id)).judgement).toEqual(judgement);
    const revisions = value(jobRevisions(reopened, created.id));
    expect(revisions.find((r) => r.revision === 2)!.fields.judgement).toEqual(judgement);
  });

  it('survives export and import, as JSON and as CSV', () => {
    const store = track(openStore(join(tempDir(), 'a.db')));
    value(createJob(store, job({ judgement })));
    for (const format of ['json', 'csv'] as const) {
      const text = value(exportJobs(store, { format })).text!;
      const other = track(openStore(join(tempDir(), `b-${format}.db`)));
      const imported = value(importJobs(other, { text, format }));
      expect(value(getJob(other, imported.imported[0]!.id)).judgement).toEqual(judgement);
    }
  });

  it('an override without a reason is refused, naming the field; nothing is saved', () => {
    const store = track(openStore(join(tempDir(), 'c.db')));
    const created = value(createJob(store, job()));
    const bad = updateJob(store, { id: created.id, judgement: { routing: [{ operation: 'coil', setupMinutes: 10 }] } });
    expect(bad).toMatchObject({ ok: false, error: { path: 'judgement.routing[0].reason' } });
    expect(value(getJob(store, created.id)).revision).toBe(1);
  });

  it('changing the price judgement of a quoted job needs no drawing revision', () => {
    const store = track(openStore(join(tempDir(), 'd.db')));
    const created = value(createJob(store, job({ status: 'quoted' })));
    expect(value(updateJob(store, { id: created.id, judgement })).judgement).toEqual(judgement);
  });
});
