import { calendarDay, todayIn } from '../../core/calendar';

/**
 * The shop's time zone (settings `defaults.timeZone`), taken when the settings are read: every day the screens
 * show (created, last saved, issued, archived) and every "today" they fill in is a day there (core/calendar.ts).
 */
let shopZone = 'UTC';

export function takeShopTimeZone(zone: string | undefined): void {
  shopZone = zone ?? 'UTC';
}

export const shopTimeZone = (): string => shopZone;

/** The shop's day of a stored ISO stamp, as YYYY-MM-DD. */
export const shopDay = (iso: string): string => calendarDay(iso, shopZone);

/** Today in the shop's zone. */
export const shopToday = (now: Date = new Date()): string => todayIn(shopZone, now);
