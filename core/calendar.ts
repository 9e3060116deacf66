/**
 * The shop's calendar: which day an instant falls on, and where a day begins, in the shop's time zone (an IANA
 * zone name such as "America/Chicago", settings `defaults.timeZone`). Stamps are stored as UTC ISO instants; the
 * days on the screens, the documents and the job list's date ranges are the shop's days, so a job saved at 7 pm
 * in Chicago is on that day's date, not the next one's.
 */

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

const formatters = new Map<string, Intl.DateTimeFormat>();

/** One formatter a zone, kept: building one costs far more than using it. */
function formatterOf(zone: string): Intl.DateTimeFormat {
  let f = formatters.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit', hourCycle: 'h23' });
    formatters.set(zone, f);
  }
  return f;
}

/** Whether this runtime knows the zone name ("UTC", "Europe/Berlin"). */
export function isTimeZone(zone: string): boolean {
  if (zone.trim() === '') return false;
  try {
    formatterOf(zone);
    return true;
  } catch {
    return false;
  }
}

const pad = (n: number, width = 2) => String(n).padStart(width, '0');

/** The day (YYYY-MM-DD) of an instant (epoch milliseconds) in the zone. */
function dayAt(ms: number, zone: string): string {
  let year = 0;
  let month = 0;
  let day = 0;
  for (const part of formatterOf(zone).formatToParts(ms)) {
    if (part.type === 'year') year = Number(part.value);
    else if (part.type === 'month') month = Number(part.value);
    else if (part.type === 'day') day = Number(part.value);
  }
  return `${pad(year, 4)}-${pad(month)}-${pad(day)}`;
}

/** The shop's day of a stored ISO stamp: 2026-12-05T01:30:00.000Z is 2026-12-04 in America/Chicago. */
export function calendarDay(iso: string, zone: string): string {
  const ms = Date.parse(iso);
  return Number.isFinite(ms) ? dayAt(ms, zone) : iso.slice(0, 10);
}

/** Today in the zone. */
export const todayIn = (zone: string, now: Date = new Date()): string => dayAt(now.getTime(), zone);

/** A YYYY-MM-DD day `days` later (or earlier): calendar arithmetic, the same in every zone. */
export function addCalendarDays(day: string, days: number): string {
  const m = ISO_DAY.exec(day);
  if (!m) throw new Error(`not a day written YYYY-MM-DD: "${day}"`);
  const at = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) + days * DAY_MS);
  return `${pad(at.getUTCFullYear(), 4)}-${pad(at.getUTCMonth() + 1)}-${pad(at.getUTCDate())}`;
}

/**
 * The first instant of a day in the zone, as an ISO stamp: usually local midnight, later where the clocks jump
 * over midnight. Found by bisection over the 30 hours around the day's UTC midnight (zones lie within UTC−12
 * and UTC+14), to the millisecond, so it holds for any offset and any change of it.
 */
export function dayStart(day: string, zone: string): string {
  const m = ISO_DAY.exec(day);
  if (!m) throw new Error(`not a day written YYYY-MM-DD: "${day}"`);
  const utcMidnight = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
  let before = utcMidnight - 15 * HOUR_MS;
  let from = utcMidnight + 15 * HOUR_MS;
  // Invariant: dayAt(before) < day <= dayAt(from).
  while (from - before > 1) {
    const mid = Math.floor((before + from) / 2);
    if (dayAt(mid, zone) >= day) from = mid;
    else before = mid;
  }
  return new Date(from).toISOString();
}

/** The zone a stored settings snapshot (an issued quote's) dates in: UTC for one kept before the zone was a setting. */
export function snapshotTimeZone(settings: unknown): string {
  const zone = (settings as { defaults?: { timeZone?: unknown } } | null | undefined)?.defaults?.timeZone;
  return typeof zone === 'string' && isTimeZone(zone) ? zone : 'UTC';
}
