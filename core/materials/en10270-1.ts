/** EN 10270-1 patented cold-drawn unalloyed spring steel wire: grades SL, SM, SH (static) and DM, DH (dynamic). */
import { fahrenheitToC, fromMemory, metricRows, read, unverified } from './data-helpers';
import type { Sourced, StrengthRow, WireGrade } from './types';

const STANDARD = 'EN 10270-1';
const ANALOGY = 'analogy (grade equivalents on hengmingsteelwire.com and vinco.es)';
const STRESS_RELIEF = 'apexspring.com / chinaspringcorp.com stress-relief tables';

// Rm min–max, MPa, as reprinted by mollificiomodenese.it. The reprint's 1.0 mm max (2250) differs from the
// 2200 remembered; the printed value is kept. Its 15.0 mm row "1160–1260" is omitted as a probable misprint.
const smDmRows = metricRows([
  [0.3, 2370, 2650], [0.5, 2200, 2470], [0.8, 2050, 2300], [1.0, 1980, 2250], [1.5, 1850, 2080],
  [2.0, 1760, 1970], [2.5, 1690, 1890], [3.0, 1630, 1830], [4.0, 1530, 1730], [5.0, 1460, 1650],
  [6.0, 1400, 1580], [8.0, 1310, 1480], [10.0, 1240, 1400], [12.0, 1180, 1340], [16.0, 1090, 1230],
  [20.0, 1020, 1150],
]);

const shDhMemory = fromMemory(`${STANDARD} grades SH/DH`);
// 0.30–0.45 mm as reprinted by durofer.ch and hengmingsteelwire.com; the rows from 0.50 to 20 mm were not read
// and are entered from memory of the standard's SH/DH column (each carries its origin).
const shDhMemoryRows: [number, number, number][] = [
  [0.5, 2480, 2740], [0.6, 2410, 2670], [0.7, 2360, 2610], [0.8, 2310, 2560], [0.9, 2270, 2510], [1.0, 2230, 2470],
  [1.2, 2170, 2400], [1.4, 2110, 2340], [1.6, 2060, 2290], [1.8, 2020, 2240], [2.0, 1970, 2200], [2.5, 1900, 2110],
  [3.0, 1840, 2040], [3.5, 1790, 1980], [4.0, 1740, 1930], [4.5, 1700, 1890], [5.0, 1660, 1850], [5.5, 1620, 1800],
  [6.0, 1590, 1770], [6.5, 1570, 1750], [7.0, 1540, 1720], [7.5, 1510, 1690], [8.0, 1490, 1670], [8.5, 1470, 1650],
  [9.0, 1450, 1630], [9.5, 1430, 1610], [10.0, 1410, 1590], [11.0, 1380, 1550], [12.0, 1350, 1530], [13.0, 1330, 1500],
  [14.0, 1300, 1460], [15.0, 1280, 1440], [16.0, 1260, 1420], [17.0, 1240, 1390], [18.0, 1220, 1370], [19.0, 1190, 1340],
  [20.0, 1180, 1320],
];
const shDhRows: StrengthRow[] = [
  { d: 0.3, min: 2660, max: 2940 }, { d: 0.35, min: 2600, max: 2880 },
  { d: 0.4, min: 2560, max: 2830 }, { d: 0.45, min: 2510, max: 2780 },
  ...shDhMemoryRows.map(([d, min, max]) => ({ d, min, max, origin: shDhMemory })),
];
const shDhSource = `${STANDARD} grades SH/DH, via durofer.ch and hengmingsteelwire.com`;

// SL: no rows read; the standard's SL column (1–10 mm) from memory.
const slRows = metricRows([
  [1.0, 1720, 1970], [1.5, 1620, 1860], [2.0, 1520, 1750], [2.5, 1460, 1680], [3.0, 1410, 1620], [3.5, 1360, 1570],
  [4.0, 1320, 1520], [4.5, 1290, 1490], [5.0, 1260, 1450], [5.5, 1230, 1420], [6.0, 1210, 1390], [7.0, 1160, 1340],
  [8.0, 1120, 1300], [9.0, 1090, 1260], [10.0, 1060, 1230],
]);

