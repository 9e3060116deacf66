import { z } from 'zod';
import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { zodErrors } from '../validation';
import { bounded } from './bounds';
import { isTimeZone } from '../calendar';
import { checkPlusMinusTable, checkShopToleranceTable, demoShopTables, demoStoredShopTables } from '../tolerances';
import type { StoredShopTables } from '../tolerances';

/**
 * Shop settings: one validated JSON document per key, stored one row per key. Every number given as a
 * default below is a demo default: a round figure to start from, not a sourced value. A shop replaces
 * them with its own.
 */
const money = bounded('money');
const percent = bounded('percent');
const minutes = bounded('minutes');
const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'a date as YYYY-MM-DD');
const text = (max: number) => z.string().max(max);

export const shopProfileSchema = z.object({
  name: text(120).default(''),
  addressLines: z.array(text(120)).max(6).default([]),
  phone: text(40).default(''),
  email: text(120).default(''),
  logo: z.string().regex(/^data:image\/(png|jpeg|svg\+xml);base64,/, 'a PNG, JPEG or SVG data URL').max(2_000_000).optional(),
}).strict();

export const defaultsSchema = z.object({
  currency: z.string().regex(/^[A-Z]{3}$/, 'an ISO 4217 code such as USD').default('USD'),
  paperSize: z.enum(['letter', 'a4']).default('letter'),
  units: z.enum(['metric', 'inch']).default('metric'),
  toleranceGrade: z.union([z.literal(1), z.literal(2), z.literal(3)]).default(2),
  quoteValidityDays: z.number().int().min(1).max(365).default(30),
  /** Which set-removal verdict routes a compression spring: the handbook's, EN 13906-1's, or the stricter. */
  setRemovalMethod: z.enum(['stricter', 'handbook', 'en13906']).default('stricter'),
  /** The decimal mark typed numbers use; the other of "." and "," then reads as a thousands separator. */
  decimalMark: z.enum(['.', ',']).default('.'),
  /** The shop's time zone (IANA name): the days on the screens, the documents and the job list's date ranges are its days. */
  timeZone: z.string().max(64).refine(isTimeZone, 'a time zone name such as America/Chicago, Europe/Berlin or UTC').default('UTC'),
}).strict();

const sequence = {
  /** `{yy}` and `{yyyy}` are replaced by the year of issue, e.g. "J-{yy}-" gives "J-26-0001". */
  prefix: text(24),
  width: z.number().int().min(1).max(10),
  next: bounded('sequence'),
};

export const numberingSchema = z.object({
  prefix: sequence.prefix.default('J-{yy}-'),
  width: sequence.width.default(4),
  next: sequence.next.default(1),
  quotes: z.object(sequence).strict().default({ prefix: 'Q-{yy}-', width: 4, next: 1 }),
}).strict();

export const machineOperations = [
  'coil', 'grind', 'stress-relieve', 'set', 'shot-peen', 'load-test', 'loop-form', 'leg-form', 'pack',
] as const;
export type MachineOperation = (typeof machineOperations)[number];

const range = z.object({ min: bounded('wireMm'), max: bounded('wireMm').positive() }).strict()
  .refine((r) => r.max >= r.min, { message: 'max must not be below min', path: ['max'] });

export const machineSchema = z.object({
  id: z.string().min(1).max(40),
  name: z.string().min(1).max(120),
  operation: z.enum(machineOperations),
  wireRange: range,
  hourlyRate: money,
  /** Minutes to set the machine up for one lot, whatever its size. */
  setupMinutes: minutes,
  /** Run rate of a piece-paced machine other than a coiler (grinder, press, tester, packing bench). */
  piecesPerHour: z.number().finite().positive().max(1_000_000).optional(),
  /** This machine's own scrap, when it differs from the operation's in Costing. */
  scrapPercent: z.number().finite().min(0).max(50).optional(),
  speedModel: z.object({
    feedMetresPerMinute: bounded('feedMetresPerMinute'),
    maxPiecesPerMinute: bounded('piecesPerMinute'),
  }).strict().optional(),
  batch: z.object({
    capacityPieces: bounded('batchPieces'),
    cycleMinutes: bounded('cycleMinutes'),
  }).strict().optional(),
}).strict().refine((m) => m.operation !== 'coil' || m.speedModel !== undefined, {
  message: 'a coiler needs a speed model', path: ['speedModel'],
});

export const materialPriceSchema = z.object({
  grade: z.string().min(1),
  dMin: bounded('wireMm'),
  dMax: bounded('wireMm').positive(),
  pricePerKg: money,
  date: isoDate,
  supplier: text(120).default(''),
}).strict().refine((p) => p.dMax >= p.dMin, { message: 'dMax must not be below dMin', path: ['dMax'] });

