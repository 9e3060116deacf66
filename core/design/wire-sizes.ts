import type { Settings } from '../settings/schema';
import { wireGrades } from '../materials';
import type { WireGrade } from '../materials/types';
import { wirePrice } from '../costing/estimate';
import type { GradeFamily } from '../materials/types';
import type { WireSizeSource } from '../requirement';

/** What the wire list reads from a requirement of any kind. */
export interface WireAsk {
  grades?: string[] | undefined;
  families?: GradeFamily[] | undefined;
  wireSizes: WireSizeSource;
}

/**
 * Nominal wire diameters (mm) as EN 10270-1 lists them in its strength table: 0.30 to 0.45 in 0.05 steps,
 * 0.1 mm steps to 2.1, then the listed sizes to 4.0, 0.5 mm steps to 10.5, then whole and half millimetres
 * to 20. Used when a requirement asks for the standard's sizes rather than the shop's stock.
 */
export const standardWireSizes = {
  sizes: [
    0.3, 0.35, 0.4, 0.45,
    0.5, 0.6, 0.7, 0.8, 0.9, 1, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2, 2.1,
    2.4, 2.5, 2.6, 2.8, 3, 3.2, 3.4, 3.5, 3.6, 3.8, 4,
    4.5, 5, 5.5, 6, 6.5, 7, 7.5, 8, 8.5, 9, 9.5, 10, 10.5,
    11, 12, 12.5, 13, 14, 15, 16, 17, 18, 19, 20,
  ] as readonly number[],
  source: 'EN 10270-1, nominal diameters of the tensile-strength table, as reprinted by wire makers (from memory for the 13–20 mm steps)',
  verified: false,
} as const;

/** One wire the search tries: a grade at a diameter (mm). */
export interface WireChoice {
  grade: WireGrade;
  d: number;
}

function allowedGrades(req: WireAsk): WireGrade[] {
  return wireGrades.filter((g) =>
    (req.grades === undefined || req.grades.includes(g.id)) && (req.families === undefined || req.families.includes(g.family)));
}

const inRange = (g: WireGrade, d: number) => d >= g.diameterRange.min * (1 - 1e-9) && d <= g.diameterRange.max * (1 + 1e-9);

/**
 * The wires to try: each stocked grade and size ("stock"), the standard sizes the price list covers
 * ("priced"), or every standard size the grade is made in ("preferred"); always inside the grade's range.
 */
export function wireChoices(req: WireAsk, settings: Settings): WireChoice[] {
  const grades = allowedGrades(req);
  const out: WireChoice[] = [];
  if (req.wireSizes === 'stock') {
    const seen = new Set<string>();
    for (const s of settings.wireStock) {
      const g = grades.find((x) => x.id === s.grade);
      const key = `${s.grade}@${s.d}`;
      if (!g || s.kg <= 0 || seen.has(key) || !inRange(g, s.d)) continue;
      seen.add(key);
      out.push({ grade: g, d: s.d });
    }
    return out;
  }
  for (const g of grades) {
    for (const d of standardWireSizes.sizes) {
      if (!inRange(g, d)) continue;
      if (req.wireSizes === 'priced' && !wirePrice(settings.materialPrices, g.id, d)) continue;
      out.push({ grade: g, d });
    }
  }
  return out;
}
