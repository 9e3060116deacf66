/**
 * EN 10270-2 oil-hardened and tempered spring steel wire. Families by duty: FD static, TD medium fatigue,
 * VD high fatigue (valve-spring quality). Grades here: FDC, FDSiCr, TDSiCr and VDSiCr.
 *
 * The standard prints the strength by diameter band ("0.50 ≤ d ≤ 0.70"). The 0.50–0.70 mm band was read (as
 * reprinted by metalleschmidt.de: FDC 1900–2100, FDSiCr 2100–2300, TDSiCr/VDSiCr 2080–2230 MPa); the bands
 * above 0.70 mm are entered from memory of the standard's table, each row marked so.
 */
import { fahrenheitToC, fromMemory, read, unverified } from './data-helpers';
import type { GradeFamily, Sourced, StrengthRow, WireGrade } from './types';

const STANDARD = 'EN 10270-2';
const READ_BAND = `${STANDARD}, 0.50–0.70 mm band via metalleschmidt.de`;
const FDC_LIKE = 'analogy: FDC ≈ ASTM A229 (metalleschmidt.de)';
const SICR_LIKE = 'analogy: FDSiCr ≈ ASTM A401, VDSiCr ≈ ASTM A877 (metalleschmidt.de), the chrome-silicon alloy';
const STRESS_RELIEF = 'apexspring.com / chinaspringcorp.com stress-relief tables';

/** Upper band edges in mm, shared by the grades' columns below. */
const edges = [0.7, 0.8, 1, 1.3, 1.4, 1.6, 2, 2.5, 2.7, 3, 3.2, 3.5, 4.2, 4.5, 4.7, 5, 5.6, 6, 6.5, 7, 8, 8.5, 10, 12, 14, 15, 17];

/** Rows of one grade's column: [min, max] per band edge; the first band was read, the others are from memory. */
function bands(grade: string, column: readonly (readonly [number, number])[]): StrengthRow[] {
  const memory: Sourced = fromMemory(`${STANDARD} grade ${grade}`);
  return column.map(([min, max], i) => (i === 0 ? { d: edges[i]!, min, max } : { d: edges[i]!, min, max, origin: memory }));
}

const fdcColumn = [
  [1900, 2100], [1900, 2100], [1850, 2050], [1800, 2000], [1760, 1960], [1740, 1940], [1720, 1870], [1670, 1820],
  [1640, 1790], [1620, 1770], [1600, 1750], [1580, 1730], [1550, 1700], [1540, 1690], [1520, 1670], [1510, 1660],
  [1470, 1620], [1460, 1610], [1440, 1590], [1430, 1580], [1400, 1550], [1380, 1530], [1360, 1510], [1320, 1470],
  [1280, 1430], [1270, 1420], [1250, 1400],
] as const;

const fdSiCrColumn = [
  [2100, 2300], [2100, 2300], [2100, 2300], [2100, 2250], [2050, 2200], [2050, 2200], [2050, 2200], [2000, 2150],
  [2000, 2150], [2000, 2150], [1950, 2100], [1950, 2100], [1950, 2100], [1900, 2050], [1900, 2050], [1900, 2050],
  [1850, 2000], [1850, 2000], [1800, 1950], [1800, 1950], [1750, 1900], [1700, 1850], [1700, 1850], [1650, 1800],
  [1600, 1750], [1600, 1750], [1550, 1700],
] as const;

// TD and VD chrome-silicon share one column up to 10 mm.
const tdVdSiCrColumn = [
  [2080, 2230], [2080, 2230], [2080, 2230], [2080, 2230], [2010, 2160], [2010, 2160], [2010, 2160], [1960, 2100],
  [1960, 2100], [1960, 2100], [1910, 2060], [1910, 2060], [1910, 2060], [1860, 2010], [1860, 2010], [1860, 2010],
  [1810, 1960], [1810, 1960], [1760, 1910], [1760, 1910], [1710, 1860], [1670, 1810], [1670, 1810],
] as const;

const common = {
  standard: STANDARD,
  family: 'hardened-tempered' as GradeFamily,
  moduli: { bands: [{ upToDiameter: Infinity, E: 206000, G: 79500 }], ...fromMemory('EN 13906-1 reference values') },
  density: { value: 7.85, ...fromMemory('same steel density as EN 10270-1') },
};

const range = (max: number): WireGrade['diameterRange'] => ({ min: 0.5, max, ...fromMemory(`${STANDARD} scope`) });
const table = (grade: string, column: readonly (readonly [number, number])[]): WireGrade['strengthTable'] =>
  ({ form: 'bands', rows: bands(grade, column), ...read(READ_BAND) });

const fdc: WireGrade = {
  ...common,
  id: 'en10270-2-fdc', name: 'Oil-tempered wire FDC (EN 10270-2)', dynamicGrade: false,
  diameterRange: range(17),
  strengthTable: table('FDC', fdcColumn),
  strengthFits: [],
  serviceTemperature: { min: 0, max: 180, ...unverified(`ASTM A229 limits (Shigley 9e Table 10-3), by ${FDC_LIKE}`) },
  stressRelief: { temperature: fahrenheitToC(500), diameterChange: 'closes', minutes: 30, ...unverified(`${STRESS_RELIEF}, A229 row, by ${FDC_LIKE}`) },
  relativeCost: { value: 1.3, ...unverified(`Shigley 9e Table 10-4 A229 cost (from memory), by ${FDC_LIKE}`) },
};

const siCr = {
  ...common,
  serviceTemperature: {
    min: -40, max: fahrenheitToC(475), ...unverified(`ASTM A401 limits (diamondwire.com; min from memory), by ${SICR_LIKE}`),
  },
  stressRelief: { temperature: fahrenheitToC(800), diameterChange: 'closes' as const, minutes: 30, ...unverified(`${STRESS_RELIEF}, A401 row, by ${SICR_LIKE}`) },
  relativeCost: { value: 4.0, ...unverified(`Shigley 9e Table 10-4 A401 cost (from memory), by ${SICR_LIKE}`) },
  strengthFits: [],
};

const fdSiCr: WireGrade = {
  ...siCr,
  id: 'en10270-2-fdsicr', name: 'Oil-tempered wire FDSiCr (EN 10270-2)', dynamicGrade: false,
  diameterRange: range(17),
  strengthTable: table('FDSiCr', fdSiCrColumn),
};

const tdSiCr: WireGrade = {
  ...siCr,
  id: 'en10270-2-tdsicr', name: 'Oil-tempered wire TDSiCr, medium fatigue (EN 10270-2)', dynamicGrade: true,
  diameterRange: range(10),
  strengthTable: table('TDSiCr', tdVdSiCrColumn),
};

const vdsicr: WireGrade = {
  ...siCr,
  id: 'en10270-2-vdsicr', name: 'Oil-tempered valve-spring wire VDSiCr (EN 10270-2)', dynamicGrade: true,
  diameterRange: range(10),
  strengthTable: table('VDSiCr', tdVdSiCrColumn),
};

export const en10270part2Grades: WireGrade[] = [fdc, fdSiCr, tdSiCr, vdsicr];
