import { describe, expect, it } from 'vitest';
import { estimateCost, pricedQuantities } from '../../core/costing/estimate';
import { breaksAround, roundUnitPrice } from '../../core/costing/rounding';
import { quoteDocument } from '../../core/documents/quote';
import { planManufacture } from '../../core/process/plan';
import { jobJudgementSchema } from '../../core/quoting/judgement';
import type { JobJudgementInput } from '../../core/quoting/judgement';
import { settingsSchema } from '../../core/settings/schema';
import type { Settings, SettingsInput } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { referenceSpring } from '../fixtures/specs';

/** Invented shop (demo data): two grinders, an oven, a packing bench and two extra operations. */
const shop: SettingsInput = {
  machines: [
    { id: 'c1', name: 'Coiler 1', operation: 'coil', wireRange: { min: 0.5, max: 4 }, hourlyRate: 60, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'o1', name: 'Oven', operation: 'stress-relieve', wireRange: { min: 0, max: 20 }, hourlyRate: 30, setupMinutes: 0,
      batch: { capacityPieces: 5000, cycleMinutes: 60 } },
    { id: 'g-fast', name: 'Fast grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 60, setupMinutes: 40, piecesPerHour: 1500 },
    { id: 'g-slow', name: 'Slow grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 38, setupMinutes: 15, piecesPerHour: 300 },
    { id: 'p1', name: 'Packing bench', operation: 'pack', wireRange: { min: 0, max: 20 }, hourlyRate: 30, setupMinutes: 5, piecesPerHour: 2500 },
  ],
  materialPrices: [{ grade: 'en10270-1-sm', dMin: 1, dMax: 3, pricePerKg: 4, date: '2026-10-01', supplier: 'Demo Wire Co.' }],
  extraOperations: [{ id: 'tumble', name: 'Tumble deburr', hourlyRate: 32, setupMinutes: 10, piecesPerHour: 4000 }],
  costing: { scrapPercentByOperation: { coil: 2, grind: 1 }, marginPercent: 20 },
};
const settingsOf = (input: SettingsInput): Settings => settingsSchema.parse(input);
const judged = (input: JobJudgementInput) => jobJudgementSchema.parse(input);
const spec: Spec = (() => {
  const r = parseSpec(referenceSpring);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
})();

describe('routing overrides', () => {
  it('a pinned machine stays pinned, whatever the lot cost or a later rate change says, with the shop\'s pick beside it', () => {
    const pin = judged({ routing: [{ operation: 'grind', machine: 'g-fast', reason: 'slow grinder booked for a month' }] });
    for (const rate of [60, 500]) {
      const s = settingsOf({ ...shop, machines: shop.machines!.map((m) => (m.id === 'g-fast' ? { ...m, hourlyRate: rate } : m)) });
      const grind = planManufacture(spec, s, 100, pin).operations.find((o) => o.key === 'grind')!;
      expect(grind.workCentre?.id).toBe('g-fast');
      expect(grind.choice?.basis).toBe('pinned');
      expect(grind.overrides).toEqual([{ field: 'machine', value: 'Fast grinder', shopDefault: 'Slow grinder', reason: 'slow grinder booked for a month' }]);
      expect(grind.choice?.difference).toBeLessThan(0); // the runner-up is cheaper: pinning costs this much
    }
  });

  it('set-up, run rate and scrap as the estimator set them, the shop figure kept beside each', () => {
    const j = judged({ routing: [{ operation: 'coil', setupMinutes: 50, piecesPerHour: 3000, scrapPercent: 4, reason: 'new tooling, first run' }] });
    const coil = planManufacture(spec, settingsOf(shop), 1000, j).operations.find((o) => o.key === 'coil')!;
    expect(coil.setupMinutes).toBe(50);
    expect(coil.piecesPerHour).toBe(3000);
    expect(coil.scrapFraction).toBe(0.04);
    // Shop: 30 min set-up; 60 × min(60 000 / 631.428, 80) = 4 800 pcs/h; coiling scrap 2 %.
    expect(coil.overrides.map((o) => [o.field, o.value, o.shopDefault])).toEqual([['setupMinutes', 50, 30], ['piecesPerHour', 3000, 4800], ['scrapPercent', 4, 2]]);
    const b = estimateCost(spec, settingsOf(shop), [1000], { judgement: j }).breaks[0]!;
    expect(b.lines.find((l) => l.key === 'coil:setup')!.amount).toBe(50); // 50 min × 60/h
    expect(b.startQuantity).toBe(Math.ceil(1000 / (0.96 * 0.99) - 1e-9));
  });

  it('removes an operation with its reason, and adds one from the shop\'s list before packing', () => {
    const j = judged({ routing: [{ operation: 'grind', remove: true, reason: 'customer grinds in house' }], added: [{ operation: 'tumble', reason: 'burr-free ends asked on the order' }] });
    const plan = planManufacture(spec, settingsOf(shop), 1000, j);
    expect(plan.removed).toEqual([{ key: 'grind', title: 'Grind ends', reason: 'customer grinds in house' }]);
    expect(plan.operations.map((o) => o.key)).toEqual(['coil', 'stress-relieve', 'load-test', 'extra:tumble', 'pack']);
    expect(plan.operations.map((o) => o.sequence)).toEqual([10, 20, 30, 40, 50]);
    const lines = estimateCost(spec, settingsOf(shop), [1000], { judgement: j }).breaks[0]!.lines;
    expect(lines.some((l) => l.key.startsWith('grind'))).toBe(false);
    expect(lines.find((l) => l.key === 'extra:tumble:setup')!.amount).toBe(5.33); // 10 min × 32/h
  });

  it('an added operation the shop does not list is an open error naming the field', () => {
    const plan = planManufacture(spec, settingsOf(shop), 100, judged({ added: [{ operation: 'polish', reason: 'asked for a shine' }] }));
    expect(plan.findings.find((f) => f.code === 'unknown-extra-operation')).toMatchObject({ severity: 'error', path: 'judgement.added[0].operation' });
  });

  it('every override needs a short reason', () => {
    const r = jobJudgementSchema.safeParse({ routing: [{ operation: 'coil', setupMinutes: 10, reason: '' }] });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['routing', 0, 'reason']);
  });
});

describe('price overrides', () => {
  it('a margin override prints the shop margin and the reason in its basis', () => {
    const b = estimateCost(spec, settingsOf(shop), [1000], { judgement: judged({ price: { marginPercent: { value: 12, reason: 'repeat customer, volume' } } }) }).breaks[0]!;
    const margin = b.lines.find((l) => l.key === 'margin')!;
    expect(margin.basis).toMatch(/^12 % of cost [\d.]+ \(shop 20 %: repeat customer, volume\)$/);
    const cost = Number(/of cost ([\d.]+)/.exec(margin.basis)![1]);
    expect(margin.amount).toBe(Math.round(cost * 12) / 100);
  });

  it('a unit price set for a break is the price, the difference a line of its own with the reason', () => {
    const j = judged({ price: { unitPrices: [{ quantity: 1000, unitPrice: 0.42, reason: 'matched the customer\'s target' }] } });
    const e = estimateCost(spec, settingsOf(shop), [100, 1000], { judgement: j });
    const b = e.breaks[1]!;
    expect(b.unitPrice).toBe(0.42);
    expect(b.total).toBe(420);
    expect(b.lines.find((l) => l.key === 'unit-price')!.basis).toMatch(/^1000 pcs × 0\.42 \(computed [\d.]+\): matched the customer's target$/);
    expect(e.breaks[0]!.lines.some((l) => l.key === 'unit-price')).toBe(false);
  });

  it('one-off charges are their own lines, charged once, and print as their own rows of the quote', () => {
    const j = judged({ price: { charges: [{ label: 'Tooling', amount: 250 }, { label: 'First-article inspection report', amount: 85 }] } });
    const e = estimateCost(spec, settingsOf(shop), [100, 1000], { judgement: j });
    expect(e.charges.map((c) => [c.key, c.item, c.amount])).toEqual([['charge:1', 'Tooling', 250], ['charge:2', 'First-article inspection report', 85]]);
    const plain = estimateCost(spec, settingsOf(shop), [100, 1000]);
    expect(e.breaks.map((b) => b.total)).toEqual(plain.breaks.map((b) => b.total));
    const doc = quoteDocument({ spec, settings: settingsOf(shop), estimate: e, issuedAt: '2026-11-02T09:00:00Z',
      job: { number: null, customerName: null, partNumber: '', drawingNumber: '', drawingRevision: '', leadTimeDays: null } });
    expect(doc.lines[0]!.prices.table.rows.slice(2)).toEqual([['Tooling, once per order', '', '250.00'], ['First-article inspection report, once per order', '', '85.00']]);
  });

  it('the shop\'s rounding rule sets the unit price, and the total is that price times the quantity', () => {
    expect(roundUnitPrice(0.348109, { rule: 'significant', digits: 4 })).toBe(0.3481);
    expect(roundUnitPrice(12.3432, { rule: 'step', step: 0.005 })).toBe(12.345);
    const rounded = settingsOf({ ...shop, costing: { ...shop.costing, unitPriceRounding: { rule: 'step', step: 0.005 } } });
    for (const b of estimateCost(spec, rounded, [100, 1000, 5000]).breaks) {
      expect(Math.abs(b.unitPrice / 0.005 - Math.round(b.unitPrice / 0.005))).toBeLessThan(1e-9);
      expect(b.total).toBe(Math.round(b.unitPrice * b.quantity * 100) / 100);
      expect(b.total).toBeCloseTo(b.lines.reduce((a, l) => a + l.amount, 0), 9);
    }
  });
});

describe('breaks', () => {
  it('the order quantity is always priced; with no breaks given, the shop\'s breaks are chosen around it', () => {
    const s = settingsOf(shop);
    expect(breaksAround(800, [0.5, 1, 2, 5])).toEqual([400, 800, 1600, 4000]);
    expect(pricedQuantities(spec, s, undefined, 800)).toEqual([400, 800, 1600, 4000]);
    expect(pricedQuantities({ ...spec, quantities: [100, 1000] }, s, undefined, 800)).toEqual([100, 800, 1000]);
    expect(pricedQuantities(spec, s, undefined, null)).toEqual([100, 1000, 5000]);
    expect(breaksAround(333, [0.5, 1, 3])).toEqual([170, 333, 1000]);
  });
});

describe('overrides on the cost lines', () => {
  it('a set-up override says so in the line\'s basis, with the shop figure and the reason', () => {
    const j = judged({ routing: [{ operation: 'coil', setupMinutes: 50, reason: 'new tooling, first run' }] });
    const setup = estimateCost(spec, settingsOf(shop), [1000], { judgement: j }).breaks[0]!.lines.find((l) => l.key === 'coil:setup')!;
    expect(setup.basis).toBe('50 min × 60.00/h (Coiler 1); set for this job (shop 30 min): new tooling, first run');
  });
});

describe('a pin the machine cannot honour', () => {
  it('is a warning naming the pin, and the cheapest capable machine is planned', () => {
    const s = settingsOf({ ...shop, machines: shop.machines!.map((m) => (m.id === 'g-fast' ? { ...m, wireRange: { min: 3, max: 8 } } : m)) });
    const plan = planManufacture(spec, s, 100, judged({ routing: [{ operation: 'grind', machine: 'g-fast', reason: 'preferred grinder' }] }));
    expect(plan.operations.find((o) => o.key === 'grind')!.workCentre?.id).toBe('g-slow');
    expect(plan.findings.find((f) => f.code === 'pinned-machine-cannot-run')).toMatchObject({ severity: 'warning', path: 'judgement.routing[0].machine' });
  });
});
