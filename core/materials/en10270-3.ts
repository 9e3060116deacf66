/** EN 10270-3 stainless spring steel wire: 1.4310 (X10CrNi18-8), normal tensile strength NS. */
import { fahrenheitToC, fromMemory, read, unverified } from './data-helpers';
import type { StrengthRow, WireGrade } from './types';

const STANDARD = 'EN 10270-3';
const LIKE_302 = 'by analogy: 1.4310 taken as the 302 type (ASTM A313)';

// Minimum Rm, MPa, by size band "d ≤ edge", as reprinted by stahlbecker.com; the maximum is min + 15 %.
const bandEdges: readonly (readonly [number, number])[] = [
  [0.2, 2200], [0.3, 2150], [0.4, 2100], [0.5, 2050], [0.65, 2000], [0.8, 1950], [1.0, 1900],
  [1.25, 1850], [1.5, 1800], [1.75, 1750], [2.0, 1700], [2.5, 1650], [3.0, 1600], [3.5, 1550],
  [4.25, 1500], [5.0, 1450], [6.0, 1400], [7.0, 1350], [8.5, 1300], [10.0, 1250],
];
const rows: StrengthRow[] = bandEdges.map(([d, min]) => ({ d, min, max: min * 1.15 }));

const stainless14310: WireGrade = {
  id: 'en10270-3-1.4310',
  name: 'Stainless 1.4310 NS (EN 10270-3)',
  standard: STANDARD,
  family: 'austenitic-stainless',
  diameterRange: { min: 0.2, max: 10, ...read(`${STANDARD} 1.4310 table extent, via stahlbecker.com`) },
  strengthTable: { form: 'bands', rows, ...read(`${STANDARD} 1.4310 NS, via stahlbecker.com`) },
  strengthFits: [],
  moduli: { bands: [{ upToDiameter: Infinity, E: 185000, G: 70000 }], ...fromMemory('EN 13906-1 reference values') },
  density: { value: 7.9, ...fromMemory('EN 10088-1 value for 1.4310') },
  serviceTemperature: { min: -200, max: fahrenheitToC(550), ...unverified(`302 limits (diamondwire.com; min from memory), ${LIKE_302}`) },
  stressRelief: {
    temperature: fahrenheitToC(600), diameterChange: 'opens', minutes: 30,
    ...unverified(`apexspring.com / chinaspringcorp.com stress-relief tables, 302 row (low end of 600–650 °F), ${LIKE_302}`),
  },
  relativeCost: { value: 7.6, ...unverified(`Shigley 9e Table 10-4 302 cost (from memory), ${LIKE_302}`) },
  dynamicGrade: false,
};

export const en10270part3Grades: WireGrade[] = [stainless14310];
