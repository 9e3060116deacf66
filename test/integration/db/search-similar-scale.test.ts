// The similar-jobs search at store scale: a mixed store of 10 000 generated jobs (compression 94 %,
// extension 5 %, torsion 1 %, as the store bench makes them). Whatever the kind and wherever the ask falls,
// the R*Tree search with its density-sized start returns exactly what scoring every job of the kind returns.
import { describe, expect, it } from 'vitest';
import type { JobShape } from '../../../core/api/store';
import { copyStore } from '../../../db';
import { checkSpec } from '../../../db/jobs/input';
import { nearestJobs, nearestJobsByScan, startRadius } from '../../../db/search/similar';
import { compressionSpec, extensionSpec, fillWithJobs, lcg, torsionSpec } from '../../../bench/suites/store-data';
import { usePgCluster } from '../../support/pg-stores';
import { tempStore, value } from './helpers';

const pg = usePgCluster();

/** 25 asked springs of each kind, drawn as the bench draws them. */
function askedShapes(): [string, JobShape][] {
  const random = lcg(99);
  const makers = { compression: compressionSpec, extension: extensionSpec, torsion: torsionSpec };
  return Object.entries(makers).flatMap(([kind, make]) => Array.from({ length: 25 }, (): [string, JobShape] => {
    const checked = checkSpec(make(random), ['spec']);
    if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
    return [kind, checked.value.shape];
  }));
}

describe('similar jobs in a store of 10 000 jobs of three kinds', () => {
  it('ranks every kind exactly as the full scan does, the rare kind included', () => {
    const store = tempStore();
    fillWithJobs(store, 10_000, 20261204);
    for (const [kind, asked] of askedShapes()) {
      const found = nearestJobs(store, asked, 10);
      expect(found.length, kind).toBe(10);
      expect(found).toEqual(nearestJobsByScan(store, asked, 10));
    }
  }, 120_000);

  it('PostgreSQL (GiST per kind) finds the same jobs at the same distances as SQLite\'s full scan, and as its own', () => {
    const lite = tempStore();
    fillWithJobs(lite, 10_000, 20261204);
    const server = pg.freshStore();
    value(copyStore(lite, server));
    server.sql('ANALYZE').run();
    for (const [kind, asked] of askedShapes()) {
      for (const limit of [1, 10, 40]) {
        const found = nearestJobs(server, asked, limit);
        const scanned = nearestJobsByScan(lite, asked, limit);
        expect(found.map((s) => s.id), kind).toEqual(scanned.map((s) => s.id));
        found.forEach((s, i) => expect(s.distance).toBeCloseTo(scanned[i]!.distance, 12));
        expect(found).toEqual(nearestJobsByScan(server, asked, limit));
      }
    }
  }, 180_000);

  it('starts smaller as the kind grows, within its bounds', () => {
    expect(startRadius(10, 200_000)).toBeGreaterThan(startRadius(10, 1_000_000));
    expect(startRadius(10, 100)).toBe(0.6);
    expect(startRadius(10, 1_000_000)).toBeGreaterThanOrEqual(0.05);
    expect(startRadius(10, 0)).toBe(0.6);
  });
});
