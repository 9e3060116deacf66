/**
 * Permitted deviation of the wire diameter (± mm), used for the largest solid length (EN 13906-1 takes the
 * solid length with the wire at its upper tolerance, d_max). Bands of EN 10218-2 class T5 as EN 10270-1
 * uses them; the 0.30–0.50 mm band (±0.008) as reprinted by durofer.ch, the other bands from memory. The
 * ASTM grades print their own, similar tables; these bands stand in for them (from memory).
 */
import type { Sourced } from './types';

/** [upper edge of the band in mm, ± mm]. */
const bands: readonly (readonly [number, number])[] = [
  [0.09, 0.003], [0.17, 0.004], [0.26, 0.005], [0.3, 0.006], [0.5, 0.008], [0.65, 0.01], [0.8, 0.012],
  [1.01, 0.015], [1.78, 0.02], [2.78, 0.025], [4, 0.03], [5.45, 0.035], [7.1, 0.04], [9, 0.045],
  [10, 0.05], [11.1, 0.07], [18, 0.08], [Infinity, 0.09],
];

/** The standard the bands come from, as a job's documents cite it (the source below adds which bands were checked). */
export const WIRE_DIAMETER_TOLERANCE_STANDARD = 'EN 10218-2 class T5 (as used by EN 10270-1)';

export const wireDiameterToleranceSource: Sourced = {
  source: `${WIRE_DIAMETER_TOLERANCE_STANDARD}; 0.30–0.50 mm band via durofer.ch, other bands from memory`,
  verified: false,
};

/** ± deviation of the wire diameter at nominal d (mm). */
export function wireDiameterTolerance(d: number): number {
  for (let i = 0; i < bands.length - 1; i++) if (d <= bands[i]![0]) return bands[i]![1];
  return bands[bands.length - 1]![1];
}
