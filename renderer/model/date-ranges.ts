import type { JobDateField } from '../../core/api';
import { isBackwardsRange } from '../../core/api';

export interface DateRange {
  field: JobDateField;
  /** YYYY-MM-DD, or '' for an open end. */
  from: string;
  to: string;
}

export const noDateRange: DateRange = { field: 'created', from: '', to: '' };

const pad = (n: number) => String(n).padStart(2, '0');

/** The calendar date of a local day as YYYY-MM-DD (not the UTC date, which differs near midnight). */
export function localIsoDate(day: Date): string {
  return `${day.getFullYear()}-${pad(day.getMonth() + 1)}-${pad(day.getDate())}`;
}

const dayOf = (y: number, m: number, d: number) => localIsoDate(new Date(y, m, d));

/** Ranges a planner asks for often, worked out from the local date `today` (taken when the button is pressed). */
export const quickRanges: readonly { label: string; range(today: Date): DateRange }[] = [
  {
    label: 'Due in the next 14 days',
    range: (t) => ({ field: 'due', from: localIsoDate(t), to: dayOf(t.getFullYear(), t.getMonth(), t.getDate() + 14) }),
  },
  {
    label: 'Created this month',
    range: (t) => ({ field: 'created', from: dayOf(t.getFullYear(), t.getMonth(), 1), to: dayOf(t.getFullYear(), t.getMonth() + 1, 0) }),
  },
  {
    label: 'Created last month',
    range: (t) => ({ field: 'created', from: dayOf(t.getFullYear(), t.getMonth() - 1, 1), to: dayOf(t.getFullYear(), t.getMonth(), 0) }),
  },
  {
    label: 'Created last year',
    range: (t) => ({ field: 'created', from: `${t.getFullYear() - 1}-01-01`, to: `${t.getFullYear() - 1}-12-31` }),
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
 * Whether a job falls in the range, as the store decides it (db/search/list.ts): stamps by their date part,
 * both ends included; a job without the date (no due date) is outside any range.
 */
export function jobInRange(job: { createdAt: string; updatedAt: string; dueDate: string | null }, r: DateRange): boolean {
  if (!isRangeSet(r)) return true;
  const value = job[dateOfJob[r.field]];
  if (value === null) return false;
  const day = value.slice(0, 10);
  return (r.from === '' || day >= r.from) && (r.to === '' || day <= r.to);
}
