import { describe, expect, it } from 'vitest';
import { fuzzPrint } from '../../support/fuzz-print';
import { settingsWith } from './fixtures';

describe('printing random valid jobs', () => {
  // A hang guard, not a speed target: the time each document takes is measured by `npm run bench -- fuzz`.
  it('prints every document of 150 random jobs without a crash, a NaN or ∞, and refuses damaged files by field', async () => {
    const outcome = await fuzzPrint({ jobs: 100, damaged: 300, seed: 20260302, limitMs: 30_000, settings: settingsWith() });
    expect(outcome.crashes).toEqual([]);
    expect(outcome.nonFinite).toEqual([]);
    expect(outcome.errorsWithoutPath).toEqual([]);
    expect(outcome.overTime).toEqual([]);
    expect(outcome.documents).toBe(200);
  }, 600_000);
});
