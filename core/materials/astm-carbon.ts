/** ASTM carbon and low-alloy steel spring wires: A228, A227 class I/II, A229, A232, A401. */
import {
  fahrenheitToC, fromMemory, inchFit, inchRows, inToMm, lbPerIn3ToGPerCm3, read, unverified,
} from './data-helpers';
import type { ModulusBand, Sourced, WireGrade } from './types';

const T10_4 = 'Shigley 9e Table 10-4';
const T10_5 = 'Shigley 9e Table 10-5';
const STRESS_RELIEF = 'apexspring.com and chinaspringcorp.com stress-relief tables (agree)';
const SERVICE_TEMP = 'diamondwire.com "Spring Material Properties"';
const NO_MIN_TEMP = 'min: no source read, from memory';
const SHIGLEY_MIN_TEMP = 'min: Shigley 9e Table 10-3, from memory';

// All ASTM steels here: 0.284 lb/in³ (diamondwire.com, optimumspring.com material tables).
const steelDensity = { value: lbPerIn3ToGPerCm3(0.284), ...read('diamondwire.com / optimumspring.com material tables') };
const cost = (value: number): { value: number } & Sourced => ({ value, ...fromMemory(`${T10_4} relative cost column`) });

// Shigley 9e Table 10-5 prints bands "< 0.032, 0.033–0.063, 0.064–0.125, > 0.125 in"; the 0.001 in gaps
// are closed at mid-gap. E and G are the table's GPa columns.
function inchBands(rows: readonly (readonly [number, number, number])[]): ModulusBand[] {
  return rows.map(([upTo, E, G]) => ({ upToDiameter: inToMm(upTo), E: E * 1000, G: G * 1000 }));
}
const singleBand = (E: number, G: number): ModulusBand[] => [{ upToDiameter: Infinity, E: E * 1000, G: G * 1000 }];

// ASTM A228 minimum–maximum tensile strength, ksi, as reprinted by interwiregroup.com ("Tinned coated music wire").
const a228Rows = inchRows([
  [0.004, 439, 485], [0.006, 415, 459], [0.008, 399, 441], [0.010, 387, 428], [0.012, 377, 417],
  [0.014, 369, 408], [0.016, 362, 400], [0.020, 350, 387], [0.024, 341, 377], [0.030, 330, 365],
  [0.040, 315, 349], [0.051, 303, 335], [0.063, 293, 324], [0.072, 287, 317], [0.080, 282, 312],
  [0.090, 276, 305], [0.100, 271, 300], [0.112, 266, 294], [0.125, 261, 288], [0.145, 254, 281],
  [0.150, 253, 279], [0.162, 249, 275], [0.177, 245, 270], [0.192, 241, 267], [0.207, 238, 264],
  [0.225, 235, 260], [0.250, 230, 255],
]);

const musicWire: WireGrade = {
  id: 'astm-a228',
  name: 'Music wire (ASTM A228)',
  standard: 'ASTM A228',
  family: 'cold-drawn-carbon',
  diameterRange: { min: inToMm(0.004), max: inToMm(0.25), ...read('ASTM A228 table extent, via interwiregroup.com') },
  strengthTable: { form: 'points', rows: a228Rows, ...read('ASTM A228 tensile table, via interwiregroup.com') },
  strengthFits: [inchFit({
    A: 201, m: 0.145, dMin: 0.004, dMax: 0.256, printedMetricA: 2211,
    ...read(`${T10_4} (music-wire row)`),
  })],
  moduli: {
    bands: inchBands([[0.0325, 203.4, 82.7], [0.0635, 200, 81.7], [0.125, 196.5, 81.0], [Infinity, 193, 80.0]]),
    ...read(T10_5),
  },
  density: steelDensity,
  // Shigley: not above 120 °C nor at sub-zero temperatures.
  serviceTemperature: { min: 0, max: 120, ...read('Shigley 9e Table 10-3') },
  stressRelief: { temperature: fahrenheitToC(500), diameterChange: 'closes', minutes: 30, ...read(STRESS_RELIEF) },
  relativeCost: cost(2.6),
  dynamicGrade: true,
};

// ASTM A227 ksi, as reprinted by interwiregroup.com ("Bright hard drawn MB wire"): [d, class I min, max, class II min, max].
const a227 = [
  [0.020, 283, 323, 324, 364], [0.041, 255, 293, 294, 332], [0.062, 237, 272, 273, 308],
  [0.092, 220, 253, 254, 287], [0.120, 210, 241, 242, 273], [0.162, 200, 230, 231, 261],
  [0.250, 182, 210, 211, 239], [0.375, 167, 193, 194, 220], [0.500, 156, 180, 181, 205],
  // Class II max at 0.625 in is printed "294", an evident slip for 194 (every other class II span is 23–40 ksi).
  [0.625, 147, 170, 171, 194],
] as const;

