import type { LotWire, Operation } from './types';
import { wireMass } from '../springs/helix';

/**
 * Pieces to start so the order survives every operation's scrap: ordered ÷ ∏(1 − scrap_i), rounded up
 * (common trade practice; the scrap rates themselves are shop settings).
 */
export function startQuantity(ordered: number, operations: readonly Operation[]): number {
  let yieldFraction = 1;
  for (const op of operations) yieldFraction *= 1 - op.scrapFraction;
  return Math.ceil(ordered / yieldFraction - 1e-9);
}

/** Wire for the lot: start quantity × developed length, plus the coiler's setup scrap. */
export function lotWire(start: number, wireLengthMm: number, setupScrapMetres: number, d: number, density: number): Omit<LotWire, 'stock'> {
  const metres = (start * wireLengthMm) / 1000 + setupScrapMetres;
  return { startQuantity: start, metres, kg: wireMass(d, metres * 1000, density) };
}
