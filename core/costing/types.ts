import type { QuantityMap } from '../units';
import type { WorkCentreChoice } from '../process/work-centre';

export type CostGroup = 'material' | 'setup' | 'run' | 'batch' | 'outside' | 'inspection' | 'packaging' | 'overhead' | 'margin' | 'minimum' | 'adjustment' | 'charge';

/** One line of a cost breakdown: what it is, how it was worked out (traceable to a setting), and the amount. */
export interface CostLine {
  /** Stable identity ("material", "grind:run", "overhead"): tests, overrides and change reports use it, never the text. */
  key: string;
  item: string;
  basis: string;
  /** To the cent, from the figures the basis prints. */
  amount: number;
  /** Which group it sums into (material, internal operations, outside processing, …). */
  group: CostGroup;
}

/** The machine each operation runs on at this quantity, and the next-best one. */
export interface RoutedOperation extends WorkCentreChoice {
  key: string;
  title: string;
  workCentre: { id: string; name: string } | null;
}

export interface PriceBreak {
  quantity: number;
  startQuantity: number;
  unitPrice: number;
  total: number;
  lines: CostLine[];
  routing: RoutedOperation[];
}

export interface MissingCost {
  code: string;
  message: string;
  path: string;
}

export interface CostEstimate {
  currency: string;
  minimumOrderValue: number;
  breaks: PriceBreak[];
  /** One-off charges (tooling, first article, certificates), each its own line, charged once whatever the quantity. */
  charges: CostLine[];
  /** Prices or machines the estimate had to do without; each names the setting to fill in. */
  missing: MissingCost[];
}

/** What each number of a cost estimate measures; money is in the estimate's currency in every unit system. */
export const costQuantities: QuantityMap = {
  minimumOrderValue: 'money',
  breaks: {
    quantity: 'count', startQuantity: 'count', unitPrice: 'money', total: 'money', lines: { amount: 'money' },
    routing: { lotCost: 'money', difference: 'money', runnerUp: { lotCost: 'money' } },
  },
  charges: { amount: 'money' },
};