function hardDrawn(cls: 1 | 2): WireGrade {
  const roman = cls === 1 ? 'I' : 'II';
  const rows = a227.map(([d, min1, max1, min2, max2]): [number, number, number] =>
    (cls === 1 ? [d, min1, max1] : [d, min2, max2]));
  return {
    id: `astm-a227-${cls}`,
    name: `Hard-drawn, class ${roman} (ASTM A227)`,
    standard: 'ASTM A227',
    family: 'cold-drawn-carbon',
    diameterRange: { min: inToMm(0.02), max: inToMm(0.625), ...read('ASTM A227 table extent, via interwiregroup.com') },
    strengthTable: { form: 'points', rows: inchRows(rows), ...read(`ASTM A227 class ${roman} tensile table, via interwiregroup.com`) },
    // The handbook's hard-drawn fit sits near class I; it is kept as reference data for class I only.
    strengthFits: cls === 1
      ? [inchFit({ A: 140, m: 0.19, dMin: 0.028, dMax: 0.5, printedMetricA: 1783, ...fromMemory(T10_4) })]
      : [],
    moduli: {
      bands: inchBands([[0.0325, 198.6, 80.7], [0.0635, 197.9, 80.0], [0.125, 197.2, 79.3], [Infinity, 196.5, 78.6]]),
      ...read(T10_5),
    },
    density: steelDensity,
    serviceTemperature: {
      min: 0, max: fahrenheitToC(250),
      ...unverified(`max 250 °F: ${SERVICE_TEMP} and Shigley 9e Table 10-3 (read); ${SHIGLEY_MIN_TEMP}`),
    },
    stressRelief: { temperature: fahrenheitToC(550), diameterChange: 'closes', minutes: 20, ...read(STRESS_RELIEF) },
    relativeCost: cost(1.0),
    dynamicGrade: false,
  };
}

const oilTempered: WireGrade = {
  id: 'astm-a229',
  name: 'Oil-tempered carbon steel (ASTM A229)',
  standard: 'ASTM A229',
  family: 'hardened-tempered',
  diameterRange: { min: inToMm(0.02), max: inToMm(0.5), ...fromMemory(`size range of the ${T10_4} fit (standard's own range not read)`) },
  strengthFits: [
    // Norton's SI row was read; it is preferred over the handbook row, which is from memory.
    { A: 1831.2, m: 0.1833, dMin: 0.5, dMax: 16, ...read('Norton, Machine Design, Table 13-4 (SI rows via issuhub.com)') },
    inchFit({ A: 147, m: 0.187, dMin: 0.02, dMax: 0.5, printedMetricA: 1855, ...fromMemory(T10_4) }),
  ],
  moduli: { bands: singleBand(196.5, 77.2), ...read(`${T10_5} (row printed "A239")`) },
  density: steelDensity,
  // A maker's table gives 250 °F (121 °C); Shigley/SMI give 180 °C. The higher value is used, with caution.
  serviceTemperature: { min: 0, max: 180, ...unverified(`max: Shigley 9e Table 10-3 (read); ${SHIGLEY_MIN_TEMP}`) },
  // Printed 500–600 °F; the low end is taken.
  stressRelief: { temperature: fahrenheitToC(500), diameterChange: 'closes', minutes: 30, ...read(STRESS_RELIEF) },
  relativeCost: cost(1.3),
  dynamicGrade: false,
};

const chromeVanadium: WireGrade = {
  id: 'astm-a232',
  name: 'Chrome-vanadium, valve-spring quality (ASTM A232)',
  standard: 'ASTM A232',
  family: 'hardened-tempered',
  diameterRange: { min: inToMm(0.032), max: inToMm(0.437), ...fromMemory(`size range of the ${T10_4} fit (standard's own range not read)`) },
  strengthFits: [inchFit({ A: 169, m: 0.168, dMin: 0.032, dMax: 0.437, printedMetricA: 2005, ...fromMemory(T10_4) })],
  moduli: { bands: singleBand(203.4, 77.2), ...read(T10_5) },
  density: steelDensity,
  serviceTemperature: { min: -40, max: fahrenheitToC(425), ...unverified(`max 425 °F: ${SERVICE_TEMP} (read); ${NO_MIN_TEMP}`) },
  // The stress-relief tables name A231; A232 is the valve-spring quality of the same alloy.
  stressRelief: { temperature: fahrenheitToC(800), diameterChange: 'closes', minutes: 30, ...read(`${STRESS_RELIEF}, A231 row`) },
  relativeCost: cost(3.1),
  // Shigley 9e Table 10-3 (read): chrome-vanadium is the valve-spring wire.
  dynamicGrade: true,
};

const chromeSilicon: WireGrade = {
  id: 'astm-a401',
  name: 'Chrome-silicon (ASTM A401)',
  standard: 'ASTM A401',
  family: 'hardened-tempered',
  diameterRange: { min: inToMm(0.063), max: inToMm(0.375), ...fromMemory(`size range of the ${T10_4} fit (standard's own range not read)`) },
  strengthFits: [inchFit({ A: 202, m: 0.108, dMin: 0.063, dMax: 0.375, printedMetricA: 1974, ...fromMemory(T10_4) })],
  moduli: { bands: singleBand(203.4, 77.2), ...read(T10_5) },
  density: steelDensity,
  serviceTemperature: { min: -40, max: fahrenheitToC(475), ...unverified(`max 475 °F: ${SERVICE_TEMP} (read); ${NO_MIN_TEMP}`) },
  stressRelief: { temperature: fahrenheitToC(800), diameterChange: 'closes', minutes: 30, ...read(STRESS_RELIEF) },
  relativeCost: cost(4.0),
  dynamicGrade: false,
};

export const astmCarbonGrades: WireGrade[] = [musicWire, hardDrawn(1), hardDrawn(2), oilTempered, chromeVanadium, chromeSilicon];
