import { describe, expect, it } from 'vitest';
import { planManufacture } from '../../core/process/plan';
import { checkWireStock } from '../../core/process/wire-stock';
import { settingsSchema } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { valveSpringMetric } from '../fixtures/specs';

const specOf = (input: unknown): Spec => {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};

/** An invented shop (demo data) with a coiler and stock of its own. */
const shop = (wireStock: unknown[], extra: Record<string, unknown> = {}) => settingsSchema.parse({
  machines: [{ id: 'c1', name: 'Coiler (demo)', operation: 'coil', wireRange: { min: 0.2, max: 6 }, hourlyRate: 60, setupMinutes: 45,
    speedModel: { feedMetresPerMinute: 40, maxPiecesPerMinute: 30 } }],
  wireStock, ...extra,
});

describe('the plan against the wire stock', () => {
  const spec = specOf(valveSpringMetric);

  it('weighs the lot from developed length × start quantity plus setup scrap, and uses stock that covers it, naming the heat', () => {
    const plan = planManufacture(spec, shop([{ grade: 'en10270-1-dh', d: 2, kg: 40, heatNumber: 'H-7781 (demo)' }]), 2000);
    // Mass of a round wire: ρ·(π/4)·d²·L (derived); ρ = 7.85 g/cm³ = 7.85e-6 kg/mm³ from the spec's override.
    const metres = (plan.lotWire.startQuantity * plan.wireLengthPerPiece) / 1000 + 5; // 5 m: the demo setup scrap
    const kg = 7.85e-6 * (Math.PI / 4) * 2 ** 2 * metres * 1000;
    expect(plan.lotWire.kg).toBeCloseTo(kg, 6);
    expect(plan.lotWire.startQuantity).toBeGreaterThan(2000); // scrap allowance
    const stock = plan.lotWire.stock;
    expect(stock).toMatchObject({ status: 'enough', onHandKg: 40, lots: [{ heatNumber: 'H-7781 (demo)', kg: 40 }] });
    expect(stock.neededKg).toBeCloseTo(kg, 6);
    expect(stock.text).toMatch(/^Use stock: 40\.0 kg on hand at 2\.00 mm for the \d+\.?\d* kg the lot needs, heat\/lot H-7781 \(demo\)\.$/);
  });

  it('says how much more to order when stock is short, and "order wire" when the size is not stocked', () => {
    const short = planManufacture(spec, shop([{ grade: 'en10270-1-dh', d: 2, kg: 1 }, { grade: 'en10270-1-dh', d: 2, kg: 0.5, heatNumber: 'H-12' }]), 2000).lotWire.stock;
    expect(short.status).toBe('short');
    expect(short.onHandKg).toBe(1.5);
    expect(short.text).toMatch(/^Order wire: .* more; 1\.50 kg on hand at 2\.00 mm against .* needed, heat\/lot H-12\.$/);
    const none = planManufacture(spec, shop([{ grade: 'en10270-1-dh', d: 2.2, kg: 30 }, { grade: 'en10270-1-dh', d: 1.8, kg: 30 }, { grade: 'en10270-1-sh', d: 2, kg: 30 }]), 2000).lotWire.stock;
    expect(none.status).toBe('order');
    expect(none.otherSizes).toEqual([2.2, 1.8]); // by ratio: ln(2.2/2) = 0.095 < ln(2/1.8) = 0.105, so 2.2 is nearer
    expect(none.text).toMatch(/^Order wire: .* at 2\.00 mm; none of this grade and size on the stock list \(stocked in this grade: 2\.20 mm, 1\.80 mm\)\.$/);
  });

  it('takes metric stock for an inch job of the same size, and shows inch sizes with kg and lb', () => {
    // 0.063 in = 1.6002 mm: the same nominal wire as 1.6 mm stock (within SAME_SIZE).
    const check = checkWireStock([{ grade: 'astm-a228', d: 1.6, kg: 2, heatNumber: 'L-4 (demo)' }], 'astm-a228', 0.063 * 25.4, 1, 'inch');
    expect(check.status).toBe('enough');
    expect(check.text).toBe('Use stock: 2.00 kg (4.41 lb) on hand at 0.063 in for the 1.00 kg (2.20 lb) the lot needs, heat/lot L-4 (demo).');
  });
});

describe('the shop\'s own compression tables in the plan', () => {
  it('reads the load and free-length tolerances from the shop\'s settings', () => {
    const spec = specOf({ ...valveSpringMetric, loads: [{ length: 35, force: 70 }] });
    const demo = planManufacture(spec, shop([]), 500);
    const force = (p: typeof demo) => p.inspection.characteristics.find((c) => c.name === 'Force at L1')!;
    // 8 active coils (10 total, closed ends) in the demo grade-2 band 3–10 coils: ±10 %.
    expect(force(demo).upper! - 70).toBeCloseTo(7, 9);
    const tables = structuredClone(shop([]).toleranceTables);
    tables.load.rows.filter((r) => r.grade === 2).forEach((r) => { r.percent = 6; });
    const own = planManufacture(spec, shop([], { toleranceTables: tables }), 500);
    expect(force(own).upper! - 70).toBeCloseTo(4.2, 9);
    expect(force(own).source).toBe("the shop's load table (Settings → Tolerances)");
  });

  it('refuses a table with a gap between bands, naming the row', () => {
    const tables = structuredClone(shop([]).toleranceTables);
    tables.legLength.rows[1]!.over = 30;
    const r = settingsSchema.shape.toleranceTables.safeParse(tables);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['legLength', 'rows', 1]);
  });
});
