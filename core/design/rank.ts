import type { Settings } from '../settings/schema';
import { estimateCost } from '../costing/estimate';
import type { PriceBreak } from '../costing/types';
import type { AcceptedDesign, CombinationResult } from './frame';

/** A design with its price at the main break, as the shop's own costing gives it for the spec alone. */
export interface PricedDesign extends AcceptedDesign {
  price: PriceBreak;
  priced: boolean;
  missing: string[];
}

/** Costs one design alone with the public costing, at one quantity. */
export function priceDesign(d: AcceptedDesign, settings: Settings, quantity: number): PricedDesign {
  const estimate = estimateCost(d.spec, settings, [quantity]);
  return {
    ...d, price: estimate.breaks[0]!, priced: estimate.missing.length === 0,
    missing: estimate.missing.map((m) => m.message),
  };
}

/** Fully priced first, then the lower unit price, then the larger stress margin. */
export function compareDesigns(a: PricedDesign, b: PricedDesign): number {
  if (a.priced !== b.priced) return a.priced ? -1 : 1;
  const byPrice = a.price.unitPrice - b.price.unitPrice;
  if (Math.abs(byPrice) > 1e-9 * Math.max(a.price.unitPrice, 1)) return byPrice;
  return b.stressMargin - a.stressMargin;
}

const sameGeometry = (a: AcceptedDesign, b: AcceptedDesign) =>
  a.point.grade === b.point.grade && a.point.d === b.point.d && a.point.ends === b.point.ends && a.point.D === b.point.D && a.point.na === b.point.na;

/** Peened designs whose unpeened twin also meets the requirement: peening would only add cost. */
export function withoutNeedlessPeening(found: readonly CombinationResult[]): CombinationResult[] {
  const unpeened = found.filter((c) => !c.peened).flatMap((c) => c.designs);
  return found.filter((c) => !c.peened || !c.designs.some((d) => unpeened.some((u) => sameGeometry(u, d))));
}

/** The cheapest design of each combination (its designs share a routing but for set removal), ranked. */
export function rankCombinations(found: readonly CombinationResult[], settings: Settings, quantity: number): PricedDesign[] {
  const best: PricedDesign[] = [];
  for (const c of withoutNeedlessPeening(found)) {
    const priced = c.designs.map((d) => priceDesign(d, settings, quantity)).sort(compareDesigns);
    best.push(priced[0]!);
  }
  return best.sort(compareDesigns);
}
