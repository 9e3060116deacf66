/** ASTM stainless and copper-alloy spring wires: A313 type 302, A313 type 631 (17-7 PH), B159, B197. */
import { fahrenheitToC, fromMemory, inchFit, inToMm, lbPerIn3ToGPerCm3, read, unverified } from './data-helpers';
import type { ModulusBand, Sourced, WireGrade } from './types';

const T10_4 = 'Shigley 9e Table 10-4';
const T10_5 = 'Shigley 9e Table 10-5';
const STRESS_RELIEF = 'apexspring.com and chinaspringcorp.com stress-relief tables (agree)';
const MAKER_TABLES = 'diamondwire.com / optimumspring.com material tables';

const band = (E: number, G: number): { bands: ModulusBand[] } & Sourced =>
  ({ bands: [{ upToDiameter: Infinity, E: E * 1000, G: G * 1000 }], ...fromMemory(`${T10_5} (GPa)`) });
const cost = (value: number, note = ''): { value: number } & Sourced =>
  ({ value, ...fromMemory(`${T10_4} relative cost column${note}`) });
const fitRange = (minIn: number, maxIn: number): WireGrade['diameterRange'] =>
  ({ min: inToMm(minIn), max: inToMm(maxIn), ...fromMemory(`size range of the ${T10_4} fits (standard's own range not read)`) });
const tradeRange = (minIn: number, maxIn: number): WireGrade['diameterRange'] =>
  ({ min: inToMm(minIn), max: inToMm(maxIn), ...fromMemory('size range in spring makers\' material tables') });

const stainless302: WireGrade = {
  id: 'astm-a313-302',
  name: 'Stainless 302 (ASTM A313)',
  standard: 'ASTM A313',
  family: 'austenitic-stainless',
  diameterRange: fitRange(0.013, 0.4),
  strengthFits: [
    inchFit({ A: 169, m: 0.146, dMin: 0.013, dMax: 0.1, printedMetricA: 1867, ...fromMemory(T10_4) }),
    inchFit({ A: 128, m: 0.263, dMin: 0.1, dMax: 0.2, printedMetricA: 2065, ...fromMemory(T10_4) }),
    inchFit({ A: 90, m: 0.478, dMin: 0.2, dMax: 0.4, printedMetricA: 2911, ...fromMemory(T10_4) }),
  ],
  moduli: band(193, 69.0),
  density: { value: lbPerIn3ToGPerCm3(0.286), ...read(MAKER_TABLES) },
  serviceTemperature: { min: -200, max: fahrenheitToC(550), ...unverified('max 550 °F: diamondwire.com (read); min: from memory') },
  // Printed 600–650 °F; the low end is taken.
  stressRelief: { temperature: fahrenheitToC(600), diameterChange: 'opens', minutes: 30, ...read(STRESS_RELIEF) },
  relativeCost: cost(7.6, ' (low end of 7.6–11)'),
  dynamicGrade: false,
};

// Semi-austenitic; the cautious stainless class is used for its allowable stresses.
const stainless177: WireGrade = {
  id: 'astm-a313-631',
  name: 'Stainless 17-7 PH, type 631, precipitation hardened (ASTM A313)',
  standard: 'ASTM A313',
  family: 'austenitic-stainless',
  diameterRange: tradeRange(0.002, 0.5),
  // No table or fit read. The low end of the 235–335 ksi span quoted for 17-7 PH, held constant: cautious at small sizes.
  strengthFits: [inchFit({
    A: 235, m: 0, dMin: 0.002, dMax: 0.5,
    ...fromMemory('17-7 PH (CH900) 235–335 ksi span in spring makers\' material tables, low end used at every size'),
  })],
  // Table 10-5 prints 208.4 GPa beside 29.5 Mpsi; 29.5 Mpsi is 203.4 GPa, which is used.
  moduli: band(203.4, 75.8),
  density: { value: lbPerIn3ToGPerCm3(0.282), ...read(MAKER_TABLES) },
  serviceTemperature: { min: -40, max: fahrenheitToC(650), ...unverified('max 650 °F: diamondwire.com (read); min: from memory') },
  // Precipitation hardening after coiling; suzuki-garphyttan.com gives the same, 480 °C for 1 h.
  stressRelief: { temperature: fahrenheitToC(900), diameterChange: 'opens', minutes: 60, ...read(STRESS_RELIEF) },
  relativeCost: { value: 11, ...fromMemory('top of the stainless range in the Shigley 9e Table 10-4 cost column') },
  dynamicGrade: false,
};

const phosphorBronze: WireGrade = {
  id: 'astm-b159',
  name: 'Phosphor bronze (ASTM B159)',
  standard: 'ASTM B159',
  family: 'non-ferrous',
  diameterRange: fitRange(0.004, 0.3),
  strengthFits: [
    inchFit({ A: 145, m: 0, dMin: 0.004, dMax: 0.022, printedMetricA: 1000, ...fromMemory(T10_4) }),
    inchFit({ A: 121, m: 0.028, dMin: 0.022, dMax: 0.075, printedMetricA: 913, ...fromMemory(T10_4) }),
    inchFit({ A: 110, m: 0.064, dMin: 0.075, dMax: 0.3, printedMetricA: 932, ...fromMemory(T10_4) }),
  ],
  moduli: band(103.4, 41.4),
  density: { value: lbPerIn3ToGPerCm3(0.32), ...read(MAKER_TABLES) },
  serviceTemperature: { min: -200, max: fahrenheitToC(200), ...fromMemory('spring makers\' material tables') },
  stressRelief: { temperature: fahrenheitToC(375), diameterChange: 'unknown', minutes: 30, ...fromMemory('common trade practice') },
  relativeCost: cost(8.0),
  dynamicGrade: false,
};

const berylliumCopper: WireGrade = {
  id: 'astm-b197',
  name: 'Beryllium copper (ASTM B197)',
  standard: 'ASTM B197',
  family: 'non-ferrous',
  diameterRange: tradeRange(0.003, 0.5),
  // No table or fit read. The low end of the 150–230 ksi span quoted for aged Be-Cu wire, at every size.
  strengthFits: [inchFit({
    A: 150, m: 0, dMin: 0.003, dMax: 0.5,
    ...fromMemory('beryllium copper 150–230 ksi span in spring makers\' material tables, low end used at every size'),
  })],
  moduli: band(117.2, 44.8),
  density: { value: 8.26, ...read('lfa-wire.com beryllium copper datasheet') },
  serviceTemperature: { min: -200, max: fahrenheitToC(400), ...fromMemory('spring makers\' material tables') },
  // Pre-tempered wire; the tables give 30 min to 2 h, the short end is taken.
  stressRelief: { temperature: fahrenheitToC(600), diameterChange: 'closes', minutes: 30, ...read(STRESS_RELIEF) },
  relativeCost: { value: 27, ...fromMemory('relative cost list in spring makers\' material tables') },
  dynamicGrade: false,
};

export const astmStainlessNonferrousGrades: WireGrade[] = [stainless302, stainless177, phosphorBronze, berylliumCopper];
