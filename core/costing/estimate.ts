import type { Settings, MaterialPrice } from '../settings/schema';
import type { Spec } from '../spec';
import { planManufacture } from '../process/plan';
import type { ManufacturingPlan } from '../process/plan';
import type { Operation } from '../process/types';
import { effectiveFinish } from '../finishing/effective';
import type { CostEstimate, CostLine, PriceBreak } from './types';
import { formatQuantity } from '../format';

/** Quantity breaks when the spec names none (common practice for a first quote). */
export const DEFAULT_QUANTITIES = [100, 1000, 5000];

type Missing = CostEstimate['missing'];

const money = (v: number) => v.toFixed(2);
const qty = (v: number) => (Number.isInteger(v) ? String(v) : v.toFixed(2));

/** The newest price for the grade whose diameter band takes the wire. */
export function wirePrice(prices: readonly MaterialPrice[], grade: string, d: number): MaterialPrice | null {
  let best: MaterialPrice | null = null;
  for (const p of prices) {
    if (p.grade !== grade || d < p.dMin || d > p.dMax) continue;
    if (best === null || p.date > best.date) best = p;
  }
  return best;
}

function materialLine(plan: ManufacturingPlan, settings: Settings, missing: Missing): CostLine {
  const price = wirePrice(settings.materialPrices, plan.material.grade, plan.material.wireDiameter);
  const kg = plan.lotWire.kg;
  if (!price) {
    missing.push({ code: 'no-wire-price', path: 'materialPrices',
      message: `no price for ${plan.material.grade} at ${formatQuantity(plan.material.wireDiameter, 'length', plan.units)}: material is not costed` });
    return { item: `Wire: ${plan.material.name}`, basis: `${kg.toFixed(2)} kg, no price on file`, amount: 0, group: 'material' };
  }
  return {
    item: `Wire: ${plan.material.name}`,
    basis: `${kg.toFixed(2)} kg (${plan.lotWire.startQuantity} pcs started incl. scrap + setup wire) × ${money(price.pricePerKg)}/kg, ` +
      `${price.supplier || 'supplier not named'} ${price.date}`,
    amount: kg * price.pricePerKg, group: 'material',
  };
}

function machineRate(settings: Settings, op: Operation): number | null {
  const m = op.workCentre && settings.machines.find((x) => x.id === op.workCentre!.id);
  return m ? m.hourlyRate : null;
}

function operationLines(plan: ManufacturingPlan, settings: Settings, missing: Missing): CostLine[] {
  const lines: CostLine[] = [];
  const start = plan.lotWire.startQuantity;
  for (const op of plan.operations) {
    if (op.outside) continue;
    const rate = machineRate(settings, op);
    if (rate === null) {
      if (op.kind !== 'pack' && op.kind !== 'load-test') {
        missing.push({ code: 'no-machine', path: 'machines', message: `${op.title}: no machine in the shop's list, not costed` });
      }
      continue;
    }
    const centre = op.workCentre!.name;
    if (op.setupMinutes > 0) {
      lines.push({ item: `${op.title}: setup`, basis: `${qty(op.setupMinutes)} min × ${money(rate)}/h (${centre})`, amount: (op.setupMinutes / 60) * rate, group: 'setup' });
    }
    if (op.batch) {
      const hours = (op.batch.batches * op.batch.cycleMinutes) / 60;
      lines.push({ item: `${op.title}: batches`, basis: `${op.batch.batches} × ${qty(op.batch.cycleMinutes)} min × ${money(rate)}/h (${centre}, ${op.batch.capacityPieces} pcs per batch)`, amount: hours * rate, group: 'batch' });
    } else if (op.piecesPerHour) {
      const hours = start / op.piecesPerHour;
      lines.push({ item: `${op.title}: run`, basis: `${start} pcs ÷ ${Math.round(op.piecesPerHour)} pcs/h × ${money(rate)}/h (${centre})`, amount: hours * rate, group: 'run' });
    }
  }
  return lines;
}

