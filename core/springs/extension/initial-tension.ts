/**
 * Preferred range of the uncorrected initial-tension stress for an index C, a curve fit to spring-maker
 * data: τi = 231/exp(0.105·C) ± 6.9·(4 − (C − 3)/6.5) MPa (Shigley 9e §10-11, from memory; the inch form
 * 33 500/exp(0.105·C) ± 1000·(4 − (C − 3)/6.5) psi is the same curve). The fit covers about 4 ≤ C ≤ 16.
 */
export function initialTensionStressRange(c: number): { min: number; centre: number; max: number } {
  const centre = 231 / Math.exp(0.105 * c);
  const half = 6.9 * (4 - (c - 3) / 6.5);
  return { min: centre - half, centre, max: centre + half };
}
