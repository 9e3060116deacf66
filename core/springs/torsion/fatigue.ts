import type { GradeFamily } from '../../materials/types';

/**
 * Maximum recommended bending stress of torsion springs in cyclic use, stress ratio 0, as a fraction of
 * Sut, not peened / peened (Shigley 9e Table 10-10, Associated Spring data, from memory). Rows: music
 * wire and 302 stainless; A230 and A232. Other families have no row.
 */
const rows = {
  'carbon-stainless': { 1e5: [0.53, 0.62], 1e6: [0.5, 0.6] },
  'alloy': { 1e5: [0.55, 0.64], 1e6: [0.53, 0.62] },
} as const;

export const TORSION_FATIGUE_SOURCE = 'Shigley 9e Table 10-10 (Associated Spring data), from memory';

const rowFor: Record<GradeFamily, keyof typeof rows | null> = {
  'cold-drawn-carbon': 'carbon-stainless',
  'austenitic-stainless': 'carbon-stainless',
  'hardened-tempered': 'alloy',
  'non-ferrous': null,
};

/** The fraction of Sut for the cycles (10⁵ column up to 10⁵ cycles, the 10⁶ column beyond), or null without data. */
export function torsionFatigueFraction(family: GradeFamily, cycles: number, peened: boolean): number | null {
  const row = rowFor[family];
  if (row === null) return null;
  const column = cycles <= 1e5 ? rows[row][1e5] : rows[row][1e6];
  return column[peened ? 1 : 0];
}
