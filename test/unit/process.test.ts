import { describe, expect, it } from 'vitest';
import { planInSpecUnits, planManufacture } from '../../core/process/plan';
import { startQuantity } from '../../core/process/lot-wire';
import { settingsSchema } from '../../core/settings/schema';
import type { SettingsInput } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { CompressionSpec } from '../../core/spec';
import { analyseSpec } from '../../core/calculate';
import { MM_PER_IN } from '../../core/units';
import { referenceSpring, valveSpringMetric } from '../fixtures/specs';

const specOf = (input: unknown): CompressionSpec => {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  if (r.value.kind !== 'compression') throw new Error('expected a compression spec');
  return r.value;
};

/** An invented shop (demo data). */
const shop: SettingsInput = {
  machines: [
    { id: 'c-cheap', name: 'Coiler A', operation: 'coil', wireRange: { min: 0.2, max: 3 }, hourlyRate: 55, setupMinutes: 30, speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'c-dear', name: 'Coiler B', operation: 'coil', wireRange: { min: 0.2, max: 6 }, hourlyRate: 80, setupMinutes: 30, speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'p1', name: 'Setting press', operation: 'set', wireRange: { min: 0.2, max: 8 }, hourlyRate: 35, setupMinutes: 10, speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 15 } },
  ],
  finishes: [
    { id: 'zinc', name: 'Zinc plate', vendor: 'Demo Platers', pricePerKg: 3, lotMinimum: 90, electroplated: true },
    { id: 'oil', name: 'Oil dip', lotMinimum: 0 },
  ],
};
const settings = settingsSchema.parse(shop);

/** A spring whose solid stress needs set removal: heavy deflection to solid on a short spring (invented part). */
const setSpring = { ...valveSpringMetric, material: 'en10270-1-sm', materialOverrides: undefined, freeLength: 75, loads: [] };

describe('routing', () => {
  it('follows the shop sequence: coil, stress relieve, grind, (peen), (set), finish, bake, inspect, pack', () => {
    const plan = planManufacture(specOf({ ...setSpring, finish: 'zinc', bakeSpecification: 'ASTM B850, 22 h at 200 °C', shotPeen: true }), settings, 1000);
    expect(analyseSpec(specOf(setSpring)).setRemoval.required).toBe(true);
    expect(plan.operations.map((o) => o.kind)).toEqual(['coil', 'stress-relieve', 'grind', 'shot-peen', 'set', 'finish', 'bake', 'load-test', 'pack']);
    expect(plan.operations.map((o) => o.sequence)).toEqual([10, 20, 30, 40, 50, 60, 70, 80, 90]);
    const bake = plan.operations.find((o) => o.kind === 'bake')!;
    expect(bake.settings[0]!.value).toBe('ASTM B850, 22 h at 200 °C');
  });

  it('coils to the coiled free length that set removal needs, and no grinding for closed unground ends', () => {
    const r = analyseSpec(specOf(setSpring));
    const plan = planManufacture(specOf({ ...setSpring, ends: 'closed' }), settings, 100);
    expect(plan.operations.some((o) => o.kind === 'grind')).toBe(false);
    const coil = plan.operations[0]!;
    const coiled = coil.settings.find((s) => s.label === 'Coiled free length')!.value as number;
    expect(plan.coiledFreeLength).toBe(coiled);
    expect(coiled).toBeGreaterThan(75);
    expect(r.setRemoval.coiledFreeLength).toBeGreaterThan(75);
  });

  it('an electroplated finish without a bake specification is an error naming the field', () => {
    const plan = planManufacture(specOf({ ...valveSpringMetric, finish: 'zinc' }), settings, 500);
    const f = plan.findings.find((x) => x.code === 'bake-spec-missing');
    expect(f?.severity).toBe('error');
    expect(f?.path).toBe('bakeSpecification');
  });

  it('an unknown finish is an error on the finish field', () => {
    const plan = planManufacture(specOf({ ...valveSpringMetric, finish: 'gold' }), settings, 500);
    expect(plan.findings.find((x) => x.code === 'unknown-finish')?.path).toBe('finish');
  });

  it('picks the cheapest machine whose wire range takes the wire, and says when none does', () => {
    expect(planManufacture(specOf(valveSpringMetric), settings, 100).operations[0]!.workCentre?.id).toBe('c-cheap');
    const heavier = planManufacture(specOf({ ...valveSpringMetric, wireDiameter: 4, outerDiameter: 40, freeLength: 90 }), settings, 100);
    expect(heavier.operations[0]!.workCentre?.id).toBe('c-dear');
    const none = planManufacture(specOf({ ...valveSpringMetric, wireDiameter: 7, outerDiameter: 70, freeLength: 150, totalCoils: 8 }), settings, 100);
    expect(none.operations[0]!.workCentre).toBeNull();
    expect(none.operations[0]!.notes.join(' ')).toMatch(/no coil machine/);
  });
});

