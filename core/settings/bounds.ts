import { z } from 'zod';

/**
 * Plausible ranges of the shop's settings, each with its reason. Settings are kept in internal units
 * (mm, kg, minutes, metres per minute, the shop's currency), so each bound is one range.
 */
export interface SettingBound {
  min: number;
  max: number;
  minExclusive?: boolean;
  integer?: boolean;
  reason: string;
}

export const settingBounds = {
  money: { min: 0, max: 1e9, reason: 'a rate, price or minimum in the shop\'s currency; a billion is past any single figure a job shop uses' },
  minutes: { min: 0, max: 100_000, reason: 'a setup or inspection time; 100 000 minutes is ten weeks round the clock' },
  wireMm: { min: 0, max: 100, reason: 'wire and bar diameters in mm: no coiler takes bar above about 100 mm (common trade practice)' },
  feedMetresPerMinute: { min: 0.001, max: 1000, reason: 'wire feed of a coiler: from a millimetre a minute to the fastest feeds of a few hundred metres per minute (common trade practice)' },
  piecesPerMinute: { min: 0.001, max: 100_000, reason: 'pieces per minute of one machine: from one a day to 100 000, past any coiler or press' },
  batchPieces: { min: 1, max: 100_000_000, integer: true, reason: 'pieces in one oven or peening batch' },
  cycleMinutes: { min: 0.01, max: 100_000, reason: 'one batch cycle: from under a second to ten weeks round the clock' },
  stockKg: { min: 0, max: 10_000_000, reason: 'wire on hand; 10 000 t is past any shop\'s store' },
  scrapMetres: { min: 0, max: 1_000_000, reason: 'wire lost setting up a run; 1000 km is past any coil' },
  percent: { min: 0, max: 1000, reason: 'a scrap, overhead or margin share in percent' },
  sequence: { min: 1, max: 9_999_999_999, integer: true, reason: 'the next number of a sequence at most ten digits wide' },
} as const satisfies Record<string, SettingBound>;

/** A zod number held to one bound; the message names the range and why. */
export function bounded(name: keyof typeof settingBounds): z.ZodNumber {
  const b: SettingBound = settingBounds[name];
  const range = `${b.minExclusive ? 'above' : 'at least'} ${b.min} and at most ${b.max}: ${b.reason}`;
  let n = z.number().finite();
  if (b.integer) n = n.int();
  n = b.minExclusive ? n.gt(b.min, `must be ${range}`) : n.min(b.min, `must be ${range}`);
  return n.max(b.max, `must be ${range}`);
}
