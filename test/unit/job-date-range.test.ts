import { describe, expect, it } from 'vitest';
import { isBackwardsRange, isCalendarDate, listJobsSchema } from '../../core/api/store';
import { dateRangeProblem, jobInRange, quickRanges } from '../../renderer/model/date-ranges';
import { shopToday, takeShopTimeZone } from '../../renderer/model/shop-days';
import { jobCount, jobTotal } from '../../renderer/model/job-count';

const quick = (label: string, today: string) => quickRanges.find((q) => q.label === label)!.range(today);

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

  it('works out the quick ranges from the shop\'s day, months and leap years included', () => {
    // Gregorian calendar (ISO 8601-1:2019): 2024 is a leap year, 2025 is not.
    expect(quick('Due in the next 14 days', '2026-01-15')).toEqual({ field: 'due', from: '2026-01-15', to: '2026-01-29' });
    expect(quick('Created last month', '2026-01-15')).toEqual({ field: 'created', from: '2025-12-01', to: '2025-12-31' });
    expect(quick('Created last year', '2026-01-15')).toEqual({ field: 'created', from: '2025-01-01', to: '2025-12-31' });
    expect(quick('Created this month', '2024-02-10')).toEqual({ field: 'created', from: '2024-02-01', to: '2024-02-29' });
    expect(quick('Created this month', '2025-12-31')).toEqual({ field: 'created', from: '2025-12-01', to: '2025-12-31' });
    expect(quick('Created last month', '2025-03-31')).toEqual({ field: 'created', from: '2025-02-01', to: '2025-02-28' });
    expect(quick('Due in the next 14 days', '2025-12-25')).toEqual({ field: 'due', from: '2025-12-25', to: '2026-01-08' });
  });

  it('takes today in the shop\'s zone: 11:50 pm in Chicago is still that day', () => {
    // 2026-01-16T05:50Z is 23:50 on 15 January in Chicago (CST, UTC−6).
    takeShopTimeZone('America/Chicago');
    try {
      expect(shopToday(new Date('2026-01-16T05:50:00Z'))).toBe('2026-01-15');
    } finally {
      takeShopTimeZone('UTC');
    }
    expect(shopToday(new Date('2026-01-16T05:50:00Z'))).toBe('2026-01-16');
  });

  it('keeps a found job in a range as the store does: the stamp\'s day in the shop\'s zone, both days included', () => {
    const job = { createdAt: '2025-03-31T23:30:00.000Z', updatedAt: '2025-04-02T08:00:00.000Z', dueDate: null };
    expect(jobInRange(job, { field: 'created', from: '2025-03-01', to: '2025-03-31' })).toBe(true);
    expect(jobInRange(job, { field: 'created', from: '2025-04-01', to: '' })).toBe(false);
    expect(jobInRange(job, { field: 'updated', from: '', to: '2025-04-02' })).toBe(true);
    expect(jobInRange(job, { field: 'due', from: '2025-01-01', to: '' })).toBe(false);
    expect(jobInRange(job, { field: 'due', from: '', to: '' })).toBe(true);
    // In Chicago (CDT, UTC−5, in April) 23:30 UTC on 31 March is 18:30 that day; 08:00 UTC on 2 April is 03:00 that day.
    takeShopTimeZone('America/Chicago');
    try {
      expect(jobInRange(job, { field: 'created', from: '2025-03-31', to: '2025-03-31' })).toBe(true);
      expect(jobInRange({ ...job, createdAt: '2025-04-01T03:30:00.000Z' }, { field: 'created', from: '', to: '2025-03-31' })).toBe(true);
      expect(jobInRange({ ...job, createdAt: '2025-04-01T03:30:00.000Z' }, { field: 'created', from: '2025-04-01', to: '' })).toBe(false);
    } finally {
      takeShopTimeZone('UTC');
    }
  });

  it('says how many jobs, with thousands spaced and an open count marked', () => {
    expect([jobCount(0), jobCount(1), jobCount(2041), jobCount(10_000, true), jobCount(1, true)])
      .toEqual(['0 jobs', '1 job', '2 041 jobs', '10 000+ jobs', '1+ jobs']);
    expect(jobTotal(250_000, true)).toBe('250 000+');
  });
});
