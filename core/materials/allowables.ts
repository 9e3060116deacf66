/**
 * Allowable static torsional stress as a fraction of the minimum tensile strength, by grade family:
 * before set removal (curvature-corrected stress, KW or KB) and after (Ks only). The "after" values are
 * the low ends of the printed ranges (60–70, 65–75, 55–65 %).
 */
import type { GradeFamily } from './types';

export interface StaticAllowable {
  beforeSetRemoval: number;
  afterSetRemoval: number;
  source: string;
}

const T10_6 = 'Shigley 9e Table 10-6';

export const staticAllowables: Readonly<Record<GradeFamily, Readonly<StaticAllowable>>> = Object.freeze({
  'cold-drawn-carbon': Object.freeze({
    beforeSetRemoval: 0.45, afterSetRemoval: 0.6,
    source: `${T10_6}, music wire and cold-drawn carbon steel (45 % confirmed by the book's worked solutions; 60 % from memory)`,
  }),
  'hardened-tempered': Object.freeze({
    beforeSetRemoval: 0.5, afterSetRemoval: 0.65,
    source: `${T10_6}, hardened and tempered carbon and low-alloy steel, from memory`,
  }),
  'austenitic-stainless': Object.freeze({
    beforeSetRemoval: 0.35, afterSetRemoval: 0.55,
    source: `${T10_6}, austenitic stainless steels, from memory`,
  }),
  'non-ferrous': Object.freeze({
    beforeSetRemoval: 0.35, afterSetRemoval: 0.55,
    source: `${T10_6}, nonferrous alloys, from memory`,
  }),
});
