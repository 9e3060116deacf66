import type { SpringReport } from '../../core/calculate';
import { analyseSpec, reportInSpecUnits } from '../../core/calculate';
import type { Settings } from '../../core/settings/schema';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';
import type { Understood } from './convert';
import type { FormError } from './errors';
import { friendlyError } from './errors';
import { getAt, setAt } from './paths';
import type { SpecDraft } from './spec-draft';
import { draftPaths, draftToRaw } from './spec-draft';

/** The live result of the form: the valid spec and its report, or the errors in the way. */
export interface Evaluation {
  /** The spec to save: what was typed, with a field that does not read kept at its saved value. */
  spec: Spec | null;
  /** Internal units (mm, N, MPa), as the drawings take it. */
  internal: SpringReport | null;
  /** The same report in the spec's own units, as the figures show it. */
  report: SpringReport | null;
  /** Spec errors with spec paths (no "spec." prefix). */
  errors: FormError[];
  /** What the reader understood of fields not typed as plain numbers. */
  understood: Understood[];
  /**
   * Fields whose text does not read but whose saved value stands in, so the rest still computes; empty when
   * everything typed reads. A figure that moves when they move (`probes`) waits for them.
   */
  waitingOn: string[];
  /** Reports with every standing-in value moved (halved, a tenth up, doubled), internal units; empty when nothing stands in. */
  probes: SpringReport[];
}

type Raw = Record<string, unknown>;

/** Errors of the draft against the schema, in the form's paths. */
function check(raw: Raw, formPath: (p: string) => string) {
  const parsed = parseSpec(raw);
  return { parsed, errors: parsed.ok ? [] : parsed.errors.map((e) => ({ ...e, path: formPath(e.path) })) };
}

/**
 * The raw spec with each field in `paths` set back to its saved value, or left out when there is none;
 * null when a path is not one the saved spec can stand in for.
 */
function standIn(raw: Raw, paths: readonly string[], saved: Spec | null): Raw {
  let out = raw;
  for (const path of paths) out = setAt(out, path, saved ? getAt(saved, path) : undefined);
  return out;
}

const moved = (raw: Raw, paths: readonly string[], factor: number): Raw =>
  paths.reduce((r, p) => { const v = getAt(r, p); return typeof v === 'number' ? setAt(r, p, v * factor) : r; }, raw);

/** How far the probes move a standing-in value: a figure that stays put under all three does not depend on it. */
const PROBE_FACTORS = [0.5, 1.1, 2];

/**
 * Validates and analyses the draft in the renderer (core/ is platform-free, so no round trip is needed). The shop's
 * settings route set removal the way the plan does; until they are read, the defaults hold. A field
 * whose text does not read, or that the schema refuses, does not hide the rest: its saved value (`saved`) stands
 * in, or an optional one is left out, and the figures that depend on it are told apart by `probes`.
 */
export function evaluateDraft(d: SpecDraft, saved: Spec | null = null, settings?: Settings): Evaluation {
  const { raw, errors: local, formPath, understood } = draftToRaw(d);
  const taken = new Set(local.map((e) => e.path));
  const first = check(raw, formPath);
  const schema = first.errors.filter((e) => !taken.has(e.path));
  const order = draftPaths(d);
  const rank = (path: string) => {
    const i = order.findIndex((p) => path === p || path.startsWith(`${p}.`) || path.startsWith(`${p}[`));
    return i < 0 ? order.length : i;
  };
  // In the order of the form, so the list of what is missing reads like the form.
  const errors = [...local, ...schema].map((e) => friendlyError(e, (path) => getAt(raw, path))).sort((a, b) => rank(a.path) - rank(b.path));
  const none = { understood, waitingOn: [], probes: [] };
  if (first.parsed.ok && local.length === 0) {
    const internal = analyseSpec(first.parsed.value, settings);
    return { spec: first.parsed.value, internal, report: reportInSpecUnits(internal), errors: [], ...none };
  }
  // A field left empty is missing, not wrong: only fields with something typed in them stand in.
  if (errors.some((e) => e.missing || e.path === '' || e.path !== formPath(e.path))) {
    return { spec: null, internal: null, report: null, errors, ...none };
  }
  const waitingOn = [...new Set(errors.map((e) => e.path))];
  const filled = standIn(raw, waitingOn, saved);
  const second = check(filled, formPath);
  if (!second.parsed.ok) return { spec: null, internal: null, report: null, errors, ...none };
  const internal = analyseSpec(second.parsed.value, settings);
  const probes = PROBE_FACTORS.flatMap((f) => {
    const probed = parseSpec(moved(filled, waitingOn, f));
    return probed.ok ? [analyseSpec(probed.value, settings)] : [];
  });
  return { spec: second.parsed.value, internal, report: reportInSpecUnits(internal), errors, understood, waitingOn, probes };
}
