import { describe, expect, it } from 'vitest';
import type { JobCostReview } from '../../../core/api';
import { createService, dispatch } from '../../../service/api';
import { job, steppingClock, tempStore } from './helpers';

const grinders = (fastRate: number) => ({
  machines: [
    { id: 'c1', name: 'Coiler 1', operation: 'coil', wireRange: { min: 0.5, max: 4 }, hourlyRate: 60, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'g-fast', name: 'Fast grinder (demo)', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: fastRate, setupMinutes: 40, piecesPerHour: 1500 },
    { id: 'g-slow', name: 'Slow grinder (demo)', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 38, setupMinutes: 15, piecesPerHour: 300 },
  ],
});

describe('a saved job shows what a settings change moved until the estimator accepts it', () => {
  it('names the machine and the lines that moved, by how much, and clears on accept', async () => {
    const service = createService(tempStore(steppingClock()));
    const call = async <T>(name: string, input: unknown): Promise<T> => {
      const r = await dispatch(service.handlers, name, input);
      if (!r.ok) throw new Error(JSON.stringify(r.error));
      return r.value as T;
    };
    await call('saveSettings', { settings: grinders(60) });
    const saved = await call<{ id: number }>('createJob', job({}, { quantities: [10_000] }));
    expect((await call<JobCostReview>('jobCostChanges', { jobId: saved.id })).changes).toEqual({ machines: [], lines: [], prices: [] });

    await call('saveSettings', { settings: grinders(200) });
    const review = await call<JobCostReview>('jobCostChanges', { jobId: saved.id });
    expect(review.acceptedAt).toBeNull();
    expect(review.changes.machines).toEqual([{ quantity: 10_000, key: 'grind', title: 'Grind ends', from: 'Fast grinder (demo)', to: 'Slow grinder (demo)' }]);
    expect(review.changes.lines.map((l) => l.key)).toEqual(['grind:setup', 'grind:run', 'overhead', 'margin']);
    expect(review.changes.prices).toHaveLength(1);

    const accepted = await call<JobCostReview>('acceptJobCost', { jobId: saved.id });
    expect(accepted.acceptedAt).not.toBeNull();
    expect(accepted.changes).toEqual({ machines: [], lines: [], prices: [] });
    expect((await call<JobCostReview>('jobCostChanges', { jobId: saved.id })).changes.prices).toEqual([]);
    service.close();
  });

  it('an unknown job is an error naming jobId', async () => {
    const service = createService(tempStore());
    expect(await dispatch(service.handlers, 'jobCostChanges', { jobId: 99 })).toMatchObject({ ok: false, error: { code: 'not-found', path: 'jobId' } });
    expect(await dispatch(service.handlers, 'acceptJobCost', { jobId: 99 })).toMatchObject({ ok: false, error: { path: 'jobId' } });
    service.close();
  });
});
