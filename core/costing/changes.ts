import type { CostEstimate, PriceBreak } from './types';

/** An operation that moved to another machine at one quantity. */
export interface MachineMove {
  quantity: number;
  key: string;
  title: string;
  from: string | null;
  to: string | null;
}

/** A cost line whose amount moved at one quantity (a line that appeared or went away counts from or to 0). */
export interface LineMove {
  quantity: number;
  key: string;
  item: string;
  before: number;
  after: number;
  difference: number;
}

export interface PriceMove {
  quantity: number;
  unitBefore: number;
  unitAfter: number;
  totalBefore: number;
  totalAfter: number;
  difference: number;
}

/** What a settings change moved in one job's estimate: machines, lines and prices, each by how much. */
export interface CostChanges {
  machines: MachineMove[];
  lines: LineMove[];
  prices: PriceMove[];
}

const EPSILON = 0.005;

function breakChanges(before: PriceBreak, after: PriceBreak, out: CostChanges): void {
  const q = after.quantity;
  for (const op of after.routing) {
    const was = before.routing.find((r) => r.key === op.key);
    const from = was?.workCentre?.name ?? null;
    const to = op.workCentre?.name ?? null;
    if ((was?.workCentre?.id ?? null) !== (op.workCentre?.id ?? null)) out.machines.push({ quantity: q, key: op.key, title: op.title, from, to });
  }
  const keys = [...new Set([...before.lines.map((l) => l.key), ...after.lines.map((l) => l.key)])];
  for (const key of keys) {
    const b = before.lines.find((l) => l.key === key);
    const a = after.lines.find((l) => l.key === key);
    const x = b?.amount ?? 0;
    const y = a?.amount ?? 0;
    if (Math.abs(y - x) >= EPSILON) {
      out.lines.push({ quantity: q, key, item: (a ?? b)!.item, before: x, after: y, difference: Math.round((y - x) * 100) / 100 });
    }
  }
  if (Math.abs(after.total - before.total) >= EPSILON) {
    out.prices.push({ quantity: q, unitBefore: before.unitPrice, unitAfter: after.unitPrice, totalBefore: before.total,
      totalAfter: after.total, difference: Math.round((after.total - before.total) * 100) / 100 });
  }
}

/** Compares two estimates of the same spring at the same breaks (before and after a settings change). */
export function costChanges(before: CostEstimate, after: CostEstimate): CostChanges {
  const out: CostChanges = { machines: [], lines: [], prices: [] };
  for (const a of after.breaks) {
    const b = before.breaks.find((x) => x.quantity === a.quantity);
    if (b) breakChanges(b, a, out);
  }
  return out;
}

export const nothingMoved = (c: CostChanges): boolean => c.machines.length === 0 && c.lines.length === 0 && c.prices.length === 0;
