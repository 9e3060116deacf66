import { settingsSchema } from '../../../core/settings/schema';
import type { Settings, SettingsInput } from '../../../core/settings/schema';
import { parseSpec } from '../../../core/spec';
import type { Spec } from '../../../core/spec';
import { valveSpringMetric } from '../../fixtures/specs';

/** DEMO DATA: an invented shop, its machines and prices round figures for tests only. */
export const shop: SettingsInput = {
  shopProfile: {
    name: 'Fernhill Test Springs (demo)', addressLines: ['DEMO DATA: not a real company', '4 Sample Row', 'Fernhill'],
    phone: '+1 555 0190', email: 'office@fernhill.example',
  },
  defaults: { currency: 'EUR', paperSize: 'letter', units: 'metric', toleranceGrade: 2, quoteValidityDays: 45 },
  machines: [
    { id: 'coil-1', name: 'Test coiler 1', operation: 'coil', wireRange: { min: 0.2, max: 6 }, hourlyRate: 70, setupMinutes: 40,
      speedModel: { feedMetresPerMinute: 45, maxPiecesPerMinute: 60 } },
    { id: 'oven-1', name: 'Test oven', operation: 'stress-relieve', wireRange: { min: 0, max: 16 }, hourlyRate: 30, setupMinutes: 10,
      batch: { capacityPieces: 5000, cycleMinutes: 50 } },
    { id: 'grind-1', name: 'Test grinder', operation: 'grind', wireRange: { min: 0.5, max: 16 }, hourlyRate: 60, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 25 } },
    { id: 'set-1', name: 'Test setting press', operation: 'set', wireRange: { min: 0.3, max: 16 }, hourlyRate: 40, setupMinutes: 15,
      speedModel: { feedMetresPerMinute: 1, maxPiecesPerMinute: 15 } },
    { id: 'test-1', name: 'Test load tester', operation: 'load-test', wireRange: { min: 0, max: 16 }, hourlyRate: 45, setupMinutes: 10,
      piecesPerHour: 500 },
  ],
  materialPrices: [
    { grade: 'en10270-1-dh', dMin: 0.3, dMax: 20, pricePerKg: 5.5, date: '2026-01-10', supplier: 'Demo Wire Mill' },
    { grade: 'en10270-1-sm', dMin: 0.3, dMax: 20, pricePerKg: 5.1, date: '2026-01-10', supplier: 'Demo Wire Mill' },
    { grade: 'astm-a228', dMin: 0.1, dMax: 6.35, pricePerKg: 7.2, date: '2026-01-10', supplier: 'Demo Wire Mill' },
  ],
  finishes: [
    { id: 'zinc', name: 'Zinc plate, clear', vendor: 'Demo Platers', pricePerKg: 3, lotMinimum: 80, electroplated: true },
    { id: 'oil', name: 'Oil dip', vendor: 'in house', lotMinimum: 0 },
  ],
};

export function settingsWith(over: Partial<SettingsInput> = {}): Settings {
  return settingsSchema.parse({ ...shop, ...over });
}

export function specOf(input: unknown): Spec {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
}

/** Invented parts. The set spring needs set removal, so its coiled free length differs from its free length. */
export const valveSpec = { ...valveSpringMetric, quantities: [250, 1000, 5000] };
export const setSpringSpec = { ...valveSpringMetric, material: 'en10270-1-sm', materialOverrides: undefined, freeLength: 75, loads: [] };
export const inchSpec = {
  kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.047, outerDiameter: 0.5, totalCoils: 12,
  ends: 'closed-ground', freeLength: 1.75, loads: [{ length: 1.25, force: 2.5, tolerancePercent: 10 }],
};
