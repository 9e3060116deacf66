import { findGrade } from '../../core/materials';
import { fromInternal } from '../../core/units';
import type { UnitSystem } from '../../core/units';
import { lengthDecimals } from '../../core/format';

/** The spec's own numbers an estimator types to find a job, each under the symbol the trade uses. */
const GIVEN_LENGTHS: readonly (readonly [string, string])[] = [
  ['wireDiameter', 'd'], ['outerDiameter', 'OD'], ['innerDiameter', 'ID'], ['meanDiameter', 'D'],
  ['freeLength', 'L0'], ['bodyLength', 'body'], ['totalCoils', 'Nt'], ['activeCoils', 'n'], ['bodyCoils', 'coils'],
];

/** A number as typed: the trade's decimals for the unit system, trailing zeros dropped ("1.60" reads "1.6"). */
function typed(value: number, units: UnitSystem): string {
  return String(Number(value.toFixed(lengthDecimals[units])));
}

/** Every job is a spring: the word in a grade's name ("Spring steel wire SH") would find every job. */
const nameWords = (name: string): string => name.split(/[\s-]+/).filter((w) => w.toLowerCase() !== 'spring').join(' ');

/** A grade's words by its id, made once per grade (the grades are fixed while the program runs). */
const wordsOfGrade = new Map<string, string>();

function gradeWords(id: string): string {
  let words = wordsOfGrade.get(id);
  if (words === undefined) {
    const grade = findGrade(id);
    words = [id, ...(grade ? [nameWords(grade.name), grade.standard] : [])].join(' ');
    // An unknown id is the spec's own text: it is not kept, so the table stays as small as the catalogue.
    if (grade) wordsOfGrade.set(id, words);
  }
  return words;
}

export interface WordsShape {
  units: UnitSystem;
  /** Internal mm, as the jobs row holds it. */
  outerDiameter: number;
}

/**
 * The words of a job's spring for the text index: the wire grade's id, name and standard ("music wire",
 * "A228", "EN 10270-1") and the dimensions by value in the job's own units ("1.6", "OD 12.5"). Reads the
 * stored spec without checking it, so a spec that no longer reads still keeps its words.
 */
export function searchWords(spec: unknown, shape: WordsShape): string {
  if (typeof spec !== 'object' || spec === null) return '';
  const s = spec as Record<string, unknown>;
  const words: string[] = [];
  if (typeof s.material === 'string') words.push(gradeWords(s.material));
  for (const [field, symbol] of GIVEN_LENGTHS) {
    const v = s[field];
    if (typeof v === 'number' && Number.isFinite(v)) words.push(`${symbol} ${typed(v, shape.units)}`);
  }
  if (s.outerDiameter === undefined && Number.isFinite(shape.outerDiameter)) {
    words.push(`OD ${typed(fromInternal(shape.outerDiameter, 'length', shape.units), shape.units)}`);
  }
  return words.join(' ');
}
