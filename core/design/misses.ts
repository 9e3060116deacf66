import type { Quantity } from '../units';

/** The limits a design can miss, in the words the estimator reads them. */
export const limitLabels = {
  envelope: 'room between the envelope and the spring index',
  bore: 'bore (outside diameter at solid plus clearance)',
  'max-outer-diameter': 'maximum outside diameter',
  rod: 'rod (inside diameter less clearance)',
  'min-inner-diameter': 'minimum inside diameter',
  'max-solid-length': 'maximum solid length',
  'max-free-length': 'maximum free length',
  'load-tolerance': 'force tolerance',
  'rate-tolerance': 'rate tolerance',
  'coil-clearance': 'coil clearance at the shortest working length',
  'active-coils': 'minimum active coils',
  'solid-stress': 'stress at solid after set removal',
  'working-stress': 'stress at the shortest working length',
  'stress-ratio': 'maximum stress ratio',
  'initial-tension': 'initial tension (the customer\'s window and the preferred window for the index)',
  'hook-stress': 'stress in the loops',
  arbor: 'arbor clearance (at least 10 % of the loaded inside diameter)',
  'set-removal': 'set removal within the trade\'s rules (set at least the free-length tolerance, stress ratio at most 1.3, coiled length within the coiler\'s and the set model\'s bounds)',
  fatigue: 'fatigue safety factor (Goodman, infinite life)',
  'fatigue-life': 'stress at the end of the stroke against the finite-life limit for the duty\'s cycles',
  review: 'the maker\'s review',
  'grade-duty': 'grade fit for cyclic duty',
  'grade-temperature': 'grade service temperature',
  'no-wire': 'wire to choose from',
} as const;

export type LimitCode = keyof typeof limitLabels;

/**
 * One limit a design point misses: the value it has, the bound it must meet, in internal units of
 * `quantity`, and the miss relative to the bound (0.1 = 10 % over), used to find the closest point.
 */
export interface Miss {
  limit: LimitCode;
  /** The requirement field the limit comes from. */
  path: string;
  quantity: Quantity;
  value: number;
  bound: number;
  /** 'max': value must not exceed bound; 'min': value must reach bound. */
  sense: 'max' | 'min';
  relative: number;
  note?: string;
}

const REL = 1e-9;

/** A miss when value > bound (with a rounding allowance), else null. */
export function overMax(limit: LimitCode, path: string, quantity: Quantity, value: number, bound: number): Miss | null {
  if (value <= bound * (1 + REL) + 1e-12) return null;
  return { limit, path, quantity, value, bound, sense: 'max', relative: (value - bound) / Math.abs(bound || 1) };
}

/** A miss when value < bound (with a rounding allowance), else null. */
export function underMin(limit: LimitCode, path: string, quantity: Quantity, value: number, bound: number): Miss | null {
  if (value >= bound * (1 - REL) - 1e-12) return null;
  return { limit, path, quantity, value, bound, sense: 'min', relative: (bound - value) / Math.abs(bound || 1) };
}
