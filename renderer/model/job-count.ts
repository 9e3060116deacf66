import { typedText } from '../../core/typed-number';
import { decimalMark } from './numbers';

/**
 * How many jobs a list holds, thousands spaced: "2 041", or "10 000+" when the store stopped counting a
 * long date range at its cap. The count line and the pager both say it this way.
 */
export function jobTotal(total: number, atLeast = false): string {
  return `${typedText(total, { decimalMark: decimalMark() })}${atLeast ? '+' : ''}`;
}

/** "1 job", "2 041 jobs", "10 000+ jobs". */
export function jobCount(total: number, atLeast = false): string {
  return `${jobTotal(total, atLeast)} job${total === 1 && !atLeast ? '' : 's'}`;
}
