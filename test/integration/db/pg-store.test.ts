import { describe, expect, it } from 'vitest';
import { createDemoShop, createJob, findJobs, getJob, jobRevisions, listJobs, similarJobs, updateJob } from '../../../db';
import { usePgCluster } from '../../support/pg-stores';
import { job, steppingClock, value } from './helpers';

const pg = usePgCluster();

describe('the job store on PostgreSQL', () => {
  it('runs the demo shop, lists, finds and searches similar jobs', () => {
    const store = pg.freshStore({ clock: steppingClock() });
    value(createDemoShop(store));
    const listed = value(listJobs(store, {}));
    expect(listed.total).toBeGreaterThan(3);
    const first = listed.jobs[0]!;
    expect(value(getJob(store, first.id)).number).toBe(first.number);
    const hits = value(findJobs(store, { text: first.partNumber }));
    expect(hits.map((h) => h.job.id)).toContain(first.id);
    const similar = value(similarJobs(store, { spec: value(getJob(store, first.id)).spec, limit: 5 }));
    expect(similar.length).toBeGreaterThan(0);
    const created = value(createJob(store, job()));
    const saved = value(updateJob(store, { id: created.id, notes: 'second', expectedRevision: 1 }));
    expect(saved.revision).toBe(2);
    expect(value(jobRevisions(store, created.id)).map((r) => r.revision)).toEqual([2, 1]);
  });
});