export const finishSchema = z.object({
  id: z.string().min(1).max(40),
  name: z.string().min(1).max(120),
  vendor: text(120).default(''),
  pricePerKg: money.optional(),
  pricePerPiece: money.optional(),
  lotMinimum: money.default(0),
  electroplated: z.boolean().default(false),
  /** Done in the shop (light oil, for one): no vendor, not routed as outside processing. */
  inHouse: z.boolean().default(false),
  bakeSpecification: text(120).optional(),
}).strict();

export const wireStockSchema = z.object({
  grade: z.string().min(1),
  d: bounded('wireMm').positive(),
  kg: bounded('stockKg'),
  heatNumber: text(60).optional(),
}).strict();

const band = {
  over: z.number().finite().min(0).max(1e6),
  /** null: the band has no upper end ("and over"). */
  upTo: z.number().finite().positive().max(1e6).nullable(),
};
const gradeRowSchema = z.object({
  grade: z.union([z.literal(1), z.literal(2), z.literal(3)]), ...band,
  percent: z.number().finite().min(0).max(100),
  /** The floor in the quantity's internal unit: N for load, mm for free length. */
  minimum: z.number().finite().min(0).max(1e6),
}).strict();
const plusMinusRowSchema = z.object({ ...band, plusMinus: z.number().finite().min(0).max(1000) }).strict();
const gradeTableSchema = z.object({ bandedBy: z.enum(['activeCoils', 'index']), rows: z.array(gradeRowSchema).max(60) }).strict();
const plusMinusTableSchema = z.object({ rows: z.array(plusMinusRowSchema).max(30) }).strict();
const open = <T extends { upTo: number | null }>(rows: T[]) => rows.map((r) => ({ ...r, upTo: r.upTo ?? Infinity }));

/**
 * The shop's own tolerance tables, read by the plan: load and free length by grade (compression), torsion
 * leg length and free angle. Demo defaults until the shop sets its own; the sourced tables stay in core.
 */
export const toleranceTablesSchema = z.object({
  load: gradeTableSchema,
  freeLength: gradeTableSchema,
  legLength: plusMinusTableSchema,
  freeAngle: plusMinusTableSchema,
}).strict().superRefine((t, ctx) => {
  const report = (key: string, errors: FieldError[]) => errors.forEach((e) => ctx.addIssue({
    code: 'custom', message: e.message, path: [key, ...e.path.split(/[.[\]]+/).filter(Boolean).map((p) => (/^\d+$/.test(p) ? Number(p) : p))],
  }));
  for (const key of ['load', 'freeLength'] as const) {
    report(key, checkShopToleranceTable({ ...demoShopTables[key], bandedBy: t[key].bandedBy, rows: open(t[key].rows) }));
  }
  for (const key of ['legLength', 'freeAngle'] as const) report(key, checkPlusMinusTable({ rows: open(t[key].rows) }));
});
export type ToleranceTablesSetting = z.infer<typeof toleranceTablesSchema>;

/** How unit prices are rounded, the same on the screen and every document. */
export const unitPriceRoundingSchema = z.discriminatedUnion('rule', [
  z.object({ rule: z.literal('none') }).strict(),
  z.object({ rule: z.literal('significant'), digits: z.number().int().min(2).max(8) }).strict(),
  z.object({ rule: z.literal('step'), step: z.number().finite().positive().max(1000) }).strict(),
]);
export type UnitPriceRounding = z.infer<typeof unitPriceRoundingSchema>;

/** An operation the estimator may add to a job's routing (tumble, extra inspection, a customer's test). */
export const extraOperationSchema = z.object({
  id: z.string().min(1).max(40),
  name: z.string().min(1).max(120),
  hourlyRate: money,
  setupMinutes: z.number().finite().min(0).max(10_000),
  piecesPerHour: z.number().finite().positive().max(1_000_000),
}).strict();
export type ExtraOperation = z.infer<typeof extraOperationSchema>;

export const costingSchema = z.object({
  /** Per operation name (a machine operation, or any key a costing model reads). Demo defaults. */
  scrapPercentByOperation: z.record(z.string(), percent).default({ coil: 3, grind: 1, 'stress-relieve': 0.5 }),
  setupScrapMetres: bounded('scrapMetres').default(5),
  overheadPercent: percent.default(25),
  marginPercent: percent.default(20),
  inspectionHourlyRate: money.default(45),
  firstArticleMinutes: minutes.default(20),
  inspectionMinutesPerPiece: minutes.default(0.5),
  packagingPerPiece: money.default(0.01),
  minimumOrderValue: money.default(150),
  unitPriceRounding: unitPriceRoundingSchema.default({ rule: 'none' }),
  /** With no breaks given, the order quantity times each factor is priced (the order quantity itself always is). */
  breakFactors: z.array(z.number().finite().positive().max(1000)).min(1).max(8).default([0.5, 1, 2, 5]),
}).strict();

/**
 * What a quotation states besides prices, as the shop usually offers it (demo defaults); the estimator may
 * change each one on a quote, and a customer's own payment terms replace the shop's.
 */
