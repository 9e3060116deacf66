import type { QuantityMap } from '../units';

/** One line of a cost breakdown: what it is, how it was worked out (traceable to a setting), and the amount. */
export interface CostLine {
  item: string;
  basis: string;
  amount: number;
  /** Which group it sums into (material, internal operations, outside processing, …). */
  group: 'material' | 'setup' | 'run' | 'batch' | 'outside' | 'inspection' | 'packaging' | 'overhead' | 'margin' | 'minimum';
}

export interface PriceBreak {
  quantity: number;
  startQuantity: number;
  unitPrice: number;
  total: number;
  lines: CostLine[];
}

export interface CostEstimate {
  currency: string;
  minimumOrderValue: number;
  breaks: PriceBreak[];
  /** Prices or machines the estimate had to do without; each names the setting to fill in. */
  missing: { code: string; message: string; path: string }[];
}

/** What each number of a cost estimate measures; money is in the estimate's currency in every unit system. */
export const costQuantities: QuantityMap = {
  minimumOrderValue: 'money',
  breaks: { quantity: 'count', startQuantity: 'count', unitPrice: 'money', total: 'money', lines: { amount: 'money' } },
};
