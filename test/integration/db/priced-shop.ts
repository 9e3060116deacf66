import { createService, dispatch } from '../../../service/api';
import { steppingClock, tempStore } from './helpers';

/** An invented shop's machines (demo data) that can make the helpers' 2 mm closed-and-ground spring in full. */
export const demoMachines = (coilRate = 60) => [
  { id: 'c1', name: 'Coiler (demo)', operation: 'coil', wireRange: { min: 0.5, max: 4 }, hourlyRate: coilRate, setupMinutes: 30,
    speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 80 } },
  { id: 'o1', name: 'Oven (demo)', operation: 'stress-relieve', wireRange: { min: 0, max: 20 }, hourlyRate: 30, setupMinutes: 0,
    batch: { capacityPieces: 5000, cycleMinutes: 60 } },
  { id: 'g1', name: 'Grinder (demo)', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 50, setupMinutes: 15, piecesPerHour: 1200 },
];

/** The demo wire price of the helpers' grade and size. */
export const demoWirePrice = (pricePerKg = 4) => [{ grade: 'en10270-1-sh', dMin: 1, dMax: 3, pricePerKg, date: '2026-10-01', supplier: 'Demo Wire Co.' }];

/** A service over a new store whose settings price the helpers' spring; `must` throws on an error answer. */
export async function pricedShop(settings: Record<string, unknown> = { machines: demoMachines(), materialPrices: demoWirePrice() }) {
  const service = createService(tempStore(steppingClock()));
  const call = (name: string, input: unknown) => dispatch(service.handlers, name as never, input);
  const must = async <T>(name: string, input: unknown): Promise<T> => {
    const r = await call(name, input);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    return r.value as T;
  };
  await must('saveSettings', { settings });
  return { service, call, must };
}
