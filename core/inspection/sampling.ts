/**
 * Normal single sampling, general inspection level II (ISO 2859-1 = ANSI/ASQ Z1.4). Switching to
 * tightened or reduced inspection is the standard's business and is not modelled here.
 */
import type { Lookup } from '../tolerances/lookup';
import { found, notFound } from '../tolerances/lookup';
import type { CodeLetter } from './sampling-tables';
import { aqls, cellAt, codeLetters, columnSources, levelIICodeLetters, sampleSizes } from './sampling-tables';

export interface SamplingPlan {
  /** Code letter for the lot size (Table I). */
  code: CodeLetter;
  /** Code letter whose plan is used after following an arrow; its sample size applies, not `code`'s. */
  planCode: CodeLetter;
  /** Pieces to inspect: the plan's sample size, or the whole lot under 100 % inspection. */
  sampleSize: number;
  accept: number;
  reject: number;
  /** The plan's sample size equals or exceeds the lot: inspect every piece, judge by Ac/Re as printed. */
  hundredPercent: boolean;
}

const CHART_NOTE = 'if the sample size equals or exceeds the lot size, inspect 100 % (chart note)';

/** Code letter and sample size for a lot, general inspection level II. */
export function sampleSizeCode(lotSize: number): Lookup<{ code: CodeLetter; sampleSize: number }> {
  if (!Number.isInteger(lotSize) || lotSize < 2) {
    return notFound('lot-size-outside-table', 'lotSize', `lot size must be a whole number of 2 or more (got ${lotSize})`);
  }
  const band = levelIICodeLetters.bands.find((b) => lotSize >= b.from && lotSize <= b.to);
  const code = band?.code as CodeLetter;
  return found({ code, sampleSize: sampleSizes[code] }, levelIICodeLetters);
}

/** Follows the table's arrows down its column from `code` to the first printed plan. */
function resolvePlan(code: CodeLetter, column: number): { planCode: CodeLetter; accept: number; reject: number } | null {
  let row = codeLetters.indexOf(code);
  let cell = cellAt(code, column);
  const step = cell === 'up' ? -1 : 1;
  while (cell === 'up' || cell === 'down') {
    row += step;
    const letter = codeLetters[row];
    if (letter === undefined) return null;
    cell = cellAt(letter, column);
  }
  if (cell === undefined) return null;
  return { planCode: codeLetters[row] as CodeLetter, ...cell };
}

export function samplingPlan(input: { lotSize: number; aql: number }): Lookup<SamplingPlan> {
  const { lotSize, aql } = input;
  const column = aqls.findIndex((a) => Math.abs(a - aql) <= 1e-9 * a);
  if (column < 0) {
    return notFound('aql-not-in-table', 'aql', `AQL ${aql} is not a column of the table (${aqls.join(', ')})`);
  }
  const lot = sampleSizeCode(lotSize);
  if (!lot.ok) return lot;
  const plan = resolvePlan(lot.value.code, column);
  const table = columnSources[aqls[column] as number] as { source: string; verified: boolean };
  if (!plan) {
    return notFound('no-plan-in-table', 'aql', `for code letter ${lot.value.code} at AQL ${aql} the table points ` +
      'above its first row, so it gives no plan: inspect 100 % or agree a plan with the customer');
  }
  const n = sampleSizes[plan.planCode];
  const hundredPercent = n >= lotSize;
  return found(
    { code: lot.value.code, ...plan, sampleSize: hundredPercent ? lotSize : n, hundredPercent },
    { source: `${table.source}; ${CHART_NOTE}`, verified: table.verified },
  );
}
