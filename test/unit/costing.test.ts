import { describe, expect, it } from 'vitest';
import { estimateCost } from '../../core/costing/estimate';
import { settingsSchema } from '../../core/settings/schema';
import type { Settings, SettingsInput } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { referenceSpring, valveSpringMetric } from '../fixtures/specs';

/** An invented shop (demo data) with round numbers, so the example below can be worked by hand. */
const handShop: SettingsInput = {
  defaults: { currency: 'EUR' },
  machines: [
    { id: 'c1', name: 'Coiler 1', operation: 'coil', wireRange: { min: 0.5, max: 4 }, hourlyRate: 60, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'c2', name: 'Coiler 2 (heavy)', operation: 'coil', wireRange: { min: 3, max: 12 }, hourlyRate: 90, setupMinutes: 60,
      speedModel: { feedMetresPerMinute: 30, maxPiecesPerMinute: 20 } },
    { id: 'o1', name: 'Oven', operation: 'stress-relieve', wireRange: { min: 0, max: 20 }, hourlyRate: 30, setupMinutes: 0,
      batch: { capacityPieces: 5000, cycleMinutes: 60 } },
    { id: 'g1', name: 'Grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 50, setupMinutes: 15,
      speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 20 } },
  ],
  materialPrices: [
    { grade: 'en10270-1-sm', dMin: 1, dMax: 3, pricePerKg: 3.5, date: '2026-01-05', supplier: 'Old price' },
    { grade: 'en10270-1-sm', dMin: 1, dMax: 3, pricePerKg: 4, date: '2026-10-01', supplier: 'Demo Wire Co.' },
  ],
  costing: {
    scrapPercentByOperation: { coil: 2 }, setupScrapMetres: 5, overheadPercent: 25, marginPercent: 20,
    inspectionHourlyRate: 45, firstArticleMinutes: 20, inspectionMinutesPerPiece: 0.5, packagingPerPiece: 0.01,
    minimumOrderValue: 150,
  },
};

const settingsOf = (input: SettingsInput): Settings => settingsSchema.parse(input);
const specOf = (input: unknown): Spec => {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};

describe('a cost example worked by hand (reference spring d 2, D 20, 8 active, 10 total, L0 60, 1 000 pieces)', () => {
  const estimate = estimateCost(specOf(referenceSpring), settingsOf(handShop), [1000]);
  const b = estimate.breaks[0]!;
  const line = (key: string) => b.lines.find((l) => l.key === key)!.amount;

  // Developed wire per piece, closed and ground ends: 8·√((π·20)² + 7²) + 2·π·20 = 505.765 + 125.664 = 631.428 mm.
  // Start quantity: 1000 / (1 − 0.02) = 1020.4 → 1021 pieces (only coiling has a scrap rate here).
  it('starts 1 021 pieces', () => expect(b.startQuantity).toBe(1021));

  // Wire: 1021 × 0.631428 m + 5 m setup = 649.69 m; mass 7.85 kg/dm³ × π·1² mm² × 649 690 mm = 16.022 kg;
  // × 4.00/kg (the newest price for the grade and size) = 64.09.
  // Every line is worked to the cent from the figures its basis prints (the kg to 0.001).
  it('material 64.09', () => expect(line('material')).toBe(64.09));

  // Coiler 1 (cheapest that takes 2 mm): setup 30 min × 60/h = 30.00; rate 60 × min(60 000/631.428, 80) = 4 800 pcs/h,
  // run 1021/4800 h × 60 = 12.7625 → 12.76.
  it('coiling setup 30.00 and run 12.76', () => {
    expect(line('coil:setup')).toBe(30);
    expect(line('coil:run')).toBe(12.76);
  });

  // Oven: one batch (1 021 ≤ 5 000) × 60 min × 30/h = 30.00. Grinder: 15 min × 50/h = 12.50; 1021/1200 h × 50 = 42.54.
  it('stress relief 30.00, grinding 12.50 + 42.54', () => {
    expect(line('stress-relieve:batches')).toBe(30);
    expect(line('grind:setup')).toBe(12.5);
    expect(line('grind:run')).toBe(42.54);
  });

  // Inspection: ISO 2859-1 level II, lot 1 000 → code J, 80 pieces; (20 + 80 × 0.5) min × 45/h = 45.00.
  // Packaging 1 000 × 0.01 = 10.00.
  it('inspection 45.00 and packaging 10.00', () => {
    expect(line('inspection')).toBe(45);
    expect(line('packaging')).toBe(10);
  });

  // Internal operations 30 + 12.76 + 30 + 12.50 + 42.54 + 45 = 172.80; overhead 25 % = 43.20.
  // Cost 64.09 + 172.80 + 10 + 43.20 = 290.09; margin 20 % = 58.02 (58.018); total 348.11; unit 0.34811.
  it('overhead, margin, total and unit price', () => {
    expect(line('overhead')).toBe(43.2);
    expect(line('margin')).toBe(58.02);
    expect(b.total).toBe(348.11);
    expect(b.unitPrice).toBeCloseTo(0.34811, 9);
    expect(estimate.currency).toBe('EUR');
    expect(estimate.missing).toEqual([]);
  });
});

