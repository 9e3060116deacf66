import type { MaterialPrice } from '../settings/schema';

/** The newest price for the grade whose diameter band takes the wire. */
export function wirePrice(prices: readonly MaterialPrice[], grade: string, d: number): MaterialPrice | null {
  let best: MaterialPrice | null = null;
  for (const p of prices) {
    if (p.grade !== grade || d < p.dMin || d > p.dMax) continue;
    if (best === null || p.date > best.date) best = p;
  }
  return best;
}
