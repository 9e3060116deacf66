import type { Seating } from '../../spec/compression';

/** EN 13906-1 seating coefficient ν for the buckling check (same values as Shigley 9e Table 10-2 α). */
export const seatingCoefficient: Record<Seating, number> = {
  'both-fixed': 0.5,
  'fixed-hinged': 0.7,
  'both-hinged': 1,
  'fixed-free': 2,
};

/**
 * Theoretical buckling deflection, EN 13906-1 (from memory; algebraically Shigley 9e Eq. 10-10):
 *   sK = L0 · 0.5/(1 − G/E) · [1 − √(1 − (1 − G/E)/(0.5 + G/E) · (πD/(νL0))²)]
 * Returns null when the root's argument is ≤ 0: the spring cannot buckle at any deflection.
 */
export function bucklingDeflection(L0: number, D: number, nu: number, G: number, E: number): number | null {
  const g = G / E;
  const slender = (Math.PI * D) / (nu * L0);
  const arg = 1 - ((1 - g) / (0.5 + g)) * slender * slender;
  if (arg <= 0) return null;
  return ((L0 * 0.5) / (1 - g)) * (1 - Math.sqrt(arg));
}

/** Largest L0/D that cannot buckle: where the root's argument above reaches zero. */
export function slendernessLimit(nu: number, G: number, E: number): number {
  const g = G / E;
  return (Math.PI / nu) * Math.sqrt((1 - g) / (0.5 + g));
}
