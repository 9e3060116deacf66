/** Limits the maker's review checks against, each with where it comes from. */
export const reviewLimits = {
  /** Shigley 9e §10-5: 4 ≤ C ≤ 12 preferred (from memory). */
  preferredIndex: { min: 4, max: 12 },
  /** Beyond these a spring is not practically coiled (common trade practice). */
  makeableIndex: { min: 2, max: 25 },
  /** Wire under 0.5 mm is normally left unground (common trade practice, as spring makers' end-type guides state it). */
  minimumGroundWire: 0.5,
  /**
   * Set removal: stress ratio at solid ≤ 1.3 (SMI rule reprinted by spring makers, newcombspring.com). The
   * reprint's other rule, "set at least 10 %", is kept in what it is for: the set must be large enough for the
   * first-off to control against the free-length tolerance (set ≥ the ± tolerance; common trade practice).
   */
  maximumSetRatio: 1.3,
  /** A working deflection within 20 % of the buckling deflection gets a note (common trade practice). */
  bucklingMargin: 0.2,
  /** Shigley 9e: 3 ≤ Na (from memory). */
  minimumActiveCoils: 3,
  /** EN 15800 Table 1 scope of the tolerance standard (CEN/TC listing). */
  en15800: { d: { min: 0.07, max: 16 }, D: { min: 0.63, max: 200 }, L0Max: 630, nMin: 2, w: { min: 4, max: 20 } },
  /** Scope of EN 13906-2 and -3, cold coiled (DIN catalogue page): d ≤ 20 mm, n ≥ 3, 4 ≤ w ≤ 20. */
  en13906ColdCoiled: { dMax: 20, nMin: 3, w: { min: 4, max: 20 } },
  /** Extension hooks: side-bend radius at least 1.5·d (spring makers' review checklists, common practice). */
  minimumHookBendRadius: 1.5,
  /** Torsion legs: bend radius at least d (common practice). */
  minimumLegBendRadius: 1,
  /** Torsion arbor: about 10 % clearance to the smallest loaded inside diameter (common practice). */
  minimumArborClearance: 0.1,
  /**
   * A stress from 85 % of its allowable is shown as near it, and a compression spring's solid stress from
   * there on calls for the near-solid caution (common trade practice: keep a margin to the allowable).
   */
  nearAllowableRatio: 0.85,
} as const;

/** Whether a stress is near its allowable, or over it. */
export function allowableBand(stress: number, allowable: number): 'ok' | 'near' | 'over' {
  const ratio = stress / allowable;
  return ratio > 1 ? 'over' : ratio >= reviewLimits.nearAllowableRatio ? 'near' : 'ok';
}
