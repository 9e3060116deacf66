import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import type { JobFields, JobShape } from '../../core/api/store';
import { jobInputSchema } from '../../core/api/store';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';
import { zodErrors } from '../../core/validation';
import { ENGINE_VERSION } from '../../core/engine-version';
import { jobShape } from './shape';

export interface CheckedSpec {
  spec: Spec;
  shape: JobShape;
  /** The engine version that computed `shape`: this program's. */
  shapeEngine: number;
}

/** parseSpec, then the analysis the indexed columns come from; errors carry paths under `prefix`. */
export function checkSpec(raw: unknown, prefix: readonly PropertyKey[]): Result<CheckedSpec> {
  const parsed = parseSpec(raw);
  if (!parsed.ok) {
    return fail(parsed.errors.map((e) => ({ ...e, path: joinPath(prefix, e.path) })));
  }
  try {
    return ok({ spec: parsed.value, shape: jobShape(parsed.value), shapeEngine: ENGINE_VERSION });
  } catch (e) {
    return fail([fieldError('analysis-failed', formatPath(prefix), `the spec cannot be analysed: ${(e as Error).message}`)]);
  }
}

function joinPath(prefix: readonly PropertyKey[], path: string): string {
  const head = formatPath(prefix);
  if (path === '') return head;
  return path.startsWith('[') ? `${head}${path}` : `${head}.${path}`;
}

export interface CheckedJob extends CheckedSpec {
  fields: JobFields;
}

function customerErrors(fields: JobFields, prefix: readonly PropertyKey[]): FieldError[] {
  if (fields.customer && fields.customerId !== undefined) {
    return [fieldError('customer-twice', formatPath([...prefix, 'customerId']), 'give the customer by name or by id, not both')];
  }
  return [];
}

/** Every check a new job passes before anything is written. */
export function checkNewJob(raw: unknown, prefix: readonly PropertyKey[] = []): Result<CheckedJob> {
  const parsed = jobInputSchema.safeParse(raw);
  if (!parsed.success) {
    const errors = zodErrors(parsed.error, prefix);
    const spec = typeof raw === 'object' && raw !== null ? (raw as { spec?: unknown }).spec : undefined;
    const specCheck = checkSpec(spec, [...prefix, 'spec']);
    return fail(specCheck.ok ? errors : [...errors, ...specCheck.errors]);
  }
  const errors = customerErrors(parsed.data, prefix);
  const checked = checkSpec(parsed.data.spec, [...prefix, 'spec']);
  if (!checked.ok) errors.push(...checked.errors);
  if (errors.length > 0 || !checked.ok) return fail(errors);
  return ok({ fields: parsed.data, ...checked.value });
}
