import type { Spec } from '../spec';
import { compressionDesign } from '../springs/compression/design';
import { analyseCompression } from '../springs/compression/analyse';
import { solidLength } from '../springs/compression/ends';
import type { SetRemovalGoverning } from '../springs/compression/set-removal';

/** What the set-removal model predicts for one compression spring (internal units, mm). */
export interface SetModelValues {
  freeLength: number;
  solidLength: number;
  /** Free length to coil to; the free length itself when no set removal is needed; null when the model finds none. */
  coiledFreeLength: number | null;
  /** Set the press is expected to take out; 0 without set removal; null when the model finds no coiled length. */
  expectedSet: number | null;
  required: boolean;
}

/**
 * The one place first-off records and their calibration read the set-removal model: every other file
 * asks here, so a change of the model's outputs is met in this function alone. `method` is the shop's
 * `defaults.setRemovalMethod`, the same one the plan routes by, and the values are the coiler's settings
 * the plan and traveller print (coiled free length and expected set). Null for other kinds.
 */
export function setModelValues(spec: Spec, method: SetRemovalGoverning): SetModelValues | null {
  if (spec.kind !== 'compression') return null;
  const x = compressionDesign(spec);
  if (!x) return null;
  const r = analyseCompression(x, method);
  const coiled = r.coiler.freeLength;
  return {
    freeLength: r.freeLength,
    solidLength: r.solidLength,
    coiledFreeLength: coiled,
    expectedSet: coiled === null ? null : r.coiler.expectedSet,
    required: r.setRemoval.required,
  };
}

/** Free and solid length of a compression spring, which no set-removal method changes; null for other kinds. */
export function finishedLengths(spec: Spec): { freeLength: number; solidLength: number } | null {
  if (spec.kind !== 'compression') return null;
  const x = compressionDesign(spec);
  return x ? { freeLength: x.L0, solidLength: solidLength(x.ends, x.d, x.nt) } : null;
}
