import type { JobDateField } from '../../core/api/store';
import { isBackwardsRange, isCalendarDate, jobDateFields } from '../../core/api/store';
import type { ParsedArgs } from './io';
import { InputError } from './io';

/** The help's words for the date range of `jobs list`. */
export const dateRangeHelp = '[--created-from D] [--created-to D] | [--updated-from D] [--updated-to D] | [--due-from D] [--due-to D]\n'
  + '  (a date range on one of created, updated (last saved) or due; D as YYYY-MM-DD, both days included, days of the shop\'s time zone)';

const bad = (flag: string, message: string): never => {
  throw new InputError([{ code: 'invalid-option', path: flag, message }]);
};

function dateOption(args: ParsedArgs, flag: string): string | undefined {
  const v = args.options.get(flag.slice(2));
  if (v === undefined) return undefined;
  if (v === true) return bad(flag, `${flag} needs a date as YYYY-MM-DD, e.g. 2025-03-01`);
  if (!isCalendarDate(v)) return bad(flag, `${flag} needs a calendar date as YYYY-MM-DD, e.g. 2025-03-01, not "${v}"`);
  return v;
}

/**
 * --created-from/--created-to, --updated-from/--updated-to or --due-from/--due-to as listJobs' `dates`;
 * undefined when none is given. Flags of two fields, a date not on the calendar or a from after its to
 * are refused naming the flag.
 */
export function dateRangeOption(args: ParsedArgs): { field: JobDateField; from?: string; to?: string } | undefined {
  const given = jobDateFields.filter((f) => args.options.has(`${f}-from`) || args.options.has(`${f}-to`));
  if (given.length === 0) return undefined;
  if (given.length > 1) bad(`--${given[1]}-${args.options.has(`${given[1]}-from`) ? 'from' : 'to'}`, `one date range at a time: --${given[0]}-… and --${given[1]}-… were both given`);
  const field = given[0]!;
  const from = dateOption(args, `--${field}-from`);
  const to = dateOption(args, `--${field}-to`);
  if (isBackwardsRange({ from, to })) bad(`--${field}-from`, `--${field}-from ${from} is after --${field}-to ${to}`);
  return { field, ...(from ? { from } : {}), ...(to ? { to } : {}) };
}
