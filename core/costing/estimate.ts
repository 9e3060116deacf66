import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import { planManufacture } from '../process/plan';
import type { ManufacturingPlan } from '../process/plan';
import type { Operation, OperationOverride } from '../process/types';
import type { CostEstimate, CostLine, MissingCost, PriceBreak, RoutedOperation } from './types';
import { cents, figure, moneyText, rateText, rounded } from './figures';
import { wirePrice } from './wire-price';
import { breaksAround, roundingText, roundUnitPrice } from './rounding';
import { noJudgement } from '../quoting/judgement';
import type { JobJudgement } from '../quoting/judgement';

export { wirePrice } from './wire-price';
import { effectiveFinish } from '../finishing/effective';
import { formatQuantity } from '../format';

/** Quantity breaks when the spec names none (common practice for a first quote). */
export const DEFAULT_QUANTITIES = [100, 1000, 5000];

type Missing = MissingCost[];

/** The kilograms a price per kg is charged on; an inch job also reads them in pounds. */
function kgText(kg: number, plan: ManufacturingPlan): string {
  const text = `${figure(kg, 3)} kg`;
  return plan.units === 'metric' ? text : `${text} (${formatQuantity(kg, 'massBulk', 'inch')})`;
}

function materialLine(plan: ManufacturingPlan, settings: Settings, missing: Missing): CostLine {
  const price = wirePrice(settings.materialPrices, plan.material.grade, plan.material.wireDiameter);
  const kg = rounded(plan.lotWire.kg, 3);
  const item = `Wire: ${plan.material.name}`;
  if (!price) {
    missing.push({ code: 'no-wire-price', path: 'materialPrices',
      message: `no price for ${plan.material.grade} at ${formatQuantity(plan.material.wireDiameter, 'length', plan.units)}: material is not costed` });
    return { key: 'material', item, basis: `${kgText(kg, plan)}, no price on file`, amount: 0, group: 'material' };
  }
  return {
    key: 'material', item, group: 'material', amount: cents(kg * price.pricePerKg),
    basis: `${kgText(kg, plan)} (${plan.lotWire.startQuantity} pcs started incl. scrap + setup wire) × ${rateText(price.pricePerKg)}/kg, ` +
      `${price.supplier || 'supplier not named'} ${price.date}`,
  };
}

const MANUAL_WITHOUT_MACHINE = new Set(['pack', 'load-test']);

function runLine(op: Operation, start: number, rate: number, centre: string, missing: Missing): CostLine | null {
  if (op.batch) {
    const b = op.batch;
    return { key: `${op.key}:batches`, item: `${op.title}: batches`, group: 'batch',
      basis: `${b.batches} × ${figure(b.cycleMinutes, 2)} min × ${rateText(rate)}/h (${centre}, up to ${b.capacityPieces} pcs per batch)`,
      amount: cents(((b.batches * b.cycleMinutes) / 60) * rate) };
  }
  if (op.piecesPerHour) {
    return { key: `${op.key}:run`, item: `${op.title}: run`, group: 'run',
      basis: `${start} pcs ÷ ${figure(op.piecesPerHour, 2)} pcs/h × ${rateText(rate)}/h (${centre})`,
      amount: cents((start / op.piecesPerHour) * rate) };
  }
  missing.push({ code: 'no-run-model', path: 'machines',
    message: `${op.title}: ${centre} has no run rate (pieces per hour or batch load): run time not costed` });
  return null;
}

/** "; set for this job: shop 30 min" — the estimator's override on the figures of a line, with the shop's beside it. */
function judgedNote(op: Operation, fields: readonly OperationOverride['field'][]): string {
  const shown = op.overrides.filter((o) => fields.includes(o.field));
  if (shown.length === 0) return '';
  const unit: Record<OperationOverride['field'], string> = { machine: '', setupMinutes: ' min', piecesPerHour: ' pcs/h', scrapPercent: ' %' };
  return `; set for this job (shop ${shown.map((o) => `${o.shopDefault ?? 'none'}${o.shopDefault === null ? '' : unit[o.field]}`).join(', ')}): ${shown[0]!.reason}`;
}

