import type { Finding, Severity } from '../result';
import { formatQuantity, significant } from '../format';
import type { CoilBody } from '../springs/coil-body';
import { diameterField } from '../springs/coil-body';
import { reviewLimits as lim } from './limits';
import type { FatigueResult } from '../springs/fatigue';
import { zimmerliReaches } from '../springs/fatigue';
import type { UnitSystem } from '../units';

/** Review rules every kind shares: index, service temperature, and the finding builder. */
export type Sink = Finding[];

export const add = (out: Sink, severity: Severity, code: string, path: string, message: string, fix = ''): void => {
  out.push({ code, severity, message, path, fix });
};

export const diameterPath = (x: CoilBody): string => diameterField[x.diameterGiven];

export function reviewIndex(x: CoilBody, w: number, out: Sink): void {
  if (w > lim.makeableIndex.max) {
    add(out, 'error', 'index-not-makeable', diameterPath(x),
      `spring index ${significant(w)} is above ${lim.makeableIndex.max}: the coil will not hold its diameter`,
      'use heavier wire or a smaller coil diameter');
  } else if (w < lim.preferredIndex.min || w > lim.preferredIndex.max) {
    add(out, 'warning', 'index-outside-preferred', diameterPath(x),
      `spring index ${significant(w)} is outside the preferred ${lim.preferredIndex.min}–${lim.preferredIndex.max}: ` +
      (w < lim.preferredIndex.min ? 'hard to coil, high curvature stress' : 'springs tangle and diameters wander'),
      'change wire or coil diameter towards an index of 6–10');
  }
}

export function reviewServiceTemperature(x: CoilBody, out: Sink): void {
  const t = x.serviceTemperature;
  const range = x.wire.serviceTemperature;
  if (t && t.max > range.max) {
    add(out, 'error', 'temperature-above-grade', 'serviceTemperature.max',
      `service temperature ${formatQuantity(t.max, 'temperature', x.units)} is above the ${x.wire.gradeName} limit ` +
      `${formatQuantity(range.max, 'temperature', x.units)}: the spring will relax`, 'choose a grade rated for the temperature');
  }
  if (t && t.min < range.min) {
    add(out, 'warning', 'temperature-below-grade', 'serviceTemperature.min',
      `service temperature ${formatQuantity(t.min, 'temperature', x.units)} is below the ${x.wire.gradeName} limit ` +
      `${formatQuantity(range.min, 'temperature', x.units)}: risk of brittle fracture`, 'choose a grade rated for the temperature');
  }
}

/** Scope of EN 13906-2 (extension) and -3 (torsion), cold coiled. */
export function reviewScope13906(x: CoilBody, w: number, n: number, standard: string, out: Sink): void {
  const s = lim.en13906ColdCoiled;
  const outside: string[] = [];
  if (x.d > s.dMax) outside.push('wire diameter');
  if (n < s.nMin) outside.push('coils');
  if (w < s.w.min || w > s.w.max) outside.push('spring index');
  if (outside.length === 0) return;
  add(out, 'note', 'outside-en13906-scope', '', `outside the scope of ${standard} (${outside.join(', ')}): its methods are used by extension`);
}

export const noFatigueData = (gradeName: string): string =>
  `no fatigue data for ${gradeName}: the endurance data and cyclic tables used here are for spring steels, so cyclic duty is not checked`;
export const NO_FATIGUE_DATA_FIX = 'get the wire maker\'s fatigue data or life-test the springs, or choose a steel grade';

/** The fatigue verdict in words: the finite-life check when the duty's cycles are below the endurance data. */
export function fatigueWords(f: FatigueResult, u: UnitSystem): string {
  if (f.finiteLife) {
    return `finite-life check ${f.verdict} at ${significant(f.finiteLife.cycles)} cycles: maximum stress ` +
      `${formatQuantity(f.stressMax, 'stress', u)} against ${formatQuantity(f.finiteLife.limit, 'stress', u)} ` +
      `(${significant(100 * f.finiteLife.fraction)} % of tensile strength, ${f.finiteLife.source})`;
  }
  if (!zimmerliReaches(f.enduranceMean, f.ultimateShear)) {
    return `infinite-life check ${f.verdict}: the torsional ultimate strength ${formatQuantity(f.ultimateShear, 'stress', u)} ` +
      `is not above the Zimmerli mean stress ${formatQuantity(f.enduranceMean, 'stress', u)}, so the endurance data ` +
      'do not cover wire this soft and infinite life cannot be shown';
  }
  const factor = (n: number | null) => (n === null ? 'none (no stress in the cycle)' : significant(n));
  return `infinite-life check ${f.verdict}: Goodman safety factor ${factor(f.goodmanSafetyFactor)}, ` +
    `Gerber ${factor(f.gerberSafetyFactor)} (Zimmerli data, ${f.peened ? 'peened' : 'not peened'})`;
}

/** The remedy for a fatigue verdict short of a pass: stronger wire where the endurance data do not reach it. */
export function fatigueFix(f: FatigueResult, strokeFix: string): string {
  return !f.finiteLife && !zimmerliReaches(f.enduranceMean, f.ultimateShear)
    ? 'choose a spring steel of higher tensile strength, or life-test the springs' : strokeFix;
}
