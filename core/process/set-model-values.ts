import type { Spec } from '../spec';
import { compressionDesign } from '../springs/compression/design';
import { analyseCompression } from '../springs/compression/analyse';

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
 * asks here, so a change of the model's outputs is met in this function alone. Null for other kinds.
 */
export function setModelValues(spec: Spec): SetModelValues | null {
  if (spec.kind !== 'compression') return null;
  const x = compressionDesign(spec);
  if (!x) return null;
  const r = analyseCompression(x);
  const s = r.setRemoval;
  return {
    freeLength: r.freeLength,
    solidLength: r.solidLength,
    coiledFreeLength: s.required ? s.coiledFreeLength : r.freeLength,
    expectedSet: s.required ? s.expectedSet : 0,
    required: s.required,
  };
}
