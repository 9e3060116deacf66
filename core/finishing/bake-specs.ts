/**
 * Hydrogen-embrittlement relief after electroplating: what each specification says, as summarised in
 * public material. Temperatures °C (converted from °F where the summary gives °F), times in hours.
 */
import { toInternal } from '../units';

const fahrenheit = (f: number): number => toInternal(f, 'temperature', 'inch');

export const bakeSpecifications = ['astm-b850', 'iso-4042', 'sae-uscar-5', 'astm-f1941', 'sae-ams-2759-9'] as const;
export type BakeSpecId = (typeof bakeSpecifications)[number];

export const astmB850 = {
  title: 'ASTM B850, post-coating treatment of steel',
  source: 'ASTM B850-98 (R2009) bake table, partial, as published by sonicplatinginc.com (bake chart)',
  verified: false,
  temperatureC: { min: 190, max: 220 },
  /** Up to this strength a bake is not essential. */
  notEssentialUpTo: 1000,
  /** Minimum bake, hours, by tensile strength band "1001–1100 MPa" etc., read as over … up to …. */
  bands: [
    { over: 1000, upTo: 1100, hours: 8 }, { over: 1100, upTo: 1200, hours: 10 },
    { over: 1200, upTo: 1300, hours: 12 }, { over: 1300, upTo: 1400, hours: 14 },
    { over: 1400, upTo: 1500, hours: 16 }, { over: 1500, upTo: 1600, hours: 18 },
    { over: 1600, upTo: 1700, hours: 20 }, { over: 1700, upTo: 1800, hours: 22 },
  ],
  caution: 'B850 warns that baking does not guarantee freedom from hydrogen damage; the plater advises starting within 3 h',
} as const;

export const iso4042 = {
  title: 'ISO 4042:2018, electroplated coating systems',
  source: 'ISO 4042:2018 hydrogen-embrittlement clause as excerpted at ulstandardspdf.com; bake to ISO 9588 (boltport.com)',
  verified: false,
  /** Above this specified maximum hardness, baking is required. */
  bakeAboveHv: 390,
  /** From this hardness up to `bakeAboveHv`, baking may be omitted with process verification and product testing. */
  conditionalFromHv: 360,
  scope: 'written for fasteners and non-threaded parts such as washers, pins and clips',
} as const;

export const saeUscar5 = {
  title: 'SAE/USCAR-5',
  source: 'SAE/USCAR-5 as summarised in a finishing.com thread (579/71)',
  verified: false,
  thresholdHv: 390,
  temperatureC: 200,
  hoursUpToThreshold: 4,
  hoursAboveThreshold: 8,
} as const;

export const astmF1941 = {
  title: 'ASTM F1941, electrodeposited coatings on fasteners',
  source: 'ASTM F1941 as summarised by swplating.com (baking)',
  verified: false,
  requiredFromHrc: 40,
  startWithinHours: 4,
  temperatureC: { min: fahrenheit(350), max: fahrenheit(450) },
  typicalHours: { min: 2, max: 24 },
  scope: 'written for fasteners',
} as const;

export const saeAms2759_9 = {
  title: 'SAE AMS 2759/9, hydrogen-embrittlement relief baking',
  source: 'SAE AMS 2759/9 as summarised by smfi.net (hydrogen-embrittlement relief); the 1 h start is that plater\'s statement',
  verified: false,
  temperatureC: { min: fahrenheit(350), max: fahrenheit(400) },
  minHours: 3,
  hardestSteelHours: 23,
  startWithinHours: 1,
} as const;

/** Not a specification: one spring maker's practice, far shorter than B850. Shown only as a conflict. */
export const springMakerPractice = {
  title: 'one spring maker\'s published practice',
  source: 'katyspring.com "Hydrogen embrittlement of springs"',
  verified: false,
  musicWire: { temperatureC: fahrenheit(400), hours: { min: 0.75, max: 1 } },
  otherSteels: { temperatureC: fahrenheit(420), hours: { min: 1, max: 2 } },
  /** The maker says a delay of this long may already be too long. */
  tooLateHours: 5,
} as const;

export const bakeSpecTitles: Readonly<Record<BakeSpecId, string>> = {
  'astm-b850': astmB850.title,
  'iso-4042': iso4042.title,
  'sae-uscar-5': saeUscar5.title,
  'astm-f1941': astmF1941.title,
  'sae-ams-2759-9': saeAms2759_9.title,
};

/** Each specification as a drawing, an order or a plater writes it (what findings and fixes name). */
export const bakeSpecNames: Readonly<Record<BakeSpecId, string>> = {
  'astm-b850': 'ASTM B850',
  'iso-4042': 'ISO 4042',
  'sae-uscar-5': 'SAE/USCAR-5',
  'astm-f1941': 'ASTM F1941',
  'sae-ams-2759-9': 'SAE AMS 2759/9',
};
