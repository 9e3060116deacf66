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
    source: `${T10_6}, music wire and cold-drawn carbon steel (45 % and 60 % from memory)`,
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

/**
 * Extension springs, static, set not removed, after low-temperature heat treatment: % of Sut for the
 * body (torsion), the hook's torsion section B and its bending section A (Shigley 9e Table 10-7, from
 * memory; hook values 40–45 % / 75 % confirmed by a spring maker's page). Body takes the low end of 45–50 %.
 */
export interface ExtensionAllowable {
  body: number;
  hookTorsion: number;
  hookBending: number;
  source: string;
}

const T10_7 = 'Shigley 9e Table 10-7, from memory';
const steelExtension = Object.freeze({ body: 0.45, hookTorsion: 0.4, hookBending: 0.75, source: `${T10_7}, carbon and low-alloy steels` });
const softExtension = Object.freeze({ body: 0.35, hookTorsion: 0.3, hookBending: 0.55, source: `${T10_7}, austenitic stainless and nonferrous` });

export const extensionAllowables: Readonly<Record<GradeFamily, Readonly<ExtensionAllowable>>> = Object.freeze({
  'cold-drawn-carbon': steelExtension,
  'hardened-tempered': steelExtension,
  'austenitic-stainless': softExtension,
  'non-ferrous': softExtension,
});

/** Torsion springs, static bending yield as a fraction of Sut (Shigley 9e Eq. 10-57, from memory; 0.87 confirmed by a secondary page). */
export const torsionAllowables: Readonly<Record<GradeFamily, Readonly<{ bending: number; source: string }>>> = Object.freeze({
  'cold-drawn-carbon': Object.freeze({ bending: 0.78, source: 'Shigley 9e Eq. 10-57, music wire and cold-drawn carbon, from memory' }),
  'hardened-tempered': Object.freeze({ bending: 0.87, source: 'Shigley 9e Eq. 10-57, hardened and tempered carbon and low-alloy' }),
  'austenitic-stainless': Object.freeze({ bending: 0.61, source: 'Shigley 9e Eq. 10-57, austenitic stainless, from memory' }),
  'non-ferrous': Object.freeze({ bending: 0.61, source: 'Shigley 9e Eq. 10-57, nonferrous, from memory' }),
});

/**
 * Torsion springs loaded to unwind the body: the coiling residual stresses work against the load, so the
 * bending allowable is taken at 0.8 of the usual (the ratio of the "stress relieved" to the "favourable residual
 * stress" columns of the Associated Spring static table for torsion springs, 80 % / 100 %; from memory).
 */
export const TORSION_UNWIND_FACTOR = 0.8;
export const TORSION_UNWIND_SOURCE = 'loaded to unwind: 0.8 × (Associated Spring static torsion table, stress relieved ÷ favourable residual stress, from memory)';

/** EN 13906-2: permissible static torsional stress of extension springs ≈ 0.45·Rm (aabag.de; EN from memory). */
export const EN_EXTENSION_STATIC_FRACTION = 0.45;
/** EN 13906-3: permissible static bending stress of cold-coiled torsion springs ≈ 0.7·Rm (from memory). */
export const EN_TORSION_STATIC_FRACTION = 0.7;

/**
 * EN 13906-1: permissible uncorrected torsional stress at solid length of cold-coiled compression springs,
 * τc,zul ≈ 0.56·Rm (from memory; the standard reads it off material figures).
 */
export const EN_COMPRESSION_SOLID_FRACTION = 0.56;
export const EN_COMPRESSION_SOLID_SOURCE = 'EN 13906-1, permissible stress at solid τc,zul ≈ 0.56·Rm on the uncorrected stress, from memory';
