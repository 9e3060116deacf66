import type { JobDateField } from '../../core/api';
import { isBackwardsRange } from '../../core/api';
import { addCalendarDays } from '../../core/calendar';
import { shopDay } from './shop-days';

export interface DateRange {
  field: JobDateField;
  /** YYYY-MM-DD, or '' for an open end. */
  from: string;
  to: string;
}

export const noDateRange: DateRange = { field: 'created', from: '', to: '' };

const firstOfMonth = (day: string): string => `${day.slice(0, 8)}01`;
const year = (day: string): number => Number(day.slice(0, 4));
/** The first day of the month `months` after (or before) the month of `day`. */
function monthStart(day: string, months: number): string {
  const index = year(day) * 12 + Number(day.slice(5, 7)) - 1 + months;
  return `${String(Math.floor(index / 12)).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}-01`;
}

/** Ranges a planner asks for often, worked out from `today`, the shop's day when the button is pressed (shopToday). */
export const quickRanges: readonly { label: string; range(today: string): DateRange }[] = [
  {
    label: 'Due in the next 14 days',
    range: (t) => ({ field: 'due', from: t, to: addCalendarDays(t, 14) }),
  },
  {
    label: 'Created this month',
    range: (t) => ({ field: 'created', from: firstOfMonth(t), to: addCalendarDays(monthStart(t, 1), -1) }),
  },
  {
    label: 'Created last month',
    range: (t) => ({ field: 'created', from: monthStart(t, -1), to: addCalendarDays(firstOfMonth(t), -1) }),
  },
  {
    label: 'Created last year',
    range: (t) => ({ field: 'created', from: `${year(t) - 1}-01-01`, to: `${year(t) - 1}-12-31` }),
  },
];

/** True when the range has an end to filter by. */
export const isRangeSet = (r: DateRange): boolean => r.from !== '' || r.to !== '';

/** Why a range is not applied, or null when it can be; the list is not asked while there is one. */
export function dateRangeProblem(r: DateRange): string | null {
  if (!isBackwardsRange({ from: r.from || undefined, to: r.to || undefined })) return null;
  return `From is after To (${r.to}): pick a From date on or before it. The list is not changed until then.`;
}

/** The range as the store's listJobs takes it, open ends left out. */
export function rangeInput(r: DateRange): { field: JobDateField; from?: string; to?: string } {
  return { field: r.field, ...(r.from ? { from: r.from } : {}), ...(r.to ? { to: r.to } : {}) };
}

const dateOfJob = { created: 'createdAt', updated: 'updatedAt', due: 'dueDate' } as const;

/**
 * Whether a job falls in the range, as the store decides it (db/search/list.ts): stamps by their day in the shop's
 * time zone, both ends included; a job without the date (no due date) is outside any range.
 */
export function jobInRange(job: { createdAt: string; updatedAt: string; dueDate: string | null }, r: DateRange): boolean {
  if (!isRangeSet(r)) return true;
  const value = job[dateOfJob[r.field]];
  if (value === null) return false;
  const day = r.field === 'due' ? value : shopDay(value);
  return (r.from === '' || day >= r.from) && (r.to === '' || day <= r.to);
}
