/**
 * Wire grades as data. Every table carries where it came from and whether it has been checked against
 * the printed standard (`verified`). Internal units: mm, MPa, kg/dm³ (= g/cm³), °C, minutes.
 */
export interface Sourced {
  /** Standard + clause/table, or book + edition + table, or "common trade practice", or "from memory". */
  source: string;
  verified: boolean;
}

/** How grades are grouped for allowable-stress classes (handbook table 10-6 classes). */
export type GradeFamily = 'cold-drawn-carbon' | 'hardened-tempered' | 'austenitic-stainless' | 'non-ferrous';

/** Minimum (and where printed, maximum) tensile strength at a nominal wire diameter. */
export interface StrengthRow {
  d: number;
  min: number;
  max?: number;
  /** Set only on a row whose origin differs from its table's, e.g. a from-memory row in a reprinted table. */
  origin?: Sourced;
}

export interface StrengthTable extends Sourced {
  /**
   * "points": rows are nominal sizes; values between rows are interpolated linearly in d.
   * "bands": each row's d is the upper edge of a size band ("d ≤ 0.20 mm: 2200"); the value is stepped.
   */
  form: 'points' | 'bands';
  rows: StrengthRow[];
}

/** Sut = A / d^m (d in mm, Sut in MPa), valid over [dMin, dMax]. */
export interface StrengthFit extends Sourced {
  A: number;
  m: number;
  dMin: number;
  dMax: number;
  /** For a fit from an inch table: the constants as printed (A in kpsi·in^m, d in in) and the metric A printed beside them. */
  inch?: { A: number; dMin: number; dMax: number; printedMetricA?: number };
}

/** Elastic moduli; `upToDiameter` is the upper edge of the band (Infinity for "all sizes"). */
export interface ModulusBand {
  upToDiameter: number;
  E: number;
  G: number;
}

export interface WireGrade {
  id: string;
  name: string;
  standard: string;
  family: GradeFamily;
  /** Sizes the grade is made in (mm). A spec outside gives an error finding. */
  diameterRange: { min: number; max: number } & Sourced;
  strengthTable?: StrengthTable;
  strengthFits: StrengthFit[];
  moduli: { bands: ModulusBand[] } & Sourced;
  density: { value: number } & Sourced;
  serviceTemperature: { min: number; max: number } & Sourced;
  /**
   * Stress-relief temperature and time at temperature; `diameterChange` is which way the coil diameter
   * moves in the oven, a coiler set-up allowance (spring makers' published stress-relief tables, e.g.
   * apexspring.com "Stress relief vs heat treat"; common trade practice; see docs/sources.md).
   */
  stressRelief: { temperature: number; minutes: number; diameterChange: DiameterChange } & Sourced;
  /** Cost per kg relative to hard-drawn carbon steel (= 1.0). */
  relativeCost: { value: number } & Sourced;
  /** Suitable for cyclic duty without qualification (e.g. EN 10270-1 D grades, valve-spring quality). */
  dynamicGrade: boolean;
}

export type DiameterChange = 'closes' | 'opens' | 'unknown';

export type StrengthBasis = 'table' | 'fit' | 'override';

/** Everything the engine needs about one grade at one diameter, after any mill-certificate overrides. */
export interface WireProperties {
  gradeId: string;
  gradeName: string;
  family: GradeFamily;
  d: number;
  tensileStrength: number;
  tensileStrengthMax: number | null;
  tensileStrengthBasis: StrengthBasis;
  tensileStrengthSource: string;
  elasticModulus: number;
  shearModulus: number;
  density: number;
  serviceTemperature: { min: number; max: number };
  /** Allowable static torsion as a fraction of tensile strength (handbook table 10-6 classes). */
  allowableStaticFraction: { beforeSetRemoval: number; afterSetRemoval: number; source: string };
  stressRelief: { temperature: number; minutes: number; diameterChange: DiameterChange };
  relativeCost: number;
  dynamicGrade: boolean;
}

export interface MaterialOverrides {
  shearModulus?: number;
  elasticModulus?: number;
  tensileStrength?: number;
  density?: number;
}