function operationLines(plan: ManufacturingPlan, missing: Missing): CostLine[] {
  const lines: CostLine[] = [];
  const start = plan.lotWire.startQuantity;
  for (const op of plan.operations) {
    if (op.outside || op.kind === 'finish' || op.kind === 'bake' || op.kind === 'inspect') continue;
    if (!op.workCentre) {
      if (!MANUAL_WITHOUT_MACHINE.has(op.kind)) {
        missing.push({ code: 'no-machine', path: 'machines', message: `${op.title}: no machine in the shop's list takes the wire, not costed` });
      }
      continue;
    }
    const { hourlyRate: rate, name: centre } = op.workCentre;
    if (op.setupMinutes > 0) {
      lines.push({ key: `${op.key}:setup`, item: `${op.title}: setup`, group: 'setup',
        basis: `${figure(op.setupMinutes, 2)} min × ${rateText(rate)}/h (${centre})${judgedNote(op, ['setupMinutes', 'machine'])}`,
        amount: cents((op.setupMinutes / 60) * rate) });
    }
    const run = runLine(op, start, rate, centre, missing);
    if (run) lines.push({ ...run, basis: `${run.basis}${judgedNote(op, ['piecesPerHour', 'machine'])}` });
  }
  return lines;
}

function outsideLines(plan: ManufacturingPlan, settings: Settings, spec: Spec): CostLine[] {
  const { finish } = effectiveFinish(spec, settings.finishes);
  if (!finish) return [];
  const kg = rounded(plan.orderQuantity * plan.massPerPiece, 3);
  const byKg = finish.pricePerKg !== undefined ? kg * finish.pricePerKg : 0;
  const byPiece = finish.pricePerPiece !== undefined ? plan.orderQuantity * finish.pricePerPiece : 0;
  const priced = cents(byKg + byPiece);
  const amount = Math.max(priced, finish.lotMinimum);
  const basis = [
    finish.pricePerKg !== undefined ? `${kgText(kg, plan)} × ${rateText(finish.pricePerKg)}/kg` : '',
    finish.pricePerPiece !== undefined ? `${plan.orderQuantity} pcs × ${rateText(finish.pricePerPiece)}` : '',
  ].filter(Boolean).join(' + ');
  return [{
    key: `outside:${finish.id}`, item: `${finish.name} (${finish.inHouse ? 'in house' : finish.vendor || 'vendor'})`, group: finish.inHouse ? 'run' : 'outside', amount,
    basis: `${basis || 'no vendor price'}${amount > priced ? `; vendor lot minimum ${rateText(finish.lotMinimum)}` : ''}`,
  }];
}

function inspectionLine(plan: ManufacturingPlan, settings: Settings): CostLine {
  const c = settings.costing;
  const pieces = plan.inspection.characteristics.some((x) => x.everyPiece) ? plan.orderQuantity : plan.inspection.sampleSize;
  const minutes = c.firstArticleMinutes + pieces * c.inspectionMinutesPerPiece;
  return {
    key: 'inspection', item: 'Inspection', group: 'inspection', amount: cents((minutes / 60) * c.inspectionHourlyRate),
    basis: `first article ${figure(c.firstArticleMinutes, 2)} min + ${pieces} pcs × ${figure(c.inspectionMinutesPerPiece, 3)} min, at ${rateText(c.inspectionHourlyRate)}/h`,
  };
}

const sum = (lines: readonly CostLine[]) => cents(lines.reduce((a, l) => a + l.amount, 0));
const INTERNAL = new Set(['setup', 'run', 'batch', 'inspection']);

function routingOf(plan: ManufacturingPlan): RoutedOperation[] {
  return plan.operations.filter((op) => op.choice !== null).map((op) => ({
    key: op.key, title: op.title, workCentre: op.workCentre && { id: op.workCentre.id, name: op.workCentre.name }, ...op.choice!,
  }));
}

function marginLine(cost: number, settings: Settings, judgement: JobJudgement): CostLine {
  const shop = settings.costing.marginPercent;
  const set = judgement.price.marginPercent;
  const percent = set?.value ?? shop;
  const note = set ? ` (shop ${figure(shop, 3)} %: ${set.reason})` : '';
  return { key: 'margin', item: 'Margin', group: 'margin',
    basis: `${figure(percent, 3)} % of cost ${moneyText(cost)}${note}`, amount: cents((cost * percent) / 100) };
}