const common = {
  standard: STANDARD,
  family: 'cold-drawn-carbon' as const,
  // EN 13906-1 reference values for EN 10270-1 wire, confirmed on mollificiomodenese.it.
  moduli: { bands: [{ upToDiameter: Infinity, E: 206000, G: 81500 }], ...read('EN 13906-1, via mollificiomodenese.it') },
  density: { value: 7.85, ...read('mollificiomodenese.it (EN 10270-1 SM)') },
  serviceTemperature: { min: -30, max: 100, ...read('mollificiomodenese.it (EN 10270-1 SM)') },
};

// SL and SM are sold as the equivalent of ASTM A227, SH and DH of A228; process and cost follow those.
const likeA227 = {
  stressRelief: { temperature: fahrenheitToC(550), diameterChange: 'closes' as const, minutes: 20, ...unverified(`${STRESS_RELIEF}, A227 row, by ${ANALOGY}`) },
  relativeCost: { value: 1.0, ...unverified(`Shigley 9e Table 10-4 A227 cost (from memory), by ${ANALOGY}`) },
};
const likeA228 = {
  stressRelief: { temperature: fahrenheitToC(500), diameterChange: 'closes' as const, minutes: 30, ...unverified(`${STRESS_RELIEF}, A228 row, by ${ANALOGY}`) },
  relativeCost: { value: 2.6, ...unverified(`Shigley 9e Table 10-4 A228 cost (from memory), by ${ANALOGY}`) },
};

const range = (min: number, max: number, src: Sourced): WireGrade['diameterRange'] => ({ min, max, ...src });
const scopeFromMemory = fromMemory(`${STANDARD} scope`);
const smDmTable = (grade: string): WireGrade['strengthTable'] =>
  ({ form: 'points', rows: smDmRows, ...read(`${STANDARD} grade ${grade}, via mollificiomodenese.it`) });
const smDmRange = range(0.3, 20, read(`${STANDARD} SM/DM table extent, via mollificiomodenese.it`));

const sl: WireGrade = {
  ...common, ...likeA227,
  id: 'en10270-1-sl', name: 'Spring steel wire SL (EN 10270-1)', dynamicGrade: false,
  diameterRange: range(1, 10, scopeFromMemory),
  strengthTable: { form: 'points', rows: slRows, ...fromMemory(`${STANDARD} grade SL`) },
  strengthFits: [],
};

const sm: WireGrade = {
  ...common, ...likeA227,
  id: 'en10270-1-sm', name: 'Spring steel wire SM (EN 10270-1)', dynamicGrade: false,
  diameterRange: smDmRange, strengthTable: smDmTable('SM'), strengthFits: [],
};

const dm: WireGrade = {
  ...common, ...likeA227,
  id: 'en10270-1-dm', name: 'Spring steel wire DM (EN 10270-1)', dynamicGrade: true,
  diameterRange: smDmRange, strengthTable: smDmTable('DM'), strengthFits: [],
};

const sh: WireGrade = {
  ...common, ...likeA228,
  id: 'en10270-1-sh', name: 'Spring steel wire SH (EN 10270-1)', dynamicGrade: false,
  diameterRange: range(0.3, 20, scopeFromMemory),
  strengthTable: { form: 'points', rows: shDhRows, ...read(shDhSource) },
  strengthFits: [],
};

const dh: WireGrade = {
  ...common, ...likeA228,
  id: 'en10270-1-dh', name: 'Spring steel wire DH (EN 10270-1)', dynamicGrade: true,
  diameterRange: range(0.05, 20, scopeFromMemory),
  strengthTable: { form: 'points', rows: [{ d: 0.2, min: 2800, max: 3110 }, ...shDhRows], ...read(shDhSource) },
  strengthFits: [
    // Below the 0.20 mm row its value is held: strength rises as d falls, so this errs low.
    { A: 2800, m: 0, dMin: 0.05, dMax: 0.2, ...unverified(`${STANDARD} DH 0.20 mm row held constant below 0.20 mm (derived)`) },
  ],
};

export const en10270part1Grades: WireGrade[] = [sl, sm, dm, sh, dh];
