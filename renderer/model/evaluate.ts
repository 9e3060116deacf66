import type { SpringReport } from '../../core/calculate';
import { analyseSpec, reportInSpecUnits } from '../../core/calculate';
import type { Settings } from '../../core/settings/schema';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';
import type { FormError } from './errors';
import { friendlyError } from './errors';
import type { SpecDraft } from './spec-draft';
import { draftPaths, draftToRaw } from './spec-draft';

/** The live result of the form: the valid spec and its report, or the errors in the way. */
export interface Evaluation {
  spec: Spec | null;
  /** Internal units (mm, N, MPa), as the drawings take it. */
  internal: SpringReport | null;
  /** The same report in the spec's own units, as the figures show it. */
  report: SpringReport | null;
  /** Spec errors with spec paths (no "spec." prefix). */
  errors: FormError[];
}

/**
 * Validates and analyses the draft in the renderer: core/ is platform-free, so no round trip is needed. The
 * shop's settings route set removal the way the plan does; until they are read, the defaults hold.
 */
export function evaluateDraft(d: SpecDraft, settings?: Settings): Evaluation {
  const { raw, errors: local, formPath } = draftToRaw(d);
  const taken = new Set(local.map((e) => e.path));
  const parsed = parseSpec(raw);
  const schema = parsed.ok ? [] : parsed.errors.map((e) => ({ ...e, path: formPath(e.path) })).filter((e) => !taken.has(e.path));
  const order = draftPaths(d);
  const rank = (path: string) => {
    const i = order.findIndex((p) => path === p || path.startsWith(`${p}.`) || path.startsWith(`${p}[`));
    return i < 0 ? order.length : i;
  };
  // In the order of the form, so the list of what is missing reads like the form.
  const errors = [...local, ...schema].map(friendlyError).sort((a, b) => rank(a.path) - rank(b.path));
  if (!parsed.ok || local.length > 0) return { spec: null, internal: null, report: null, errors };
  const internal = analyseSpec(parsed.value, settings);
  return { spec: parsed.value, internal, report: reportInSpecUnits(internal), errors: [] };
}
