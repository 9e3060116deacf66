/**
 * Helpers for writing grade data in the units the sources print. Inch tables stay in inches and ksi in
 * the data files and are converted here, once, when the module loads.
 */
import { MM_PER_IN, MPA_PER_PSI, toInternal } from '../units';
import type { Sourced, StrengthFit, StrengthRow } from './types';

export const MPA_PER_KSI = 1000 * MPA_PER_PSI;

/** Read in the named source (a standard as reprinted by a wire maker, or a handbook page). */
export const read = (source: string): Sourced => ({ source, verified: true });

/** Not read in any source when the data was entered; "from memory" is appended so no caller forgets it. */
export const fromMemory = (source: string): Sourced => ({ source: `${source}, from memory`, verified: false });

/** Taken from a related grade or worked out here; `source` must say from what. */
export const unverified = (source: string): Sourced => ({ source, verified: false });

export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const fahrenheitToC = (f: number): number => toInternal(f, 'temperature', 'inch');
export const lbPerIn3ToGPerCm3 = (x: number): number => toInternal(x, 'density', 'inch');

/** Rows printed as [d (mm), min (MPa), max (MPa)]. */
export function metricRows(rows: readonly (readonly [number, number, number?])[]): StrengthRow[] {
  return rows.map(([d, min, max]) => (max === undefined ? { d, min } : { d, min, max }));
}

/** Rows printed as [d (in), min (ksi), max (ksi)]. */
export function inchRows(rows: readonly (readonly [number, number, number?])[]): StrengthRow[] {
  return rows.map(([d, min, max]) => ({
    d: inToMm(d),
    min: min * MPA_PER_KSI,
    ...(max === undefined ? {} : { max: max * MPA_PER_KSI }),
  }));
}

/** A row of an inch fit table: Sut [ksi] = A / d[in]^m; `printedMetricA` is the table's own MPa·mm^m column. */
export interface InchFitRow extends Sourced {
  A: number;
  m: number;
  dMin: number;
  dMax: number;
  printedMetricA?: number;
}

/**
 * Sut[MPa] = MPa/ksi · A / (d[mm] / 25.4)^m, so the metric constant is A_SI = MPa/ksi · 25.4^m · A_US
 * (6.894757 · 25.4^m · A_US).
 */
export function inchFit(row: InchFitRow): StrengthFit {
  const { A, m, dMin, dMax, printedMetricA, source, verified } = row;
  return {
    A: MPA_PER_KSI * MM_PER_IN ** m * A,
    m,
    dMin: inToMm(dMin),
    dMax: inToMm(dMax),
    source,
    verified,
    inch: printedMetricA === undefined ? { A, dMin, dMax } : { A, dMin, dMax, printedMetricA },
  };
}
