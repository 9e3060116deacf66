import type { Settings } from '../settings/schema';
import type { UnitSystem } from '../units';
import { formatQuantity } from '../format';

/**
 * Stock counts as the job's wire when its diameter is within this share of the job's: the same nominal
 * size entered in mm for an inch job (0.063 in = 1.6002 mm against 1.6 mm) without taking a neighbouring
 * size (judgement: neighbouring standard sizes differ by 5 % or more).
 */
export const SAME_SIZE = 0.01;

/** One coil on the stock list the lot can draw from. */
export interface StockLot {
  heatNumber: string | null;
  kg: number;
}

/** The lot's wire against the stock list: what is on hand, what the lot needs, which heats, or order wire. */
export interface WireStockCheck {
  status: 'enough' | 'short' | 'order';
  onHandKg: number;
  neededKg: number;
  /** The coils of this grade and size, largest first. */
  lots: StockLot[];
  /** Other stocked diameters of the grade (internal mm), nearest first: what a redesign could use instead. */
  otherSizes: number[];
  /** One line for the planner, in the job's units (wire mass in kg as wire is bought). */
  text: string;
}

/** Wire is bought by the kilogram; an inch job also reads pounds beside it. */
const kgText = (kg: number, units: UnitSystem): string => formatQuantity(kg, 'stockMass', units) +
  (units === 'inch' ? ` (${formatQuantity(kg, 'massBulk', 'inch')})` : '');

function lineOf(c: Omit<WireStockCheck, 'text'>, d: number, units: UnitSystem): string {
  const kg = (x: number) => kgText(x, units);
  const size = formatQuantity(d, 'length', units);
  const heats = c.lots.map((l) => l.heatNumber).filter((h): h is string => h !== null);
  const named = heats.length > 0 ? `, heat/lot ${heats.join(', ')}` : ', no heat/lot on the stock list';
  if (c.status === 'enough') return `Use stock: ${kg(c.onHandKg)} on hand at ${size} for the ${kg(c.neededKg)} the lot needs${named}.`;
  if (c.status === 'short') {
    return `Order wire: ${kg(c.neededKg - c.onHandKg)} more; ${kg(c.onHandKg)} on hand at ${size} against ${kg(c.neededKg)} needed${named}.`;
  }
  const others = c.otherSizes.slice(0, 3).map((o) => formatQuantity(o, 'length', units));
  return `Order wire: ${kg(c.neededKg)} at ${size}; none of this grade and size on the stock list` +
    (others.length > 0 ? ` (stocked in this grade: ${others.join(', ')})` : '') + '.';
}

/** Checks the lot's wire mass (developed length × start quantity incl. scrap, plus setup scrap) against stock. */
export function checkWireStock(stock: Settings['wireStock'], grade: string, d: number, neededKg: number, units: UnitSystem): WireStockCheck {
  const ofGrade = stock.filter((s) => s.grade === grade && s.kg > 0);
  const same = ofGrade.filter((s) => Math.abs(s.d - d) <= SAME_SIZE * d);
  const lots = same.map((s) => ({ heatNumber: s.heatNumber?.trim() || null, kg: s.kg })).sort((a, b) => b.kg - a.kg);
  const onHandKg = lots.reduce((sum, l) => sum + l.kg, 0);
  const otherSizes = [...new Set(ofGrade.filter((s) => !same.includes(s)).map((s) => s.d))]
    .sort((a, b) => Math.abs(Math.log(a / d)) - Math.abs(Math.log(b / d)));
  const status = lots.length === 0 ? 'order' : onHandKg >= neededKg ? 'enough' : 'short';
  const check = { status, onHandKg, neededKg, lots, otherSizes } as const;
  return { ...check, text: lineOf(check, d, units) };
}