/** The unit price as quoted: the estimator's own for this break, else the computed one by the shop's rounding rule. */
function quotedUnitPrice(total: number, quantity: number, settings: Settings, judgement: JobJudgement): { unit: number; line: CostLine | null } {
  const computed = total / quantity;
  const set = judgement.price.unitPrices.find((p) => p.quantity === quantity);
  const rule = settings.costing.unitPriceRounding;
  const unit = set ? set.unitPrice : roundUnitPrice(computed, rule);
  const difference = cents(unit * quantity - total);
  if (set) {
    return { unit, line: { key: 'unit-price', item: 'Unit price set by the estimator', group: 'adjustment', amount: difference,
      basis: `${quantity} pcs × ${rateText(unit)} (computed ${rateText(Number(computed.toPrecision(6)))}): ${set.reason}` } };
  }
  if (difference === 0) return { unit, line: null };
  return { unit, line: { key: 'rounding', item: 'Unit price rounding', group: 'adjustment', amount: difference,
    basis: `${quantity} pcs × ${rateText(unit)} (${roundingText(rule)}) less ${moneyText(total)}` } };
}

/** Cost and price of one quantity break, line by line. */
export function priceBreak(spec: Spec, settings: Settings, quantity: number, missing: Missing, judgement: JobJudgement = noJudgement()): PriceBreak {
  const plan = planManufacture(spec, settings, quantity, judgement);
  const c = settings.costing;
  const lines: CostLine[] = [materialLine(plan, settings, missing), ...operationLines(plan, missing), ...outsideLines(plan, settings, spec), inspectionLine(plan, settings)];
  lines.push({ key: 'packaging', item: 'Packaging', group: 'packaging',
    basis: `${quantity} pcs × ${rateText(c.packagingPerPiece)}`, amount: cents(quantity * c.packagingPerPiece) });
  const internal = sum(lines.filter((l) => INTERNAL.has(l.group)));
  lines.push({ key: 'overhead', item: 'Overhead', group: 'overhead',
    basis: `${figure(c.overheadPercent, 3)} % of internal operations ${moneyText(internal)}`, amount: cents((internal * c.overheadPercent) / 100) });
  lines.push(marginLine(sum(lines), settings, judgement));
  let total = sum(lines);
  if (total < c.minimumOrderValue) {
    lines.push({ key: 'minimum', item: 'Minimum order value', group: 'minimum',
      basis: `order total ${moneyText(total)} raised to ${rateText(c.minimumOrderValue)}`, amount: cents(c.minimumOrderValue - total) });
    total = c.minimumOrderValue;
  }
  const quoted = quotedUnitPrice(total, quantity, settings, judgement);
  if (quoted.line) lines.push(quoted.line);
  return { quantity, startQuantity: plan.lotWire.startQuantity, unitPrice: quoted.unit, total: sum(lines), lines, routing: routingOf(plan) };
}

/** Each missing item once, whichever breaks it was found at. */
function distinct(missing: Missing): Missing {
  const seen = new Set<string>();
  return missing.filter((m) => {
    const id = `${m.code}|${m.message}`;
    if (seen.has(id)) return false;
    seen.add(id);
    return true;
  });
}

export interface EstimateOptions {
  /** The job's order quantity: always priced; with no breaks given, the shop's breaks are chosen around it. */
  orderQuantity?: number | null;
  judgement?: JobJudgement;
}

/** The breaks priced: those given (or the spec's), else around the order quantity, else the defaults; the order quantity always. */
export function pricedQuantities(spec: Spec, settings: Settings, quantities?: readonly number[], orderQuantity?: number | null): number[] {
  const given = quantities ?? spec.quantities;
  const base = given ?? (orderQuantity ? breaksAround(orderQuantity, settings.costing.breakFactors) : DEFAULT_QUANTITIES);
  return [...new Set([...base, ...(orderQuantity ? [orderQuantity] : [])])].sort((a, b) => a - b);
}

/** Unit price and total at each quantity break, with the breakdown behind each, and the job's one-off charges. */
export function estimateCost(spec: Spec, settings: Settings, quantities?: readonly number[], options: EstimateOptions = {}): CostEstimate {
  const missing: Missing = [];
  const judgement = options.judgement ?? noJudgement();
  const list = pricedQuantities(spec, settings, quantities, options.orderQuantity);
  const breaks = list.map((q) => priceBreak(spec, settings, q, missing, judgement));
  const charges: CostLine[] = judgement.price.charges.map((ch, i) => ({
    key: `charge:${i + 1}`, item: ch.label, basis: 'one-off charge, once per order', amount: cents(ch.amount), group: 'charge',
  }));
  return { currency: settings.defaults.currency, minimumOrderValue: settings.costing.minimumOrderValue, breaks, charges, missing: distinct(missing) };
}
