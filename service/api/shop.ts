import { inputError } from '../../core/api';
import type { shopMethods } from '../../core/api/shop';
import { estimateCost } from '../../core/costing/estimate';
import { planInSpecUnits, planManufacture } from '../../core/process/plan';
import { parseSpec } from '../../core/spec';
import { getSettings } from '../../db';
import type { StoreContext, TypedHandlers } from './store';

/** Plan and price a spec with the settings in the store; a bad spec comes back as field errors under "spec". */
export function shopHandlers(ctx: StoreContext): TypedHandlers<keyof typeof shopMethods> {
  const prepare = (raw: unknown) => {
    const spec = parseSpec(raw);
    if (!spec.ok) return { ok: false as const, error: inputError(spec.errors.map((e) => ({ ...e, path: e.path ? `spec.${e.path}` : 'spec' }))) };
    const settings = getSettings(ctx.store);
    if (!settings.ok) return settings;
    return { ok: true as const, spec: spec.value, settings: settings.value };
  };
  return {
    manufacturingPlan: ({ spec, orderQuantity }) => {
      const p = prepare(spec);
      if (!p.ok) return p;
      return { ok: true, value: planInSpecUnits(planManufacture(p.spec, p.settings, orderQuantity)) };
    },
    costEstimate: ({ spec, quantities }) => {
      const p = prepare(spec);
      if (!p.ok) return p;
      return { ok: true, value: estimateCost(p.spec, p.settings, quantities) };
    },
  };
}
