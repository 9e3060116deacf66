import type { UnitPriceRounding } from '../settings/schema';

/** A unit price by the shop's rounding rule: to significant digits, or to the nearest step (0.005). */
export function roundUnitPrice(value: number, rule: UnitPriceRounding): number {
  switch (rule.rule) {
    case 'none': return value;
    case 'significant': return Number(value.toPrecision(rule.digits));
    case 'step': return Number((Math.round(value / rule.step) * rule.step).toFixed(10));
  }
}

export function roundingText(rule: UnitPriceRounding): string {
  switch (rule.rule) {
    case 'none': return 'not rounded';
    case 'significant': return `${rule.digits} significant digits`;
    case 'step': return `to the nearest ${rule.step}`;
  }
}

/** Order quantity times each factor, to two significant digits, with the order quantity itself. */
export function breaksAround(orderQuantity: number, factors: readonly number[]): number[] {
  const around = factors.map((f) => (f === 1 ? orderQuantity : Math.max(1, Number((orderQuantity * f).toPrecision(2)))));
  return [...new Set([...around, orderQuantity])].sort((a, b) => a - b);
}
