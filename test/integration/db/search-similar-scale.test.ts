// The similar-jobs search at store scale: a mixed store of 10 000 generated jobs (compression 94 %,
// extension 5 %, torsion 1 %, as the store bench makes them). Whatever the kind and wherever the ask falls,
// the R*Tree search with its density-sized start returns exactly what scoring every job of the kind returns.
import { describe, expect, it } from 'vitest';
import { checkSpec } from '../../../db/jobs/input';
import { nearestJobs, nearestJobsByScan, startRadius } from '../../../db/search/similar';
import { compressionSpec, extensionSpec, fillWithJobs, lcg, torsionSpec } from '../../../bench/suites/store-data';
import { tempStore } from './helpers';

describe('similar jobs in a store of 10 000 jobs of three kinds', () => {
  it('ranks every kind exactly as the full scan does, the rare kind included', () => {
    const store = tempStore();
    fillWithJobs(store, 10_000, 20261204);
    const random = lcg(99);
    const makers = { compression: compressionSpec, extension: extensionSpec, torsion: torsionSpec };
    for (const [kind, make] of Object.entries(makers)) {
      for (let i = 0; i < 25; i++) {
        const checked = checkSpec(make(random), ['spec']);
        if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
        const asked = checked.value.shape;
        const found = nearestJobs(store, asked, 10);
        expect(found.length, kind).toBe(10);
        expect(found).toEqual(nearestJobsByScan(store, asked, 10));
      }
    }
  }, 120_000);

  it('starts smaller as the kind grows, within its bounds', () => {
    expect(startRadius(10, 100)).toBeGreaterThan(startRadius(10, 100_000));
    expect(startRadius(10, 1_000_000)).toBeGreaterThanOrEqual(0.02);
    expect(startRadius(10, 0)).toBe(0.5);
  });
});
