import type { CompressionEnds } from '../../spec/compression';

/**
 * End types of compression springs. Machinery's Handbook 31e, Spring Design, Table 3 "Formulas for
 * Compression Springs" (the same table as Shigley 9e Table 10-1):
 *
 * | ends          | Nt − Na | solid length | pitch p          |
 * | open          | 0       | d(Nt + 1)    | (L0 − d)/Na      |
 * | open-ground   | 1       | d·Nt         | L0/(Na + 1)      |
 * | closed        | 2       | d(Nt + 1)    | (L0 − 3d)/Na     |
 * | closed-ground | 2       | d·Nt         | (L0 − 2d)/Na     |
 */
export interface EndForm {
  inactiveCoils: number;
  ground: boolean;
  /** Solid length in wire diameters: Nt + solidExtra. */
  solidExtra: number;
  /**
   * Largest solid length in upper-tolerance wire diameters: Nt + maximumSolidExtra. EN 13906-1, cold coiled
   * (from memory): closed and ground Lc ≤ nt·d_max, closed not ground Lc ≤ (nt + 1.5)·d_max. The standard
   * covers closed ends only; open ends keep the handbook's form on d_max.
   */
  maximumSolidExtra: number;
  maximumSolidSource: string;
  pitch(L0: number, d: number, na: number): number;
}

const HANDBOOK_MAX = 'Machinery\'s Handbook 31e Table 3 form on d_max (EN 13906-1 gives closed ends only)';
const EN_MAX = 'EN 13906-1 maximum solid length, cold coiled, from memory:';

export const endForms: Record<CompressionEnds, EndForm> = {
  open: { inactiveCoils: 0, ground: false, solidExtra: 1, maximumSolidExtra: 1, maximumSolidSource: HANDBOOK_MAX, pitch: (L0, d, na) => (L0 - d) / na },
  'open-ground': { inactiveCoils: 1, ground: true, solidExtra: 0, maximumSolidExtra: 0, maximumSolidSource: HANDBOOK_MAX, pitch: (L0, _d, na) => L0 / (na + 1) },
  closed: { inactiveCoils: 2, ground: false, solidExtra: 1, maximumSolidExtra: 1.5, maximumSolidSource: `${EN_MAX} (nt + 1.5)·d_max`, pitch: (L0, d, na) => (L0 - 3 * d) / na },
  'closed-ground': { inactiveCoils: 2, ground: true, solidExtra: 0, maximumSolidExtra: 0, maximumSolidSource: `${EN_MAX} nt·d_max`, pitch: (L0, d, na) => (L0 - 2 * d) / na },
};

export function solidLength(ends: CompressionEnds, d: number, nt: number): number {
  return d * (nt + endForms[ends].solidExtra);
}

/** Largest solid length with the wire at its upper tolerance d_max (see `maximumSolidExtra`). */
export function maximumSolidLength(ends: CompressionEnds, dMax: number, nt: number): number {
  return dMax * (nt + endForms[ends].maximumSolidExtra);
}
