import { inputError } from '../../core/api';
import type { designMethods } from '../../core/api/design';
import { designFromRequirement } from '../../core/design';
import { parseRequirement } from '../../core/requirement';
import { specMisses } from '../../core/design';
import { parseSpec } from '../../core/spec';
import type { FieldError } from '../../core/result';
import { adoptDesign, getSettings, jobRequirement } from '../../db';
import type { StoreContext, TypedHandlers } from './store';

const under = (prefix: string, errors: FieldError[]) => errors.map((e) => ({ ...e, path: e.path ? `${prefix}.${e.path}` : prefix }));

/** The design search over the store's settings, and keeping the requirement with the job made from it. */
export function designHandlers(ctx: StoreContext): TypedHandlers<keyof typeof designMethods> {
  return {
    designSprings: ({ requirement, limit }) => {
      const settings = getSettings(ctx.store);
      if (!settings.ok) return settings;
      const answer = designFromRequirement(requirement, settings.value, limit);
      return answer.ok ? answer : { ok: false, error: inputError(under('requirement', answer.errors)) };
    },
    adoptDesign: ({ requirement, spec, jobId, job }) => {
      const r = parseRequirement(requirement);
      if (!r.ok) return { ok: false, error: inputError(under('requirement', r.errors)) };
      const s = parseSpec(spec);
      if (!s.ok) return { ok: false, error: inputError(under('spec', s.errors)) };
      const misses = specMisses(r.value, s.value);
      if (misses.length > 0) {
        return { ok: false, error: { code: 'spec-misses-requirement', path: 'spec',
          message: `the spec does not meet the requirement (${misses.map((m) => m.note ?? m.limit).join('; ')}): run the design search again` } };
      }
      return adoptDesign(ctx.store, { requirement: r.value, spec: s.value, jobId, job });
    },
    jobRequirement: ({ jobId }) => jobRequirement(ctx.store, jobId),
  };
}