export const quoteTermsSchema = z.object({
  paymentTerms: text(200).default('30 days net from the date of invoice'),
  deliveryTerms: text(200).default('Ex works (EXW), Incoterms 2020; freight charged at cost'),
  packaging: text(200).default('Bulk in cardboard cartons, parts counted by weight'),
  certificates: z.array(text(200)).max(6).default(['Certificate of conformance with each delivery']),
  /** The estimator who signs quotes unless a quote names another. */
  estimator: text(120).default(''),
  /** Prints the unit price against quantity under the price table (it is always on the cost screen). */
  priceCurveOnQuote: z.boolean().default(false),
}).strict();
export type QuoteTerms = z.infer<typeof quoteTermsSchema>;

/** How finely the design search steps the coil count and the mean diameter (demo defaults: quarter turns, 0.1 mm). */
export const designStepsSchema = z.object({
  coilStep: z.number().finite().min(0.05).max(1).default(0.25),
  diameterStep: z.number().finite().min(0.01).max(5).default(0.1),
}).strict();

function uniqueIds<T extends { id: string }>(items: T[], ctx: z.RefinementCtx): void {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) ctx.addIssue({ code: 'custom', message: `duplicate id "${item.id}"`, path: [i, 'id'] });
    seen.add(item.id);
  });
}

/** The schema of each settings key; the store keeps one row per key. */
export const settingsSchemas = {
  shopProfile: shopProfileSchema.default({ name: '', addressLines: [], phone: '', email: '' }),
  defaults: defaultsSchema.default({ currency: 'USD', paperSize: 'letter', units: 'metric', toleranceGrade: 2, quoteValidityDays: 30, setRemovalMethod: 'stricter', decimalMark: '.', timeZone: 'UTC' }),
  numbering: numberingSchema.default({ prefix: 'J-{yy}-', width: 4, next: 1, quotes: { prefix: 'Q-{yy}-', width: 4, next: 1 } }),
  machines: z.array(machineSchema).max(200).superRefine(uniqueIds).default([]),
  materialPrices: z.array(materialPriceSchema).max(2000).default([]),
  finishes: z.array(finishSchema).max(200).superRefine(uniqueIds).default([]),
  wireStock: z.array(wireStockSchema).max(5000).default([]),
  extraOperations: z.array(extraOperationSchema).max(100).superRefine(uniqueIds).default([]),
  costing: costingSchema.default({
    scrapPercentByOperation: { coil: 3, grind: 1, 'stress-relieve': 0.5 }, setupScrapMetres: 5,
    overheadPercent: 25, marginPercent: 20, inspectionHourlyRate: 45, firstArticleMinutes: 20,
    inspectionMinutesPerPiece: 0.5, packagingPerPiece: 0.01,
    minimumOrderValue: 150, unitPriceRounding: { rule: 'none' }, breakFactors: [0.5, 1, 2, 5],
  }),
  design: designStepsSchema.default({ coilStep: 0.25, diameterStep: 0.1 }),
  toleranceTables: toleranceTablesSchema.default(demoStoredShopTables() as StoredShopTables & ToleranceTablesSetting),
  quoteTerms: quoteTermsSchema.default(quoteTermsSchema.parse({})),
};

export const settingsSchema = z.object(settingsSchemas).strict();
export type Settings = z.infer<typeof settingsSchema>;
export type SettingsInput = z.input<typeof settingsSchema>;
export type SettingsKey = keyof typeof settingsSchemas;
export const settingsKeys = Object.keys(settingsSchemas) as SettingsKey[];
export type Machine = z.infer<typeof machineSchema>;
export type MaterialPrice = z.infer<typeof materialPriceSchema>;
export type Finish = z.infer<typeof finishSchema>;

/** The settings of a new shop: every key at its default. */
export function defaultSettings(): Settings {
  return settingsSchema.parse({});
}

/** Validates one settings document; error paths start with the key, e.g. "machines[2].hourlyRate". */
export function parseSettingsValue<K extends SettingsKey>(key: K, raw: unknown): Result<Settings[K]> {
  const parsed = settingsSchemas[key].safeParse(raw);
  return parsed.success ? ok(parsed.data as Settings[K]) : fail(zodErrors(parsed.error, [key]));
}

/** Validates a partial settings object (only the keys given); unknown keys are errors. */
export function parseSettingsPatch(raw: unknown): Result<Partial<Settings>> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return fail([fieldError('not-an-object', '', 'settings must be a JSON object')]);
  }
  const errors: FieldError[] = [];
  const out: Partial<Record<SettingsKey, unknown>> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (!Object.hasOwn(settingsSchemas, key)) {
      errors.push(fieldError('unknown-field', key, `unknown settings key "${key}" (known: ${settingsKeys.join(', ')})`));
      continue;
    }
    const parsed = parseSettingsValue(key as SettingsKey, value);
    if (parsed.ok) out[key as SettingsKey] = parsed.value;
    else errors.push(...parsed.errors);
  }
  return errors.length > 0 ? fail(errors) : ok(out as Partial<Settings>);
}
