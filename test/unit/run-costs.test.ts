import { describe, expect, it } from 'vitest';
import { costChanges } from '../../core/costing/changes';
import { estimateCost } from '../../core/costing/estimate';
import { planManufacture } from '../../core/process/plan';
import { settingsSchema } from '../../core/settings/schema';
import type { Settings, SettingsInput } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { referenceSpring } from '../fixtures/specs';

/**
 * An invented shop (demo data) with two end grinders: a fast one dear to set up and a slow one cheap to set
 * up. Which is cheaper depends on the lot, as any estimator works it: set-up + run + scrapped wire.
 */
const twoGrinders = (over: Partial<Record<'fast' | 'slow', Record<string, unknown>>> = {}): SettingsInput => ({
  machines: [
    { id: 'c1', name: 'Coiler 1', operation: 'coil', wireRange: { min: 0.5, max: 4 }, hourlyRate: 60, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
    { id: 'o1', name: 'Oven', operation: 'stress-relieve', wireRange: { min: 0, max: 20 }, hourlyRate: 30, setupMinutes: 0,
      batch: { capacityPieces: 5000, cycleMinutes: 60 } },
    { id: 'g-fast', name: 'Fast grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 60, setupMinutes: 40,
      piecesPerHour: 1500, ...over.fast },
    { id: 'g-slow', name: 'Slow grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 38, setupMinutes: 15,
      piecesPerHour: 300, ...over.slow },
  ],
  materialPrices: [{ grade: 'en10270-1-sm', dMin: 1, dMax: 3, pricePerKg: 4, date: '2026-10-01', supplier: 'Demo Wire Co.' }],
  costing: { scrapPercentByOperation: { coil: 2, grind: 1 }, packagingPerPiece: 0.015 },
});

const settingsOf = (input: SettingsInput): Settings => settingsSchema.parse(input);
const spec: Spec = (() => {
  const r = parseSpec(referenceSpring);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
})();

// Wire in one piece (closed and ground, derived from the helix): 631.428 mm; mass π·1²·631.428·7.85e-6 = 0.015572 kg;
// at 4.00/kg a scrapped piece throws away 0.062288 of wire.
const PIECE_VALUE = Math.PI * 631.428 * 7.85e-6 * 4;

const grindOf = (quantity: number, settings: Settings) => {
  const plan = planManufacture(spec, settings, quantity);
  return { plan, grind: plan.operations.find((o) => o.key === 'grind')! };
};

describe('work centre by lowest lot cost (set-up + run + scrap), not lowest hourly rate', () => {
  // Lot cost, worked by hand for s pieces started:
  //   fast: 40 min × 60/h + s ÷ 1500 × 60 + s × 1 % × value = 40 + 0.04 s + 0.01 s·v
  //   slow: 15 min × 38/h + s ÷ 300 × 38 + s × 1 % × value = 9.5 + 0.12667 s + 0.01 s·v
  const fast = (s: number) => 40 + (s / 1500) * 60 + s * 0.01 * PIECE_VALUE;
  const slow = (s: number) => 9.5 + (s / 300) * 38 + s * 0.01 * PIECE_VALUE;

  it('a short lot goes to the slow grinder, with the fast one as runner-up and the difference', () => {
    const { plan, grind } = grindOf(100, settingsOf(twoGrinders()));
    const s = plan.lotWire.startQuantity;
    expect(grind.workCentre?.id).toBe('g-slow');
    expect(grind.choice?.basis).toBe('lowest lot cost');
    expect(grind.choice?.lotCost).toBeCloseTo(slow(s), 2);
    expect(grind.choice?.runnerUp?.id).toBe('g-fast');
    expect(grind.choice?.difference).toBeCloseTo(fast(s) - slow(s), 1);
  });

  it('a long lot goes to the fast grinder although its hourly rate is higher', () => {
    const { plan, grind } = grindOf(10_000, settingsOf(twoGrinders()));
    const s = plan.lotWire.startQuantity;
    expect(grind.workCentre?.id).toBe('g-fast');
    expect(grind.choice?.runnerUp?.id).toBe('g-slow');
    expect(grind.choice?.difference).toBeCloseTo(slow(s) - fast(s), 1);
  });

  it('a machine that scraps more loses on the wire it throws away', () => {
    // Same speeds and rates; only the scrap differs: 5 % on one machine against the operation's 1 %.
    const even = twoGrinders({ slow: { hourlyRate: 60, setupMinutes: 40, piecesPerHour: 1500, scrapPercent: 5 } });
    const { grind } = grindOf(1000, settingsOf(even));
    expect(grind.workCentre?.id).toBe('g-fast');
    expect(grind.choice?.difference).toBeGreaterThan(0);
  });
});

describe('every in-house operation has a run cost with its basis', () => {
  const big = estimateCost(spec, settingsOf(twoGrinders()), [10_000]).breaks[0]!;
  const line = (key: string) => big.lines.find((l) => l.key === key);

  it('a 10 000-piece closed-and-ground lot shows grinding run time, worked from its basis', () => {
    const s = big.startQuantity;
    const run = line('grind:run')!;
    expect(run.basis).toBe(`${s} pcs ÷ 1500 pcs/h × 60.00/h (Fast grinder)`);
    expect(run.amount).toBe(Math.round((s / 1500) * 60 * 100) / 100);
    expect(line('grind:setup')!.basis).toBe('40 min × 60.00/h (Fast grinder)');
  });

  it('ovens run in whole batch loads', () => {
    const s = big.startQuantity;
    const batches = Math.ceil(s / 5000);
    expect(line('stress-relieve:batches')!.basis).toBe(`${batches} × 60 min × 30.00/h (Oven, up to 5000 pcs per batch)`);
    expect(line('stress-relieve:batches')!.amount).toBe(batches * 30);
  });

  it('basis text prints the figure charged: 0.015 per piece, not 0.01', () => {
    expect(line('packaging')!.basis).toBe('10000 pcs × 0.015');
    expect(line('packaging')!.amount).toBe(150);
  });

  it('every line has its own key, stable whatever the text says', () => {
    const keys = big.lines.map((l) => l.key);
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys).toEqual(['material', 'coil:setup', 'coil:run', 'stress-relieve:batches', 'grind:setup', 'grind:run',
      'inspection', 'packaging', 'overhead', 'margin']);
  });

  it('a machine with no run model is named as a gap in the price, its set-up still charged', () => {
    const input = twoGrinders();
    input.machines = input.machines!.filter((m) => m.id !== 'g-slow').map((m) => (m.id === 'g-fast' ? { ...m, piecesPerHour: undefined } : m));
    const e = estimateCost(spec, settingsOf(input), [1000]);
    expect(e.missing.map((m) => m.code)).toEqual(['no-run-model']);
    expect(e.missing[0]!.message).toMatch(/Grind ends: Fast grinder has no run rate/);
    expect(e.breaks[0]!.lines.some((l) => l.key === 'grind:setup')).toBe(true);
    expect(e.breaks[0]!.lines.some((l) => l.key === 'grind:run')).toBe(false);
  });

  it('a peening cabinet with batch loads is costed by the batch', () => {
    const input = twoGrinders();
    input.machines!.push({ id: 'p1', name: 'Peen cabinet', operation: 'shot-peen', wireRange: { min: 1, max: 8 }, hourlyRate: 55,
      setupMinutes: 20, batch: { capacityPieces: 2000, cycleMinutes: 30 } });
    const pb = estimateCost({ ...spec, shotPeen: true } as Spec, settingsOf(input), [3000]).breaks[0]!;
    const batches = Math.ceil(pb.startQuantity / 2000);
    expect(pb.lines.find((l) => l.key === 'shot-peen:batches')!.amount).toBe(Math.round(batches * 0.5 * 55 * 100) / 100);
  });
});

describe('a settings change that re-routes a job shows exactly what moved', () => {
  it('a dearer fast grinder moves the long lot to the slow one; the short lot, already there, does not move', () => {
    const before = estimateCost(spec, settingsOf(twoGrinders()), [100, 10_000]);
    const after = estimateCost(spec, settingsOf(twoGrinders({ fast: { hourlyRate: 200 } })), [100, 10_000]);
    const moved = costChanges(before, after);
    expect(moved.machines).toEqual([{ quantity: 10_000, key: 'grind', title: 'Grind ends', from: 'Fast grinder', to: 'Slow grinder' }]);
    expect(moved.lines.map((l) => `${l.quantity} ${l.key}`)).toEqual(['10000 grind:setup', '10000 grind:run', '10000 overhead', '10000 margin']);
    const setup = moved.lines.find((l) => l.key === 'grind:setup')!;
    expect([setup.before, setup.after, setup.difference]).toEqual([40, 9.5, -30.5]);
    expect(moved.prices.map((p) => p.quantity)).toEqual([10_000]);
    const total = moved.prices[0]!;
    expect(total.difference).toBeCloseTo(total.totalAfter - total.totalBefore, 9);
  });
});
