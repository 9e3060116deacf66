import type { SpringReport } from '../../../../core/calculate';
import { kindScreenOf } from '../kinds/kind-screens';

/** One key figure as shown: its name, the trade symbol and the formatted value. */
export interface Readout {
  name: string;
  symbol: string;
  value: string;
}

/** One stress against the allowable that applies to it. */
export interface StressBar {
  label: string;
  value: number;
  allowable: number;
  basis: string;
}

/** One row of the load table: the point, the calculated load, what the drawing asks, and whether it is met. */
export interface LoadRow {
  point: string;
  at: string;
  load: string;
  asked: string;
  within: boolean | null;
}

/** The key figures of the report's kind. */
export function readouts(r: SpringReport): Readout[] {
  return kindScreenOf(r.kind).readouts(r);
}

/** Stresses against the allowables that apply (after set removal when it is done). */
export function stressBars(r: SpringReport): StressBar[] {
  return kindScreenOf(r.kind).stressBars(r);
}

export function loadRows(r: SpringReport): LoadRow[] {
  return kindScreenOf(r.kind).loadRows(r);
}
