import type { StoredProblem } from '../../core/api/store';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';

/** A spec read from the store: the checked (and, when older, upgraded) spec, or why it no longer reads. */
export type StoredSpec = { ok: true; spec: Spec } | { ok: false; problem: StoredProblem; raw: unknown };

function problem(code: string, path: string, message: string): StoredProblem {
  return { code, path, message };
}

/** The column is CHECKed as JSON, but a damaged page or an outside edit can still leave text that is not. */
function parseJson(text: string): { ok: true; value: unknown } | { ok: false } {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch {
    return { ok: false };
  }
}

/**
 * Reads a stored spec the way every input is read: JSON, the declared version steps, the schema and its
 * rules. `record` names what holds it ("job J-26-0012", "revision 3 of job J-26-0012") for the message.
 */
export function readStoredSpec(text: string | null | undefined, record: string): StoredSpec {
  const json = parseJson(text ?? '');
  if (!json.ok) {
    return { ok: false, raw: text ?? null, problem: problem('stored-spec-damaged', 'spec', `${record}: the stored spec is not readable JSON`) };
  }
  const parsed = parseSpec(json.value);
  if (parsed.ok) return { ok: true, spec: parsed.value };
  const first = parsed.errors[0]!;
  const path = first.path === '' ? 'spec' : first.path.startsWith('[') ? `spec${first.path}` : `spec.${first.path}`;
  const code = first.code === 'spec-too-new' ? 'stored-spec-too-new' : 'stored-spec-invalid';
  const more = parsed.errors.length > 1 ? ` (and ${parsed.errors.length - 1} more)` : '';
  return {
    ok: false, raw: json.value,
    problem: problem(code, path, `${record}: the stored spec no longer reads with this version of Coilwright: ${path}: ${first.message}${more}`),
  };
}

/** The spec to carry forward unchanged when a job is saved without a new one: upgraded when it reads, as stored when not. */
export function carriedSpec(stored: StoredSpec): unknown {
  return stored.ok ? stored.spec : stored.raw;
}
