import { describe, expect, it } from 'vitest';
import { jobInputSchema } from '../../core/api/store';
import { parseSettingsPatch } from '../../core/settings/schema';
import { settingBounds } from '../../core/settings/bounds';
import { zodErrors } from '../../core/validation';

const coiler = { id: 'c1', name: 'Coiler (demo)', operation: 'coil', wireRange: { min: 0.2, max: 6 }, hourlyRate: 70, setupMinutes: 40,
  speedModel: { feedMetresPerMinute: 45, maxPiecesPerMinute: 60 } };

const pathsOf = (raw: unknown): string[] => {
  const r = parseSettingsPatch(raw);
  return r.ok ? [] : r.errors.map((e) => e.path);
};

describe('shop settings and job fields have plausible ranges', () => {
  it.each([
    [{ machines: [{ ...coiler, hourlyRate: 1e300 }] }, 'machines[0].hourlyRate'],
    [{ machines: [{ ...coiler, setupMinutes: 1e12 }] }, 'machines[0].setupMinutes'],
    [{ machines: [{ ...coiler, speedModel: { feedMetresPerMinute: 1e-300, maxPiecesPerMinute: 60 } }] }, 'machines[0].speedModel.feedMetresPerMinute'],
    [{ machines: [{ ...coiler, wireRange: { min: 0, max: 1e9 } }] }, 'machines[0].wireRange.max'],
    [{ materialPrices: [{ grade: 'astm-a228', dMin: 0, dMax: 1e6, pricePerKg: 5, date: '2026-01-01' }] }, 'materialPrices[0].dMax'],
    [{ wireStock: [{ grade: 'astm-a228', d: 1, kg: 1e15 }] }, 'wireStock[0].kg'],
    [{ costing: { inspectionMinutesPerPiece: 1e200 } }, 'costing.inspectionMinutesPerPiece'],
    [{ numbering: { next: 1e15 } }, 'numbering.next'],
  ])('%#: refuses an absurd value at %s', (raw, path) => {
    expect(pathsOf(raw)).toContain(path);
  });

  it('keeps ordinary values', () => {
    expect(pathsOf({ machines: [coiler], costing: { inspectionMinutesPerPiece: 0.5 } })).toEqual([]);
  });

  it('gives every setting bound a reason', () => {
    for (const [name, b] of Object.entries(settingBounds)) expect(b.reason.length, name).toBeGreaterThan(20);
  });

  it('refuses an order of 1e15 pieces on a job', () => {
    const parsed = jobInputSchema.safeParse({ orderQuantity: 1e15, spec: {} });
    expect(parsed.success).toBe(false);
    expect(!parsed.success && zodErrors(parsed.error).map((e) => e.path)).toEqual(['orderQuantity']);
  });
});
