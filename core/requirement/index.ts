import type { Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { zodErrors } from '../validation';
import { compressionRequirementSchema } from './schema';
import type { Requirement } from './schema';
import { compressionRequirementErrors } from './rules';

export * from './schema';
export { requirementInternal } from './internal';
export type { RequirementInternal } from './internal';

export const requirementKinds = ['compression'] as const;

/** Validates raw input as a requirement. Never throws: every problem comes back with the field it concerns. */
export function parseRequirement(raw: unknown): Result<Requirement> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return fail([fieldError('not-an-object', '', 'a requirement must be a JSON object')]);
  }
  const kind = (raw as { kind?: unknown }).kind;
  if (kind !== 'compression') {
    const known = kind === 'extension' || kind === 'torsion';
    return fail([fieldError(known ? 'kind-not-searched' : 'invalid-kind', 'kind', known
      ? `designing ${String(kind)} springs from a requirement is not available yet: only compression`
      : `kind must be one of: ${requirementKinds.join(', ')}`)]);
  }
  const parsed = compressionRequirementSchema.safeParse(raw);
  if (!parsed.success) return fail(zodErrors(parsed.error));
  const errors = compressionRequirementErrors(parsed.data);
  return errors.length > 0 ? fail(errors) : ok(parsed.data);
}
