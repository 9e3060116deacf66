import type { Spec } from '../spec';
import type { SpringReport } from '../calculate';
import type { WireChoice } from './wire-sizes';
import type { CandidateFigures } from './types';

/** What every kind's design point says about itself: the wire, the coil, the ends, the coils and peening. */
export interface PointKey {
  grade: string;
  /** Wire and mean coil diameter, mm. */
  d: number;
  D: number;
  ends: string;
  /** Active coils (compression) or body coils (extension). */
  na: number;
  peened: boolean;
}

/** A design the engine accepted: the point, its spec, the engine's report and what the ranking reads. */
export interface AcceptedDesign {
  point: PointKey;
  spec: Spec;
  report: SpringReport;
  setRemoval: boolean;
  /** Allowable ÷ working stress at the hardest point, less one. */
  stressMargin: number;
  wireLength: number;
  figures: CandidateFigures;
}

/** The designs of one wire, end type and peening worth costing: the least wire, and the least wire without set removal. */
export interface CombinationResult {
  wire: WireChoice;
  ends: string;
  peened: boolean;
  designs: AcceptedDesign[];
}

export interface SearchStats {
  wires: number;
  combinations: number;
  points: number;
  engineRuns: number;
}
