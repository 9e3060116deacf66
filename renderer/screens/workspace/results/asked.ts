import { formatQuantity } from '../../../../core/format';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../../../../core/springs/specified';
import type { UnitSystem } from '../../../../core/units';

/** What the drawing asks at a test point, with its tolerance (the default one when the drawing gives none). */
export function askedText(value: number | null, tolerancePercent: number | null, quantity: 'force' | 'torque', units: UnitSystem): string {
  return value === null ? '—' : `${formatQuantity(value, quantity, units)} ±${tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT} %`;
}
