import type { Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { zodErrors } from '../validation';
import { z } from 'zod';
import { compressionRequirementSchema } from './schema';
import { compressionRequirementErrors } from './rules';
import { extensionRequirementSchema } from './extension';
import { extensionRequirementErrors } from './extension-rules';
import { torsionRequirementSchema } from './torsion';
import { torsionRequirementErrors } from './torsion-rules';

export * from './schema';
export * from './extension';
export * from './torsion';
export { requirementInternal } from './internal';
export type { RequirementInternal } from './internal';
export { extensionRequirementInternal } from './extension-internal';
export type { ExtensionRequirementInternal } from './extension-internal';

/** The requirement of any kind the search designs. */
export const requirementSchema = z.discriminatedUnion('kind', [compressionRequirementSchema, extensionRequirementSchema, torsionRequirementSchema]);
export type Requirement = z.infer<typeof requirementSchema>;

export const requirementKinds = ['compression', 'extension', 'torsion'] as const;

/** Validates raw input as a requirement. Never throws: every problem comes back with the field it concerns. */
export function parseRequirement(raw: unknown): Result<Requirement> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return fail([fieldError('not-an-object', '', 'a requirement must be a JSON object')]);
  }
  const kind = (raw as { kind?: unknown }).kind;
  if (!requirementKinds.includes(kind as never)) {
    return fail([fieldError('invalid-kind', 'kind', `kind must be one of: ${requirementKinds.join(', ')}`)]);
  }
  const parsed = requirementSchema.safeParse(raw);
  if (!parsed.success) return fail(zodErrors(parsed.error));
  const r = parsed.data;
  const errors = r.kind === 'compression' ? compressionRequirementErrors(r)
    : r.kind === 'extension' ? extensionRequirementErrors(r) : torsionRequirementErrors(r);
  return errors.length > 0 ? fail(errors) : ok(r);
}
