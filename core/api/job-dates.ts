/** Which of a job's dates a list range reads: when it was created, last saved, or is due. */
export const jobDateFields = ['created', 'updated', 'due'] as const;
export type JobDateField = (typeof jobDateFields)[number];

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A date written YYYY-MM-DD that is on the calendar (2025-02-30 is not). */
export function isCalendarDate(text: string): boolean {
  const m = ISO_DATE.exec(text);
  if (!m) return false;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const at = new Date(Date.UTC(year, month - 1, day));
  return at.getUTCFullYear() === year && at.getUTCMonth() === month - 1 && at.getUTCDate() === day;
}

/** A range whose from date is after its to date holds no job: it is refused, not answered with an empty list. */
export function isBackwardsRange(range: { from?: string | undefined; to?: string | undefined }): boolean {
  return range.from !== undefined && range.to !== undefined && range.from > range.to;
}
