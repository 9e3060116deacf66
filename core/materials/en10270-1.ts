/** EN 10270-1 patented cold-drawn unalloyed spring steel wire: grades SL, SM, SH (static) and DM, DH (dynamic). */
import { fahrenheitToC, fromMemory, metricRows, read, unverified } from './data-helpers';
import type { Sourced, StrengthFit, StrengthRow, WireGrade } from './types';

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
// 0.30–0.45 mm as reprinted by durofer.ch and hengmingsteelwire.com; 1–5 mm not read.
const shDhRows: StrengthRow[] = [
  { d: 0.3, min: 2660, max: 2940 }, { d: 0.35, min: 2600, max: 2880 },
  { d: 0.4, min: 2560, max: 2830 }, { d: 0.45, min: 2510, max: 2780 },
  { d: 1.0, min: 2230, max: 2470, origin: shDhMemory }, { d: 2.0, min: 1970, max: 2200, origin: shDhMemory },
  { d: 3.0, min: 1840, max: 2040, origin: shDhMemory }, { d: 5.0, min: 1660, max: 1850, origin: shDhMemory },
];
const shDhSource = `${STANDARD} grades SH/DH, via durofer.ch and hengmingsteelwire.com`;

// Above 5 mm no SH/DH row is known. SH/DH lie above SM/DM at every size read, so a power law through the
// SM/DM rows at 5 mm (1460) and 20 mm (1020) is a lower bound; it stays below every SM/DM row between.
const shDhLargeM = Math.log(1460 / 1020) / Math.log(20 / 5);
const shDhLargeFit: StrengthFit = {
  A: 1460 * 5 ** shDhLargeM, m: shDhLargeM, dMin: 5, dMax: 20,
  ...unverified(`${STANDARD} SM/DM rows at 5 and 20 mm, as a lower bound for SH/DH (derived; SH/DH rows above 5 mm not read)`),
};

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
  // No SL rows read: Norton's hard-drawn (A227) fit stands in, SL being sold as the A227 equivalent.
  strengthFits: [{
    A: 1753.3, m: 0.1822, dMin: 0.5, dMax: 16,
    ...unverified(`Norton, Machine Design, Table 13-4 A227 fit (SI row via issuhub.com), by ${ANALOGY}; no SL rows read`),
  }],
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
  strengthFits: [shDhLargeFit],
};

const dh: WireGrade = {
  ...common, ...likeA228,
  id: 'en10270-1-dh', name: 'Spring steel wire DH (EN 10270-1)', dynamicGrade: true,
  diameterRange: range(0.05, 20, scopeFromMemory),
  strengthTable: { form: 'points', rows: [{ d: 0.2, min: 2800, max: 3110 }, ...shDhRows], ...read(shDhSource) },
  strengthFits: [
    // Below the 0.20 mm row its value is held: strength rises as d falls, so this errs low.
    { A: 2800, m: 0, dMin: 0.05, dMax: 0.2, ...unverified(`${STANDARD} DH 0.20 mm row held constant below 0.20 mm (derived)`) },
    shDhLargeFit,
  ],
};

export const en10270part1Grades: WireGrade[] = [sl, sm, dm, sh, dh];
