/**
 * The shop's calendar (core/calendar.ts) against the published rules of the clocks it follows. The zone data
 * itself is the runtime's copy of the IANA time zone database; these checks hold it to the laws it encodes.
 */
import { describe, expect, it } from 'vitest';
import { addCalendarDays, calendarDay, dayStart, isTimeZone, snapshotTimeZone, todayIn } from '../../core/calendar';

describe('the day a stored stamp falls on, in the shop\'s zone', () => {
  it('is the local day, not the UTC one, in the evening west of Greenwich', () => {
    // America/Chicago keeps Central Standard Time, UTC−6, in December (15 U.S.C. §261 standard time zones).
    expect(calendarDay('2026-12-05T01:30:00.000Z', 'America/Chicago')).toBe('2026-12-04');
    expect(calendarDay('2026-12-05T06:00:00.000Z', 'America/Chicago')).toBe('2026-12-05');
    expect(calendarDay('2026-12-05T01:30:00.000Z', 'UTC')).toBe('2026-12-05');
    // India Standard Time is UTC+05:30 all year (no daylight saving).
    expect(calendarDay('2026-12-04T18:29:59.999Z', 'Asia/Kolkata')).toBe('2026-12-04');
    expect(calendarDay('2026-12-04T18:30:00.000Z', 'Asia/Kolkata')).toBe('2026-12-05');
  });

  it('gives today in the zone', () => {
    expect(todayIn('America/Chicago', new Date('2026-12-05T03:00:00Z'))).toBe('2026-12-04');
    expect(todayIn('Pacific/Auckland', new Date('2026-12-05T12:00:00Z'))).toBe('2026-12-06');
  });
});

describe('where a day begins', () => {
  it('follows the US daylight-saving rule: 2 a.m. on the second Sunday of March and the first Sunday of November', () => {
    // 15 U.S.C. §260a as amended by the Energy Policy Act of 2005, §110. In 2026 those Sundays are 8 March and 1 November.
    expect(dayStart('2026-03-08', 'America/Chicago')).toBe('2026-03-08T06:00:00.000Z'); // midnight CST (UTC−6)
    expect(dayStart('2026-03-09', 'America/Chicago')).toBe('2026-03-09T05:00:00.000Z'); // midnight CDT (UTC−5)
    expect(dayStart('2026-11-01', 'America/Chicago')).toBe('2026-11-01T05:00:00.000Z');
    expect(dayStart('2026-11-02', 'America/Chicago')).toBe('2026-11-02T06:00:00.000Z');
  });

  it('follows the EU summer-time rule: 01:00 UTC on the last Sundays of March and October', () => {
    // Directive 2000/84/EC, articles 2 and 3; Europe/Berlin is UTC+1 in winter, UTC+2 in summer. 29 March 2026 is that Sunday.
    expect(dayStart('2026-03-29', 'Europe/Berlin')).toBe('2026-03-28T23:00:00.000Z');
    expect(dayStart('2026-03-30', 'Europe/Berlin')).toBe('2026-03-29T22:00:00.000Z');
    expect(dayStart('2026-10-26', 'Europe/Berlin')).toBe('2026-10-25T23:00:00.000Z');
  });

  it('begins at the first minute there is where the clocks jump over midnight', () => {
    // From memory: Brazil's 2018 summer time began at 00:00 on 4 November (to 01:00, UTC−2); Chile's 2026 one at
    // 00:00 on 6 September (to 01:00, UTC−3). The runtime's zone data agrees.
    expect(dayStart('2018-11-04', 'America/Sao_Paulo')).toBe('2018-11-04T03:00:00.000Z');
    expect(dayStart('2026-09-06', 'America/Santiago')).toBe('2026-09-06T04:00:00.000Z');
  });

  it('is UTC midnight in UTC, and in every zone the first instant of its own day', () => {
    expect(dayStart('2026-12-05', 'UTC')).toBe('2026-12-05T00:00:00.000Z');
    for (const zone of ['America/Chicago', 'America/Santiago', 'Europe/Berlin', 'Asia/Kolkata', 'Pacific/Auckland', 'Pacific/Chatham']) {
      for (let d = 0; d < 366; d += 7) {
        const day = addCalendarDays('2026-01-01', d);
        const start = dayStart(day, zone);
        expect(calendarDay(start, zone), `${zone} ${day}`).toBe(day);
        expect(calendarDay(new Date(Date.parse(start) - 1).toISOString(), zone), `${zone} ${day}`).toBe(addCalendarDays(day, -1));
      }
    }
  });
});

describe('calendar arithmetic and zone names', () => {
  it('adds days across months, years and a Gregorian leap day', () => {
    expect(addCalendarDays('2026-12-25', 30)).toBe('2027-01-24');
    expect(addCalendarDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addCalendarDays('2100-02-28', 1)).toBe('2100-03-01'); // 2100 is not a leap year (divisible by 100, not 400)
    expect(addCalendarDays('2026-03-01', -1)).toBe('2026-02-28');
  });

  it('knows the zone names of the IANA database, and no others', () => {
    expect(isTimeZone('UTC')).toBe(true);
    expect(isTimeZone('America/Chicago')).toBe(true);
    expect(isTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isTimeZone('')).toBe(false);
  });
});

describe('the zone an issued quote dates in', () => {
  it('is the one its settings snapshot kept, or UTC for a snapshot kept before the zone was a setting', () => {
    expect(snapshotTimeZone({ defaults: { currency: 'USD', timeZone: 'Europe/Berlin' } })).toBe('Europe/Berlin');
    expect(snapshotTimeZone({ defaults: { currency: 'USD' } })).toBe('UTC');
    expect(snapshotTimeZone({ defaults: { timeZone: 'Central Time' } })).toBe('UTC');
    expect(snapshotTimeZone(null)).toBe('UTC');
  });
});
