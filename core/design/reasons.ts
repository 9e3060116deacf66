import type { Settings } from '../settings/schema';
import { planManufacture } from '../process/plan';
import type { ManufacturingPlan } from '../process/plan';
import { wirePrice } from '../costing/estimate';
import { formatQuantity, significant } from '../format';
import type { PricedDesign } from './rank';

const opKinds = (plan: ManufacturingPlan) => new Set(plan.operations.map((o) => o.kind));
const coilRate = (plan: ManufacturingPlan) => plan.operations.find((o) => o.kind === 'coil')?.piecesPerHour ?? null;
const setupMinutes = (plan: ManufacturingPlan) => plan.operations.reduce((a, o) => a + o.setupMinutes, 0);

const extraOperations: [string, string][] = [
  ['set', 'needs set removal'], ['grind', 'needs grinding'], ['shot-peen', 'needs shot peening'],
];

function processReasons(plan: ManufacturingPlan, lead: ManufacturingPlan): string[] {
  const out: string[] = [];
  const mine = opKinds(plan);
  const theirs = opKinds(lead);
  for (const [kind, words] of extraOperations) if (mine.has(kind as never) && !theirs.has(kind as never)) out.push(words);
  const a = coilRate(plan);
  const b = coilRate(lead);
  if (a !== null && b !== null && a < b * 0.995) out.push(`slower coiling: ${Math.round(a)} pcs/h against ${Math.round(b)}`);
  const sa = setupMinutes(plan);
  const sb = setupMinutes(lead);
  if (sa > sb + 0.5) out.push(`longer set-ups: ${Math.round(sa)} min against ${Math.round(sb)}`);
  return out;
}

function materialReasons(d: PricedDesign, lead: PricedDesign, plan: ManufacturingPlan, leadPlan: ManufacturingPlan, settings: Settings): string[] {
  const out: string[] = [];
  const u = d.spec.units;
  if (plan.massPerPiece > leadPlan.massPerPiece * 1.005) {
    out.push(`more wire: ${formatQuantity(plan.massPerPiece, 'mass', u)} against ${formatQuantity(leadPlan.massPerPiece, 'mass', u)} per piece`);
  }
  const p = wirePrice(settings.materialPrices, d.spec.material, plan.material.wireDiameter);
  const q = wirePrice(settings.materialPrices, lead.spec.material, leadPlan.material.wireDiameter);
  if (p && q && p.pricePerKg > q.pricePerKg * 1.005) {
    out.push(`dearer wire: ${significant(p.pricePerKg)} against ${significant(q.pricePerKg)} per kg`);
  }
  return out;
}

/** Why each design ranks below the first, from the two plans and prices side by side. */
export function lossReasons(designs: readonly PricedDesign[], settings: Settings, quantity: number): string[][] {
  if (designs.length === 0) return [];
  const plans = designs.map((d) => planManufacture(d.spec, settings, quantity));
  const lead = designs[0]!;
  const leadPlan = plans[0]!;
  return designs.map((d, i) => {
    if (i === 0) return [];
    const plan = plans[i]!;
    const out = [...materialReasons(d, lead, plan, leadPlan, settings), ...processReasons(plan, leadPlan)];
    const more = d.price.unitPrice - lead.price.unitPrice;
    if (!d.priced && lead.priced) out.unshift(`not fully priced: ${d.missing.join('; ')}`);
    if (Math.abs(more) <= 1e-9 * Math.max(lead.price.unitPrice, 1)) out.push(`same unit price, less stress margin (${significant(100 * d.stressMargin)} % against ${significant(100 * lead.stressMargin)} %)`);
    else out.unshift(`${more.toFixed(4)} more per piece at ${quantity} pcs`);
    return out;
  });
}
