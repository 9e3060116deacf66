/** EN 10270-2 oil-hardened and tempered spring steel wire: FDC (static) and VDSiCr (valve-spring). */
import { fahrenheitToC, fromMemory, metricRows, read, unverified } from './data-helpers';
import type { GradeFamily, WireGrade } from './types';

const STANDARD = 'EN 10270-2';
const ROWS = `${STANDARD}, via metalleschmidt.de (0.50–0.70 mm only)`;
const FDC_LIKE = 'analogy: FDC ≈ ASTM A229 (metalleschmidt.de)';
const VDSICR_LIKE = 'analogy: VDSiCr ≈ ASTM A877 (metalleschmidt.de), the valve-spring quality of the A401 alloy';
const STRESS_RELIEF = 'apexspring.com / chinaspringcorp.com stress-relief tables';

const common = {
  standard: STANDARD,
  family: 'hardened-tempered' as GradeFamily,
  moduli: { bands: [{ upToDiameter: Infinity, E: 206000, G: 79500 }], ...fromMemory('EN 13906-1 reference values') },
  density: { value: 7.85, ...fromMemory('same steel density as EN 10270-1') },
};

const range = (max: number): WireGrade['diameterRange'] => ({ min: 0.5, max, ...fromMemory(`${STANDARD} scope`) });

// Above 0.70 mm no row is known. The fallback keeps the exponent of the equivalent ASTM grade's fit and scales
// A so the curve meets the 0.70 mm row: no step at 0.70 mm, and it errs low against the unscaled fit.
const fdc: WireGrade = {
  ...common,
  id: 'en10270-2-fdc', name: 'Oil-tempered wire FDC (EN 10270-2)', dynamicGrade: false,
  diameterRange: range(17),
  strengthTable: { form: 'points', rows: metricRows([[0.5, 1900, 2100], [0.7, 1900, 2100]]), ...read(ROWS) },
  strengthFits: [{
    A: 1900 * 0.7 ** 0.1833, m: 0.1833, dMin: 0.7, dMax: 17,
    ...unverified(`derived: Norton Table 13-4 A229 exponent (SI row via issuhub.com) through the 0.70 mm row, by ${FDC_LIKE}`),
  }],
  serviceTemperature: { min: 0, max: 180, ...unverified(`ASTM A229 limits (Shigley 9e Table 10-3), by ${FDC_LIKE}`) },
  stressRelief: { temperature: fahrenheitToC(500), diameterChange: 'closes', minutes: 30, ...unverified(`${STRESS_RELIEF}, A229 row, by ${FDC_LIKE}`) },
  relativeCost: { value: 1.3, ...unverified(`Shigley 9e Table 10-4 A229 cost (from memory), by ${FDC_LIKE}`) },
};

const vdsicr: WireGrade = {
  ...common,
  id: 'en10270-2-vdsicr', name: 'Oil-tempered valve-spring wire VDSiCr (EN 10270-2)', dynamicGrade: true,
  diameterRange: range(10),
  strengthTable: { form: 'points', rows: metricRows([[0.5, 2080, 2230], [0.7, 2080, 2230]]), ...read(ROWS) },
  strengthFits: [{
    A: 2080 * 0.7 ** 0.108, m: 0.108, dMin: 0.7, dMax: 10,
    ...unverified(`derived: Shigley 9e Table 10-4 A401 exponent (from memory) through the 0.70 mm row, by ${VDSICR_LIKE}`),
  }],
  serviceTemperature: {
    min: -40, max: fahrenheitToC(475), ...unverified(`ASTM A401 limits (diamondwire.com; min from memory), by ${VDSICR_LIKE}`),
  },
  stressRelief: { temperature: fahrenheitToC(800), diameterChange: 'closes', minutes: 30, ...unverified(`${STRESS_RELIEF}, A401 row, by ${VDSICR_LIKE}`) },
  relativeCost: { value: 4.0, ...unverified(`Shigley 9e Table 10-4 A401 cost (from memory), by ${VDSICR_LIKE}`) },
};

export const en10270part2Grades: WireGrade[] = [fdc, vdsicr];
