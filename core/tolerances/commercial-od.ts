/**
 * North-American trade ("commercial") OD tolerance for compression and extension springs, by wire size
 * and index. Kept in inches as printed; inputs and results are mm.
 */
import { MM_PER_IN } from '../units';
import type { Interpolation } from './grid';
import { axisWeights, combine } from './grid';
import type { Lookup } from './lookup';
import { checkPositive, found, notFound } from './lookup';

export const commercialOdTable = {
  source: 'trade OD-tolerance table as reprinted by katyspring.com (extension-spring blog); ' +
    'the d = 0.035 in, index 10 cell also quoted by jobshop.com; common trade practice (SMI-style)',
  verified: false,
  /** Interpolation between rows and columns is customary (common trade practice). */
  defaultInterpolation: 'linear' as Interpolation,
  wireInches: [0.015, 0.023, 0.035, 0.051, 0.076, 0.114, 0.171, 0.250, 0.375, 0.500],
  indexes: [4, 6, 8, 10, 12, 14, 16],
  /** ± in; one row per wire size, one column per index. */
  plusMinusInches: [
    [0.002, 0.002, 0.003, 0.004, 0.005, 0.006, 0.007],
    [0.002, 0.003, 0.004, 0.006, 0.007, 0.008, 0.010],
    [0.002, 0.004, 0.006, 0.007, 0.009, 0.011, 0.013],
    [0.003, 0.005, 0.007, 0.010, 0.012, 0.015, 0.017],
    [0.004, 0.007, 0.010, 0.013, 0.016, 0.019, 0.022],
    [0.006, 0.009, 0.013, 0.018, 0.021, 0.025, 0.029],
    [0.008, 0.012, 0.017, 0.023, 0.028, 0.033, 0.038],
    [0.011, 0.015, 0.021, 0.028, 0.035, 0.042, 0.049],
    [0.016, 0.020, 0.026, 0.037, 0.046, 0.054, 0.064],
    [0.021, 0.030, 0.040, 0.062, 0.080, 0.100, 0.125],
  ],
} as const;

/** OD tolerance (± mm) for wire d (mm) and index w = D/d, read as the shop's interpolation setting says. */
export function commercialOdTolerance(input: { d: number; index: number; interpolation?: Interpolation }): Lookup<number> {
  const { d, index, interpolation = commercialOdTable.defaultInterpolation } = input;
  const bad = checkPositive({ d, index });
  if (bad) return bad;
  const t = commercialOdTable;
  const rows = axisWeights(t.wireInches, d / MM_PER_IN, interpolation);
  if (!rows) {
    return notFound('outside-table', 'd', `wire ${(d / MM_PER_IN).toFixed(4)} in is outside the trade OD table ` +
      `(${t.wireInches[0]}–${t.wireInches[t.wireInches.length - 1]} in): the OD tolerance is by agreement`);
  }
  const cols = axisWeights(t.indexes, index, interpolation);
  if (!cols) {
    return notFound('outside-table', 'index',
      `index ${index} is outside the trade OD table (4–16): the OD tolerance is by agreement`);
  }
  const inches = combine([rows, cols])
    .reduce((sum, c) => sum + c.weight * (t.plusMinusInches[c.nodes[0] as number]?.[c.nodes[1] as number] ?? NaN), 0);
  return found(inches * MM_PER_IN, t);
}
