import { describe, expect, it } from 'vitest';
import { isBackwardsRange, isCalendarDate, listJobsSchema } from '../../core/api/store';
import { dateRangeProblem, jobInRange, localIsoDate, quickRanges } from '../../renderer/model/date-ranges';
import { jobCount, jobTotal } from '../../renderer/model/job-count';

const quick = (label: string, today: Date) => quickRanges.find((q) => q.label === label)!.range(today);

describe('job list date ranges', () => {
  it('takes only days on the calendar', () => {
    // Gregorian leap years (ISO 8601-1:2019, which dates by the Gregorian calendar): every fourth year, except
    // centuries not divisible by 400.
    expect(['2024-02-29', '2000-02-29', '2025-12-31', '2025-01-01'].map(isCalendarDate)).toEqual([true, true, true, true]);
    expect(['2025-02-29', '2100-02-29', '2025-04-31', '2025-13-01', '2025-3-1', '01/03/2025', ''].map(isCalendarDate)).toEqual(Array(7).fill(false));
  });

  it('refuses a from date after the to date, in the API as on the screen', () => {
    expect(isBackwardsRange({ from: '2025-04-01', to: '2025-03-31' })).toBe(true);
    expect(isBackwardsRange({ from: '2025-03-31', to: '2025-03-31' })).toBe(false);
    expect(isBackwardsRange({ from: '2025-04-01' })).toBe(false);
    const parsed = listJobsSchema.safeParse({ dates: { field: 'created', from: '2025-04-01', to: '2025-03-31' } });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues[0]!.path).toEqual(['dates', 'from']);
    expect(dateRangeProblem({ field: 'due', from: '2025-04-01', to: '2025-03-31' })).toMatch(/^From is after To \(2025-03-31\)/);
    expect(dateRangeProblem({ field: 'due', from: '2025-04-01', to: '' })).toBeNull();
  });

  it('works out the quick ranges from the local date, months and leap years included', () => {
    const midJanuary = new Date(2026, 0, 15, 23, 50);
    expect(localIsoDate(midJanuary)).toBe('2026-01-15');
    expect(quick('Due in the next 14 days', midJanuary)).toEqual({ field: 'due', from: '2026-01-15', to: '2026-01-29' });
    expect(quick('Created last month', midJanuary)).toEqual({ field: 'created', from: '2025-12-01', to: '2025-12-31' });
    expect(quick('Created last year', midJanuary)).toEqual({ field: 'created', from: '2025-01-01', to: '2025-12-31' });
    expect(quick('Created this month', new Date(2024, 1, 10))).toEqual({ field: 'created', from: '2024-02-01', to: '2024-02-29' });
    expect(quick('Created last month', new Date(2025, 2, 31))).toEqual({ field: 'created', from: '2025-02-01', to: '2025-02-28' });
    expect(quick('Due in the next 14 days', new Date(2025, 11, 25))).toEqual({ field: 'due', from: '2025-12-25', to: '2026-01-08' });
  });

  it('keeps a found job in a range as the store does: the stamp\'s date, both days included', () => {
    const job = { createdAt: '2025-03-31T23:30:00.000Z', updatedAt: '2025-04-02T08:00:00.000Z', dueDate: null };
    expect(jobInRange(job, { field: 'created', from: '2025-03-01', to: '2025-03-31' })).toBe(true);
    expect(jobInRange(job, { field: 'created', from: '2025-04-01', to: '' })).toBe(false);
    expect(jobInRange(job, { field: 'updated', from: '', to: '2025-04-02' })).toBe(true);
    expect(jobInRange(job, { field: 'due', from: '2025-01-01', to: '' })).toBe(false);
    expect(jobInRange(job, { field: 'due', from: '', to: '' })).toBe(true);
  });

  it('says how many jobs, with thousands spaced and an open count marked', () => {
    expect([jobCount(0), jobCount(1), jobCount(2041), jobCount(10_000, true), jobCount(1, true)])
      .toEqual(['0 jobs', '1 job', '2 041 jobs', '10 000+ jobs', '1+ jobs']);
    expect(jobTotal(250_000, true)).toBe('250 000+');
  });
});
