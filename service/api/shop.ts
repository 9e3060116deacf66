import { inputError } from '../../core/api';
import type { ApiResult } from '../../core/api';
import type { JobCostReview, shopMethods } from '../../core/api/shop';
import { costChanges } from '../../core/costing/changes';
import { estimateCost } from '../../core/costing/estimate';
import { planInSpecUnits, planManufacture } from '../../core/process/plan';
import { parseSpec } from '../../core/spec';
import { acceptJobCost, acceptedSettings, getJob, getSettings } from '../../db';
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
  /** The saved job priced under the settings it was accepted with and under today's, compared line by line. */
  const review = (jobId: number): ApiResult<JobCostReview> => {
    const job = getJob(ctx.store, jobId);
    if (!job.ok) return { ok: false, error: { ...job.error, path: 'jobId' } };
    const settings = getSettings(ctx.store);
    if (!settings.ok) return settings;
    const accepted = acceptedSettings(ctx.store, jobId);
    const pricing = { orderQuantity: job.value.orderQuantity, judgement: job.value.judgement };
    const now = estimateCost(job.value.spec, settings.value, undefined, pricing);
    const then = accepted ? estimateCost(job.value.spec, accepted.settings, undefined, pricing) : now;
    return { ok: true, value: {
      jobId, acceptedAt: accepted?.acceptedAt ?? null, settingsSavedAt: accepted?.savedAt ?? null, changes: costChanges(then, now),
    } };
  };
  return {
    manufacturingPlan: ({ spec, orderQuantity, judgement }) => {
      const p = prepare(spec);
      if (!p.ok) return p;
      return { ok: true, value: planInSpecUnits(planManufacture(p.spec, p.settings, orderQuantity, judgement)) };
    },
    costEstimate: ({ spec, quantities, orderQuantity, judgement }) => {
      const p = prepare(spec);
      if (!p.ok) return p;
      return { ok: true, value: estimateCost(p.spec, p.settings, quantities, { orderQuantity: orderQuantity ?? null, ...(judgement ? { judgement } : {}) }) };
    },
    jobCostChanges: ({ jobId }) => review(jobId),
    acceptJobCost: ({ jobId }) => {
      const accepted = acceptJobCost(ctx.store, jobId);
      return accepted.ok ? review(jobId) : accepted;
    },
  };
}
