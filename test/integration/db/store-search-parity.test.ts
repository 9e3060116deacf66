import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { copyStore, createDemoShop, createJob, findJobs, getJob, listJobs, similarJobs } from '../../../db';
import { validSpecInput } from '../../support/random-springs';
import { usePgCluster } from '../../support/pg-stores';
import { tempStore, value } from './helpers';

const pg = usePgCluster();

/** The demo shop plus generated springs of every kind over the whole of the spec bounds (seeded, so repeatable). */
function shopOnBothBackends() {
  const lite = tempStore();
  value(createDemoShop(lite));
  const specs = fc.sample(validSpecInput, { numRuns: 240, seed: 2026 });
  specs.forEach((spec, i) => {
    const made = createJob(lite, { partNumber: `GEN-${i} (demo)`, customer: { name: `Generated customer ${i % 7} (demo)` }, notes: `generated spring ${i}`, spec });
    if (!made.ok) throw new Error(`generated job ${i}: ${made.error.message}`);
  });
  const server = pg.freshStore();
  value(copyStore(lite, server));
  return { lite, server, specs };
}

describe('search on PostgreSQL ranks as on SQLite', () => {
  it('similar-spec search: the same jobs, in the same order, at the same distances', () => {
    const { lite, server, specs } = shopOnBothBackends();
    const demo = value(listJobs(lite, { limit: 40 })).jobs.map((j) => value(getJob(lite, j.id)).spec);
    const asked = [...demo, ...specs.filter((_, i) => i % 6 === 0)];
    expect(asked.length).toBeGreaterThan(60);
    for (const spec of asked) {
      for (const limit of [1, 5, 20]) {
        const a = value(similarJobs(lite, { spec, limit }));
        const b = value(similarJobs(server, { spec, limit }));
        expect(b.map((h) => h.id)).toEqual(a.map((h) => h.id));
        b.forEach((h, i) => expect(h.distance).toBeCloseTo(a[i]!.distance, 12));
      }
    }
  });

  it('text search: the same jobs for part numbers, customers, numbers and words; the identifying match first', () => {
    const { lite, server } = shopOnBothBackends();
    const jobs = value(listJobs(lite, { limit: 200 })).jobs;
    const queries = [...new Set([
      ...jobs.slice(0, 30).map((j) => j.number), ...jobs.slice(0, 30).map((j) => j.partNumber).filter((p) => p.trim() !== ''),
      'generated customer 3', 'GEN-12', 'spring 4', 'demo', 'Ge', 'c',
      // Typed twice, and prefixes PostgreSQL writes as their few whole words (gener: generated; custom: customer).
      'demo demo', 'gener', 'custom 5', 'GEN-1', 'spri spring',
    ])];
    for (const text of queries) {
      const a = value(findJobs(lite, { text, limit: 200 }));
      const b = value(findJobs(server, { text, limit: 200 }));
      // Past the page size the ranking functions (bm25, ts_rank) may pick different jobs for the page; below it, all match.
      if (a.length < 200) expect(b.map((h) => h.job.id).sort((x, y) => x - y), text).toEqual(a.map((h) => h.job.id).sort((x, y) => x - y));
      else expect(b.length, text).toBe(200);
    }
    // An exact job number is the best hit on both (number is the heaviest column on both).
    for (const j of jobs.slice(0, 10)) {
      expect(value(findJobs(server, { text: j.number, limit: 3 }))[0]!.job.id).toBe(j.id);
      expect(value(findJobs(lite, { text: j.number, limit: 3 }))[0]!.job.id).toBe(j.id);
    }
    value(createJob(server, { partNumber: 'LATE-1 (demo)', spec: value(getJob(server, jobs[0]!.id)).spec }));
    expect(value(findJobs(server, { text: 'LATE-1' })).map((h) => h.job.partNumber)).toEqual(['LATE-1 (demo)']);
  });
});
