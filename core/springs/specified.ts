/** The trade's default tolerance on a specified force or torque when the drawing gives none (common trade practice: ±10 %). */
export const DEFAULT_LOAD_TOLERANCE_PERCENT = 10;

export interface SpecifiedCheck {
  specified: number | null;
  tolerancePercent: number | null;
  withinTolerance: boolean | null;
}

/** Compares a computed force or torque with what the drawing asks for (null when it asks for nothing). */
export function checkSpecified(actual: number, specified: number | undefined, tolerancePercent: number | undefined): SpecifiedCheck {
  if (specified === undefined) return { specified: null, tolerancePercent: null, withinTolerance: null };
  const tolerance = tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT;
  // A relative epsilon keeps a value exactly on the limit inside it despite rounding in unit conversion.
  const within = Math.abs(actual - specified) <= ((specified * tolerance) / 100) * (1 + 1e-9);
  return { specified, tolerancePercent: tolerance, withinTolerance: within };
}
