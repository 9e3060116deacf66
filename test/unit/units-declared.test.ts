import { describe, expect, it } from 'vitest';
import { calculate } from '../../core/calculate';
import { estimateCost } from '../../core/costing/estimate';
import { costQuantities } from '../../core/costing/types';
import { quoteDocument } from '../../core/documents/quote';
import { travellerDocument } from '../../core/documents/traveller';
import { documentQuantities } from '../../core/documents/types';
import { kindEntryOf } from '../../core/kinds/registry';
import { planInSpecUnits, planManufacture, planQuantities } from '../../core/process/plan';
import { defaultSettings, settingsSchema } from '../../core/settings/schema';
import { demoSettings } from '../../db/demo/shop';
import type { Settings } from '../../core/settings/schema';
import { parseSpec, springKinds } from '../../core/spec';
import type { Spec, SpecInput, SpringKind } from '../../core/spec';
import { convertFields, undeclaredNumbers } from '../../core/units';

/**
 * Inch jobs of every kind (invented parts, demo data), each with every optional number the spec takes, so
 * the walk below meets every field: cyclic duty, overrides, service temperature, order fields.
 */
const order: Pick<Spec, 'quantities' | 'toleranceGrade' | 'finish' | 'aql' | 'serviceTemperature'> = {
  quantities: [500, 5000], toleranceGrade: 2, finish: 'zinc-yellow', aql: 1.0, serviceTemperature: { min: 0, max: 200 },
};

const inchJobs: Record<SpringKind, SpecInput> = {
  compression: {
    kind: 'compression', version: 1, units: 'inch', material: 'astm-a228', wireDiameter: 0.08, outerDiameter: 0.875,
    totalCoils: 10, ends: 'closed-ground', freeLength: 2.4, loads: [{ length: 2 }, { length: 1.6, force: 12, tolerancePercent: 10 }],
    duty: { type: 'cyclic', between: [2, 1.6], cycles: 1e6, peened: false, frequency: 5 },
    materialOverrides: { shearModulus: 11.5e6, elasticModulus: 30e6, tensileStrength: 280e3, density: 0.284 }, ...order,
  },
  extension: {
    kind: 'extension', version: 1, units: 'inch', material: 'astm-a228', wireDiameter: 0.062, outerDiameter: 0.5, bodyCoils: 20.5,
    ends: [{ form: 'extended-hook', gap: 0.05, extension: 0.25, bendRadius: 0.1 }, 'full-loop'], initialTension: 2,
    loads: [{ length: 2.6 }, { length: 2.9, force: 6, tolerancePercent: 10 }], loopAngle: 90, loopAngleTolerance: 15,
    duty: { type: 'cyclic', between: [2.6, 2.9], cycles: 1e5, peened: false, frequency: 2 }, ...order,
  },
  torsion: {
    kind: 'torsion', version: 1, units: 'inch', material: 'astm-a228', wireDiameter: 0.08, outerDiameter: 0.875, bodyCoils: 5.25,
    legs: [{ length: 1, form: 'tangent', bendRadius: 0.1 }, { length: 1.2, form: 'hooked' }], freeAngle: 90, freeAngleTolerance: 10,
    windDirection: 'right', loadDirection: 'closing', arborDiameter: 0.5,
    loads: [{ angle: 60 }, { angle: 90, torque: 4, tolerancePercent: 10 }],
    duty: { type: 'cyclic', between: [30, 90], cycles: 1e5, peened: true, frequency: 1 }, ...order,
  },
};

function specOf(raw: SpecInput): Spec {
  const parsed = parseSpec(raw);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.value;
}

/** Every string in a model, by path. */
function texts(value: unknown, path = ''): { path: string; text: string }[] {
  if (typeof value === 'string') return [{ path, text: value }];
  if (Array.isArray(value)) return value.flatMap((v, i) => texts(v, `${path}[${i}]`));
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => texts(v, path === '' ? k : `${path}.${k}`));
}

/** Millimetres as a unit: "12 mm", "N·mm", "(mm)"; not words that merely contain the letters. */
const MILLIMETRES = /\bmm\b/;
/** SVG markup carries its own coordinates and attributes; what a reader sees is the text between tags. */
const shownText = (t: string): string => (t.trimStart().startsWith('<svg') ? [...t.matchAll(/>([^<]+)</g)].map((m) => m[1]).join(' ') : t);

