import { describe, expect, it } from 'vitest';
import { createJob, similarJobs } from '../../../db';
import { checkSpec } from '../../../db/jobs/input';
import { nearestJobs, nearestJobsByScan } from '../../../db/search/similar';
import { percentText } from '../../../db/search/similarity';
import { job, spec, tempStore, value } from './helpers';

const asked = spec({ wireDiameter: 2, outerDiameter: 20, freeLength: 50, totalCoils: 10 });

describe('similar jobs', () => {
  it('ranks the nearest spring first and says how each differs', () => {
    const store = tempStore();
    const far = value(createJob(store, job({ partNumber: 'FAR' }, { wireDiameter: 4, outerDiameter: 40, freeLength: 100 })));
    const close = value(createJob(store, job({ partNumber: 'CLOSE' }, { outerDiameter: 20.6, freeLength: 46 })));
    const exact = value(createJob(store, job({ partNumber: 'SAME' })));
    const otherFamily = value(createJob(store, job({ partNumber: 'STAINLESS' }, { material: 'en10270-3-1.4310' })));
    const hits = value(similarJobs(store, { spec: asked, limit: 4 }));
    expect(hits.map((h) => h.id)).toEqual([exact.id, close.id, otherFamily.id, far.id]);
    expect(hits[0]!.score).toBe(1);
    expect(hits[0]!.summary).toBe('d same, OD same, L0 same, coils same, rate same, material same');
    // Another family costs 1.0, and stainless has a lower shear modulus, so its rate is lower too.
    expect(hits[2]!.differences.material).toBe('other family');
    expect(hits[2]!.distance).toBeGreaterThan(1);
    expect(hits[2]!.summary).toMatch(/rate \u2212\d+ %, material other family \(en10270-3-1\.4310\)$/);
    const c = hits[1]!;
    expect(c.differences).toMatchObject({ wireDiameter: 'same', outerDiameter: '+3 %', freeLength: '\u22128 %', material: 'same' });
    expect(c.relative.outerDiameter).toBeCloseTo(0.03, 9);
    expect(c.relative.freeLength).toBeCloseTo(-0.08, 9);
    expect(c.summary).toMatch(/^d same, OD \+3 %, L0 \u22128 %, coils same, rate [\u2212+]\d+ %, material same$/);
  });

  it('compares inch jobs with metric asks in the same units', () => {
    const store = tempStore();
    const inch = value(createJob(store, job({}, { units: 'inch', wireDiameter: 2 / 25.4, outerDiameter: 20 / 25.4, freeLength: 50 / 25.4 })));
    const [hit] = value(similarJobs(store, { spec: asked, limit: 1 }));
    expect(hit!.id).toBe(inch.id);
    expect(hit!.distance).toBeCloseTo(0, 9);
  });

  it('keeps to the same kind and can leave out the job being looked at', () => {
    const store = tempStore();
    const a = value(createJob(store, job()));
    const b = value(createJob(store, job({}, { freeLength: 55 })));
    expect(value(similarJobs(store, { spec: asked, excludeJobId: a.id })).map((h) => h.id)).toEqual([b.id]);
  });

  it('finds exactly what scoring every job finds, wherever the ask falls', () => {
    const store = tempStore();
    let seed = 7;
    const random = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    const insert = store.db.transaction(() => {
      for (let i = 0; i < 300; i++) {
        const d = 0.3 * Math.exp(random() * 3);
        value(createJob(store, job({}, {
          wireDiameter: Number(d.toFixed(3)), outerDiameter: Number((d * (5 + random() * 9)).toFixed(2)),
          totalCoils: 4 + Math.round(random() * 16), freeLength: Number((d * (25 + random() * 40)).toFixed(2)),
          material: random() < 0.7 ? 'en10270-1-sh' : 'en10270-3-1.4310',
        })));
      }
    });
    insert();
    const asks = [asked, spec({ wireDiameter: 0.5, outerDiameter: 4, freeLength: 20 }), spec({ wireDiameter: 9, outerDiameter: 60, freeLength: 300 })];
    for (let i = 0; i < 20; i++) {
      const d = 0.3 * Math.exp(random() * 3);
      asks.push(spec({ wireDiameter: Number(d.toFixed(3)), outerDiameter: Number((d * (6 + random() * 6)).toFixed(2)), freeLength: Number((d * (30 + random() * 30)).toFixed(2)) }));
    }
    for (const [i, ask] of asks.entries()) {
      const checked = checkSpec(ask, ['spec']);
      if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
      const limit = [1, 10, 25][i % 3]!;
      expect(nearestJobs(store, checked.value.shape, limit, i === 4 ? 17 : undefined))
        .toEqual(nearestJobsByScan(store, checked.value.shape, limit, i === 4 ? 17 : undefined));
    }
  });

  it('reports a bad spec by its field', () => {
    expect(similarJobs(tempStore(), { spec: spec({ freeLength: -1 }) })).toMatchObject({ ok: false, error: { path: 'spec.freeLength' } });
  });

  it('writes differences the way the shop reads them', () => {
    expect([percentText(0.004), percentText(-0.004), percentText(0.031), percentText(-0.08), percentText(1.5)])
      .toEqual(['same', 'same', '+3 %', '\u22128 %', '+150 %']);
  });
});
