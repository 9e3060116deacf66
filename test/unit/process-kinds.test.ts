import { describe, expect, it } from 'vitest';
import { planManufacture } from '../../core/process/plan';
import { estimateCost } from '../../core/costing/estimate';
import { settingsSchema } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { drawbarExtension, lidTorsion } from '../fixtures/specs';

const specOf = (input: unknown): Spec => {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};

/** An invented shop (demo data). */
const settings = settingsSchema.parse({
  machines: [
    { id: 'c1', name: 'Coiler', operation: 'coil', wireRange: { min: 0.2, max: 6 }, hourlyRate: 60, setupMinutes: 45, speedModel: { feedMetresPerMinute: 40, maxPiecesPerMinute: 30 } },
    { id: 'l1', name: 'Loop former', operation: 'loop-form', wireRange: { min: 0.2, max: 6 }, hourlyRate: 40, setupMinutes: 20, speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 20 } },
    { id: 'f1', name: 'Leg former', operation: 'leg-form', wireRange: { min: 0.2, max: 6 }, hourlyRate: 40, setupMinutes: 20, speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 15 } },
  ],
  finishes: [{ id: 'zinc', name: 'Zinc plate', vendor: 'Demo Platers', pricePerKg: 3, lotMinimum: 90, electroplated: true }],
  materialPrices: [
    { grade: 'en10270-1-sh', dMin: 1, dMax: 2, pricePerKg: 3, date: '2026-09-01', supplier: 'Demo Wire' },
    { grade: 'astm-a228', dMin: 1, dMax: 3, pricePerKg: 4, date: '2026-09-01', supplier: 'Demo Wire' },
  ],
});

describe('extension spring plan', () => {
  const plan = planManufacture(specOf({ ...drawbarExtension, finish: 'zinc', bakeSpecification: 'ASTM B850' }), settings, 1000);

  it('coils close-wound, forms full loops on a second machine, never grinds, and never stretches for plating', () => {
    expect(plan.operations.map((o) => o.kind)).toEqual(['coil', 'loop-form', 'stress-relieve', 'finish', 'bake', 'load-test', 'pack']);
    expect(plan.operations[0]!.settings.find((s) => s.label.startsWith('Initial tension'))!.value).toBeCloseTo(8, 9);
    expect(plan.operations.find((o) => o.kind === 'finish')!.notes.join(' ')).toMatch(/never stretch/);
  });

  it('machine loops are formed on the coiler: no loop-forming operation', () => {
    const machine = planManufacture(specOf({ ...drawbarExtension, ends: ['machine-loop', 'machine-loop'] }), settings, 100);
    expect(machine.operations.some((o) => o.kind === 'loop-form')).toBe(false);
  });

  it('inspects the load at length and the free length inside the ends to DIN 2097 grade 2', () => {
    const free = plan.inspection.characteristics.find((c) => c.name === 'Free length inside ends')!;
    expect(free.source).toMatch(/DIN 2097/);
    expect(free.upper).toBeGreaterThan(free.nominal);
    expect(plan.freeLength).toBeCloseTo(53.25, 9);
  });

  it('prices like any other kind', () => {
    const e = estimateCost(specOf(drawbarExtension), settings, [100, 1000]);
    expect(e.breaks[1]!.unitPrice).toBeLessThan(e.breaks[0]!.unitPrice);
    expect(e.breaks[0]!.lines.map((l) => l.item)).toContain('Form loops: setup');
  });
});

describe('torsion spring plan', () => {
  const plan = planManufacture(specOf({ ...lidTorsion, legs: [{ length: 25, form: 'hooked' }, { length: 30 }], freeAngle: 90,
    loads: [{ angle: 60, torque: 400 }] }), settings, 500);

  it('coils with legs in the spring\'s own hand, forms the hooked leg, and torque-tests at angle', () => {
    expect(plan.operations.map((o) => o.kind)).toEqual(['coil', 'leg-form', 'stress-relieve', 'load-test', 'pack']);
    expect(plan.operations[0]!.settings.find((s) => s.label === 'Direction of wind')!.value).toBe('right');
    expect(plan.coiledFreeLength).toBeNull();
  });

  it('says torsion tolerances are the shop\'s own', () => {
    const torque = plan.inspection.characteristics.find((c) => c.name === 'Torque at 60°')!;
    expect(torque.lower).toBeCloseTo(360, 9);
    expect(torque.source).toMatch(/shop-entered/);
    // 5.25 body coils falls in the demo free-angle band over 3 up to 6 coils: ±(2° + 1.5° × 6) = ±11° (from memory).
    const angle = plan.inspection.characteristics.find((c) => c.name === 'Free angle between legs')!;
    expect(angle.upper! - angle.nominal).toBeCloseTo(11, 9);
    expect(angle.source).toMatch(/the shop's torsion free angle table .*still the demo defaults/);
    // Legs of 25 and 30 mm: the demo leg table's bands up to 25 mm (±0.5) and over 25 up to 50 mm (±0.8).
    const legs = plan.inspection.characteristics.filter((c) => c.name.startsWith('Leg '));
    expect(legs.map((c) => c.upper! - c.nominal).map((x) => Math.round(x * 1000) / 1000)).toEqual([0.5, 0.8]);
  });

  it('reads the shop\'s own torsion tables once the shop edits them, and names them as the shop\'s', () => {
    const tables = structuredClone(settings.toleranceTables);
    tables.freeAngle.rows[1]!.plusMinus = 4;
    tables.legLength.rows[0]!.plusMinus = 0.3;
    const own = planManufacture(specOf({ ...lidTorsion, legs: [{ length: 25, form: 'hooked' }, { length: 30 }], freeAngle: 90,
      loads: [{ angle: 60, torque: 400 }] }), { ...settings, toleranceTables: tables }, 500);
    const angle = own.inspection.characteristics.find((c) => c.name === 'Free angle between legs')!;
    expect(angle.upper! - angle.nominal).toBeCloseTo(4, 9);
    expect(angle.source).toBe("the shop's torsion free angle table (Settings → Tolerances)");
    expect(own.inspection.characteristics.find((c) => c.name === 'Leg 1 length')!.upper! - 25).toBeCloseTo(0.3, 9);
  });
});