describe('wire and quantities (developed length and mass: common trade practice, derived)', () => {
  it('start quantity is ordered ÷ ∏(1 − scrap), rounded up (§4.3, common practice)', () => {
    const ops = [{ scrapFraction: 0.03 }, { scrapFraction: 0.01 }] as never[];
    expect(startQuantity(1000, ops)).toBe(Math.ceil(1000 / (0.97 * 0.99)));
    expect(startQuantity(1000, [])).toBe(1000);
  });

  it('wire mass 6.17 g per metre of 1 mm steel at 7.85 g/cm³ (§8 row 25, computation, common practice)', () => {
    const plan = planManufacture(specOf({ ...referenceSpring, wireDiameter: 1, meanDiameter: 10, freeLength: 40 }), settings, 1);
    const gramsPerMetre = (plan.massPerPiece * 1000) / (plan.wireLengthPerPiece / 1000); // internal kg and mm
    expect(gramsPerMetre).toBeCloseTo(6.17, 2);
  });

  it('tight-pitch length π·D·Nt = 314.2 mm, 1.94 g, 1.94 kg per 1 000 (§8 row 26, common practice)', () => {
    // D 10, Nt 10, d 1, closed and ground: pitch (L0 − 2d)/Na with L0 = 10 gives p = 1 = d (coils touching).
    const plan = planInSpecUnits(planManufacture(specOf({ ...referenceSpring, wireDiameter: 1, meanDiameter: 10, activeCoils: undefined, totalCoils: 10, freeLength: 10.0001 }), settings, 1000));
    expect(plan.wireLengthPerPiece / 314.2).toBeCloseTo(1, 3);
    expect(plan.massPerPiece).toBeCloseTo(1.94, 2);
    expect(plan.massPer1000).toBeCloseTo(1.94, 2);
  });

  it('active coils from 10 total: closed and ground 8, open 10 (§8 row 27, stockspringscatalog.com)', () => {
    const total10 = { ...referenceSpring, activeCoils: undefined, totalCoils: 10 };
    expect(analyseSpec(specOf({ ...total10, ends: 'closed-ground' })).activeCoils).toBe(8);
    expect(analyseSpec(specOf({ ...total10, ends: 'open' })).activeCoils).toBe(10);
  });

  it('lot wire is start quantity × length plus setup scrap, in metres and kg whatever the job\'s units', () => {
    const plan = planManufacture(specOf(valveSpringMetric), settings, 1000);
    const { startQuantity: n, metres, kg } = plan.lotWire;
    expect(metres).toBeCloseTo((n * plan.wireLengthPerPiece) / 1000 + settings.costing.setupScrapMetres, 9);
    expect(kg).toBeCloseTo(7.85e-6 * Math.PI * metres * 1000, 9);
  });
});

describe('inspection plan', () => {
  it('samples by ISO 2859-1 level II: lot 1 000 at AQL 1.0 is code J, 80 pieces, Ac 2 / Re 3 (shop-practice §8 row 16)', () => {
    const plan = planManufacture(specOf(valveSpringMetric), settings, 1000);
    expect(plan.inspection).toMatchObject({ code: 'J', sampleSize: 80, accept: 2, reject: 3, hundredPercent: false });
  });

  it('a specified load makes the free length a reference dimension (EN 15800, from memory)', () => {
    const plan = planManufacture(specOf(valveSpringMetric), settings, 1000);
    const names = plan.inspection.characteristics.map((c) => c.name);
    expect(names).toContain('Free length (reference)');
    const force = plan.inspection.characteristics.find((c) => c.name === 'Force at L2')!;
    expect(force.lower).toBeCloseTo(63, 9);
    expect(force.upper).toBeCloseTo(77, 9);
  });

  it('the OD carries the EN 15800 grade-2 tolerance ±0.45 mm for D 20, w 10 (shop-practice §8 row 2)', () => {
    const plan = planManufacture(specOf(valveSpringMetric), settings, 1000);
    const od = plan.inspection.characteristics.find((c) => c.name === 'Outside diameter')!;
    expect(od.upper! - od.nominal).toBeCloseTo(0.45, 9);
  });

  it('a load tolerance under ±5 % means every piece is load tested', () => {
    const tight = { ...valveSpringMetric, loads: [{ length: 35, force: 64, tolerancePercent: 3 }] };
    const plan = planManufacture(specOf(tight), settings, 1000);
    expect(plan.inspection.characteristics.find((c) => c.name === 'Force at L1')!.everyPiece).toBe(true);
  });

  it('an inch job converts limits back to inches', () => {
    const inch = { ...referenceSpring, units: 'inch', wireDiameter: 2 / MM_PER_IN, meanDiameter: 20 / MM_PER_IN, freeLength: 60 / MM_PER_IN,
      materialOverrides: undefined };
    const plan = planInSpecUnits(planManufacture(specOf(inch), settings, 1000));
    const od = plan.inspection.characteristics.find((c) => c.name.startsWith('Outside diameter'))!;
    expect(od.nominal).toBeCloseTo(22 / MM_PER_IN, 9);
    expect(plan.freeLength).toBeCloseTo(60 / MM_PER_IN, 9);
  });
});