function millimetreTexts(model: unknown): string[] {
  return texts(model).filter((t) => MILLIMETRES.test(shownText(t.text))).map((t) => `${t.path}: ${shownText(t.text).slice(0, 120)}`);
}

/**
 * Two shops: the demo shop (machines, wire prices and an electroplated finish, so plating, bake and outside
 * lines appear) and a bare one (no machines, no prices, so the "no machine" and "no price" texts appear).
 */
const shops: Record<string, Settings> = { demo: settingsSchema.parse(demoSettings), bare: defaultSettings() };

function models(kind: SpringKind, settings: Settings) {
  const spec = specOf(inchJobs[kind]);
  const report = calculate(spec);
  if (!report.ok) throw new Error(JSON.stringify(report.errors));
  const plan = planInSpecUnits(planManufacture(spec, settings, 5000));
  const estimate = estimateCost(spec, settings);
  const job = { number: 'J-DEMO-1', customerName: 'Demo customer', partNumber: 'DEMO-1', drawingNumber: 'D-1', drawingRevision: 'A' };
  const quote = quoteDocument({ spec, settings, job: { ...job, leadTimeDays: 15 }, estimate, issuedAt: '2026-11-02T09:00:00Z', validityDays: 30 });
  const traveller = travellerDocument({ spec, settings, job: { ...job, orderQuantity: 5000, dueDate: '2026-12-01' }, printedAt: '2026-11-02T09:00:00Z' });
  return { spec, report: report.value, plan, estimate, quote, traveller };
}

describe('every number of an inch job has a declared quantity, and no text shows millimetres', () => {
  it.each(springKinds.flatMap((kind) => Object.keys(shops).map((shop) => [kind, shop] as const)))('%s in the %s shop: spec, report, plan, cost and documents', (kind, shop) => {
    const m = models(kind, shops[shop]!);
    const entry = kindEntryOf(kind);
    expect(m.spec.units).toBe('inch');
    expect(undeclaredNumbers(m.spec, entry.specQuantities)).toEqual([]);
    expect(undeclaredNumbers(m.report, entry.reportQuantities)).toEqual([]);
    expect(undeclaredNumbers(m.plan, planQuantities)).toEqual([]);
    expect(undeclaredNumbers(m.estimate, costQuantities)).toEqual([]);
    expect(undeclaredNumbers(m.quote, documentQuantities)).toEqual([]);
    expect(undeclaredNumbers(m.traveller, documentQuantities)).toEqual([]);
    for (const model of [m.spec, m.report, m.plan, m.estimate, m.quote, m.traveller]) expect(millimetreTexts(model)).toEqual([]);
  });

  it('the walk finds a number nobody declared, and a millimetre in a text', () => {
    expect(undeclaredNumbers({ a: 1, b: { c: 2, d: [3] } }, { a: 'length', b: { c: 'force' } })).toEqual(['b.d[0]']);
    expect(undeclaredNumbers({ settings: [{ value: 2 }, { value: 3, quantity: 'length' }] }, { settings: { value: 'own-quantity' } }))
      .toEqual(['settings[0].value']);
    expect(millimetreTexts({ a: 'wire 2.00 mm', b: 'N·mm', c: 'summary', d: 'comment' })).toEqual(['a: wire 2.00 mm', 'b: N·mm']);
  });

  it('the spec declaration drives the engine: a spec converted in and out by it comes back unchanged', () => {
    for (const kind of springKinds) {
      const spec = specOf(inchJobs[kind]);
      const map = kindEntryOf(kind).specQuantities;
      const back = convertFields(convertFields(spec, map, 'inch', 'in'), map, 'inch', 'out');
      // 1 in = 25.4 mm and 1 lbf = 4.4482216152605 N exactly (NIST SP 811, Appendix B): a round trip is exact to rounding.
      expect(JSON.stringify(back, (_k, v: unknown) => (typeof v === 'number' ? Number(v.toPrecision(12)) : v)))
        .toBe(JSON.stringify(spec, (_k, v: unknown) => (typeof v === 'number' ? Number(v.toPrecision(12)) : v)));
    }
  });
});
