import type { Spec } from '../spec';
import type { LimitCode } from './misses';

/** Key figures of a designed spring, in the requirement's units. */
export interface CandidateFigures {
  material: string;
  gradeName: string;
  wireDiameter: number;
  outerDiameter: number;
  innerDiameter: number;
  meanDiameter: number;
  springIndex: number;
  /** The end type; for an extension spring, the loop at both ends. */
  ends: string;
  activeCoils: number;
  /** Total coils of a compression spring, body coils of an extension spring. */
  totalCoils: number;
  /** Inside the ends for an extension spring. */
  freeLength: number;
  /** Compression only. */
  solidLength: number | null;
  rate: number;
  /** Extension only: the force the coils are wound together with. */
  initialTension: number | null;
  forces: { length: number; force: number; asked: number }[];
  /** Compression: corrected stress at solid ÷ allowable before set removal. */
  stressRatio: number | null;
  /** Allowable ÷ stress at the shortest working length, less one: the search's second ranking key. */
  stressMargin: number;
  setRemoval: boolean;
  shotPeened: boolean;
  wireLengthPerPiece: number;
  massPerPiece: number;
  fatigueSafetyFactor: number | null;
}

export interface DesignCandidate {
  rank: number;
  spec: Spec;
  figures: CandidateFigures;
  quantity: number;
  unitPrice: number;
  currency: string;
  /** False when the costing lacked a price or machine; such designs rank after the fully priced ones. */
  priced: boolean;
  missing: string[];
  /** Why it ranks below the first (empty for the first). */
  reasons: string[];
  /** Notes and accepted warnings of the maker's review, for the estimator to read. */
  remarks: string[];
}

/** A limit the requirement misses, with the amount, in the requirement's units. */
export interface LimitMiss {
  limit: LimitCode;
  label: string;
  path: string;
  value: number;
  bound: number;
  unit: string;
  /** By how much the value misses the bound (same unit), and as a percentage of the bound. */
  by: number;
  byPercent: number;
  message: string;
}

/** Why no design meets the requirement: the closest point found and what it misses. */
export interface Infeasibility {
  message: string;
  binding: LimitMiss;
  closest: { material: string; wireDiameter: number; meanDiameter: number | null; ends: string | null; misses: LimitMiss[] } | null;
  /** How many design points each limit ruled out, most first. */
  limitsHit: { limit: LimitCode; label: string; points: number }[];
}

export interface DesignAnswer {
  kind: Spec['kind'];
  units: Spec['units'];
  mainQuantity: number;
  currency: string;
  candidates: DesignCandidate[];
  /** Every design that met the requirement (one per wire, end type and peening), before the limit. */
  feasibleCount: number;
  searched: { wires: number; combinations: number; points: number; engineRuns: number; costed: number };
  infeasible: Infeasibility | null;
  clearanceRule: string;
  caution: string;
}