function outsideLines(plan: ManufacturingPlan, settings: Settings, spec: Spec): CostLine[] {
  const { finish } = effectiveFinish(spec, settings.finishes);
  if (!finish) return [];
  const kg = (plan.orderQuantity * plan.massPerPiece);
  const byKg = finish.pricePerKg !== undefined ? kg * finish.pricePerKg : 0;
  const byPiece = finish.pricePerPiece !== undefined ? plan.orderQuantity * finish.pricePerPiece : 0;
  const priced = byKg + byPiece;
  const amount = Math.max(priced, finish.lotMinimum);
  const basis = [
    finish.pricePerKg !== undefined ? `${kg.toFixed(2)} kg × ${money(finish.pricePerKg)}/kg` : '',
    finish.pricePerPiece !== undefined ? `${plan.orderQuantity} pcs × ${money(finish.pricePerPiece)}` : '',
  ].filter(Boolean).join(' + ');
  return [{
    item: `${finish.name} (${finish.vendor || 'vendor'})`,
    basis: `${basis || 'no vendor price'}${amount > priced ? `; vendor lot minimum ${money(finish.lotMinimum)}` : ''}`,
    amount, group: 'outside',
  }];
}

function inspectionLine(plan: ManufacturingPlan, settings: Settings): CostLine {
  const c = settings.costing;
  const pieces = plan.inspection.characteristics.some((x) => x.everyPiece) ? plan.orderQuantity : plan.inspection.sampleSize;
  const minutes = c.firstArticleMinutes + pieces * c.inspectionMinutesPerPiece;
  return {
    item: 'Inspection', basis: `first article ${qty(c.firstArticleMinutes)} min + ${pieces} pcs × ${qty(c.inspectionMinutesPerPiece)} min, at ${money(c.inspectionHourlyRate)}/h`,
    amount: (minutes / 60) * c.inspectionHourlyRate, group: 'inspection',
  };
}

const sum = (lines: readonly CostLine[]) => lines.reduce((a, l) => a + l.amount, 0);

/** Cost and price of one quantity break, line by line. */
export function priceBreak(spec: Spec, settings: Settings, quantity: number, missing: Missing): PriceBreak {
  const plan = planManufacture(spec, settings, quantity);
  const c = settings.costing;
  const lines: CostLine[] = [materialLine(plan, settings, missing), ...operationLines(plan, settings, missing), ...outsideLines(plan, settings, spec), inspectionLine(plan, settings)];
  lines.push({ item: 'Packaging', basis: `${quantity} pcs × ${money(c.packagingPerPiece)}`, amount: quantity * c.packagingPerPiece, group: 'packaging' });
  const internal = sum(lines.filter((l) => l.group === 'setup' || l.group === 'run' || l.group === 'batch' || l.group === 'inspection'));
  lines.push({ item: 'Overhead', basis: `${qty(c.overheadPercent)} % of internal operations ${money(internal)}`, amount: (internal * c.overheadPercent) / 100, group: 'overhead' });
  const cost = sum(lines);
  lines.push({ item: 'Margin', basis: `${qty(c.marginPercent)} % of cost ${money(cost)}`, amount: (cost * c.marginPercent) / 100, group: 'margin' });
  let total = sum(lines);
  if (total < c.minimumOrderValue) {
    lines.push({ item: 'Minimum order value', basis: `order total raised to ${money(c.minimumOrderValue)}`, amount: c.minimumOrderValue - total, group: 'minimum' });
    total = c.minimumOrderValue;
  }
  return { quantity, startQuantity: plan.lotWire.startQuantity, unitPrice: total / quantity, total, lines };
}

/** Unit price and total at each quantity break, with the breakdown behind each. */
export function estimateCost(spec: Spec, settings: Settings, quantities?: readonly number[]): CostEstimate {
  const missing: Missing = [];
  const list = [...(quantities ?? spec.quantities ?? DEFAULT_QUANTITIES)].sort((a, b) => a - b);
  const breaks = list.map((q) => priceBreak(spec, settings, q, q === list[0] ? missing : []));
  return { currency: settings.defaults.currency, minimumOrderValue: settings.costing.minimumOrderValue, breaks, missing };
}
