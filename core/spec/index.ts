import { z } from 'zod';
import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { zodErrors } from '../validation';
import { kindEntryOf } from '../kinds/registry';
import { compressionSpecSchema } from './compression';
import { extensionSpecSchema } from './extension';
import { torsionSpecSchema } from './torsion';
import { upgradeSpec } from './versions';
import { compileSchema, REFUSED } from './compiled-schema';

export * from './compression';
export * from './extension';
export * from './torsion';
export { SPEC_VERSION, specUpgrades, upgradeSpec } from './versions';
export type { RawSpec, SpecUpgrade } from './versions';

/**
 * The one input shape of a spring, for every kind; the same in the UI, the store, the CLI and import files.
 * The kind union comes from here; the kind registry (core/kinds/registry.ts) must then have an entry for each.
 */
export const specSchema = z.discriminatedUnion('kind', [compressionSpecSchema, extensionSpecSchema, torsionSpecSchema]);

export type Spec = z.infer<typeof specSchema>;
export type SpecInput = z.input<typeof specSchema>;
export type SpringKind = Spec['kind'];
/** Every kind, in the schema's order (the order select lists show them in). */
export const springKinds: readonly SpringKind[] = specSchema.options.map((o) => o.shape.kind.value);

/** Schema errors with the spec's own wording for a wrong kind. */
function schemaErrors(error: z.ZodError): FieldError[] {
  return zodErrors(error).map((e) =>
    e.path === 'kind' && e.code === 'invalid-invalid-union'
      ? fieldError('invalid-kind', 'kind', `kind must be one of: ${springKinds.join(', ')}`)
      : e);
}

/** The schema compiled once: a spec it certainly accepts is parsed without zod's general machinery. */
const acceptedSpec = compileSchema(specSchema);

/**
 * Validates raw input as a spec, after bringing an older version up by the declared steps. Never throws:
 * every problem comes back with the field it concerns.
 */
export function parseSpec(raw: unknown): Result<Spec> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return fail([fieldError('not-an-object', '', 'a spec must be a JSON object')]);
  }
  const upgraded = upgradeSpec(raw as Record<string, unknown>);
  if (!upgraded.ok) return upgraded;
  let spec = acceptedSpec(upgraded.value);
  if (spec === REFUSED) {
    const parsed = specSchema.safeParse(upgraded.value);
    if (!parsed.success) return fail(schemaErrors(parsed.error));
    spec = parsed.data;
  }
  const errors = kindEntryOf(spec.kind).specErrors(spec);
  return errors.length > 0 ? fail(errors) : ok(spec);
}
export * from './bounds';