describe('price breaks', () => {
  it('unit price falls (or holds) as the quantity rises', () => {
    const e = estimateCost(specOf(valveSpringMetric), settingsOf(handShop), [10, 100, 500, 1000, 5000, 20000]);
    for (let i = 1; i < e.breaks.length; i++) {
      expect(e.breaks[i]!.unitPrice).toBeLessThanOrEqual(e.breaks[i - 1]!.unitPrice + 1e-12);
    }
  });

  it('a small order is raised to the minimum order value', () => {
    const b = estimateCost(specOf(referenceSpring), settingsOf(handShop), [5]).breaks[0]!;
    expect(b.total).toBe(150);
    expect(b.lines.some((l) => l.group === 'minimum')).toBe(true);
  });

  it('uses the spec\'s quantity breaks when none are given', () => {
    const e = estimateCost(specOf({ ...referenceSpring, quantities: [2500, 250] }), settingsOf(handShop));
    expect(e.breaks.map((b) => b.quantity)).toEqual([250, 2500]);
  });

  it('names what it could not cost', () => {
    const e = estimateCost(specOf({ ...referenceSpring, material: 'astm-a228' }), settingsOf(handShop), [1000]);
    expect(e.missing.map((m) => m.code)).toContain('no-wire-price');
  });
});

describe('a settings change moves exactly the lines it should', () => {
  it('a dearer coiler changes the coiling lines, overhead and margin, and nothing else', () => {
    const spec = specOf(referenceSpring);
    const before = estimateCost(spec, settingsOf(handShop), [1000]).breaks[0]!;
    const dearer = structuredClone(handShop);
    dearer.machines![0]!.hourlyRate = 75;
    const after = estimateCost(spec, settingsOf(dearer), [1000]).breaks[0]!;
    const changed = before.lines.filter((l, i) => Math.abs(l.amount - after.lines[i]!.amount) > 1e-9).map((l) => l.key);
    expect(changed).toEqual(['coil:setup', 'coil:run', 'overhead', 'margin']);
    expect(after.lines[1]!.amount).toBe(37.5); // 30 min × 75/h
  });

  it('a new wire price changes the material line (and what is computed from it) only', () => {
    const spec = specOf(referenceSpring);
    const before = estimateCost(spec, settingsOf(handShop), [1000]).breaks[0]!;
    const cheaper = structuredClone(handShop);
    cheaper.materialPrices!.push({ grade: 'en10270-1-sm', dMin: 1, dMax: 3, pricePerKg: 2, date: '2026-11-20', supplier: 'New' });
    const after = estimateCost(spec, settingsOf(cheaper), [1000]).breaks[0]!;
    const changed = before.lines.filter((l, i) => Math.abs(l.amount - after.lines[i]!.amount) > 1e-9).map((l) => l.key);
    expect(changed).toEqual(['material', 'margin']);
    expect(after.lines[0]!.amount).toBe(32.04); // 16.022 kg × 2.00
  });
});
