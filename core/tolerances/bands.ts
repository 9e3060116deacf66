/**
 * Tables printed as "over X up to Y": a value exactly on an edge belongs to the lower band. The first
 * band also holds its own lower edge when the table's scope starts there (EN 15800: 0.63 ≤ D, 4 ≤ w).
 */
export interface Band {
  over: number;
  upTo: number;
}

/**
 * Values computed from other inputs (D = De − d, w = D/d) miss an edge by rounding noise; within this
 * relative distance they count as on the edge.
 */
const EDGE_TOLERANCE = 1e-9;

const near = (x: number, edge: number): boolean =>
  Math.abs(x - edge) <= EDGE_TOLERANCE * Math.max(1, Math.abs(edge));

/** The band holding x, or undefined outside the table. */
export function findBand<T extends Band>(bands: readonly T[], x: number, firstHoldsLowerEdge: boolean): T | undefined {
  const first = bands[0];
  if (first && firstHoldsLowerEdge && near(x, first.over)) return first;
  return bands.find((b) => (x > b.over && !near(x, b.over)) && (x <= b.upTo || near(x, b.upTo)));
}

/** Bands must run upward without gaps or overlaps. Returns the index of the first bad band, or -1. */
export function firstBandBreak(bands: readonly Band[]): number {
  return bands.findIndex((b, i) => !(b.upTo > b.over) || (i > 0 && b.over !== bands[i - 1]?.upTo));
}
