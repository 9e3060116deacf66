import { describe, expect, it } from 'vitest';
import { createDemoShop, getSettings, listJobs } from '../../../db';
import { jobStatuses } from '../../../core/api/store';
import { demoJobs } from '../../../db/demo/jobs';
import { springKinds } from '../../../core/spec';
import { tempStore, value } from './helpers';

describe('demo shop', () => {
  it('fills a new store with a marked demo shop, jobs of every kind and status, inch and metric', () => {
    const store = tempStore();
    expect(value(createDemoShop(store))).toEqual({ jobs: demoJobs.length, customers: 6 });
    expect(demoJobs.length).toBeGreaterThanOrEqual(30);
    const settings = value(getSettings(store));
    expect(settings.shopProfile.name).toMatch(/^Demo: /);
    expect(settings.machines.some((m) => m.operation === 'coil')).toBe(true);
    const jobs = value(listJobs(store, { limit: 500 })).jobs;
    expect(jobs).toHaveLength(demoJobs.length);
    expect(new Set(jobs.map((j) => j.shape.kind))).toEqual(new Set(springKinds));
    expect(new Set(jobs.map((j) => j.status))).toEqual(new Set(jobStatuses));
    expect(new Set(jobs.map((j) => j.shape.units))).toEqual(new Set(['inch', 'metric']));
    expect(jobs.every((j) => /\(demo\)$/.test(j.customer!.name))).toBe(true);
  });

  it('goes only into an empty store', () => {
    const store = tempStore();
    value(createDemoShop(store));
    expect(createDemoShop(store)).toMatchObject({ ok: false, error: { code: 'store-not-empty' } });
  });
});
