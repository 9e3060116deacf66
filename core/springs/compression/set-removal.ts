/**
 * Set removal (presetting) by an elastic–perfectly-plastic round bar in torsion.
 *
 * The wire yields when the basis stress (a fixed multiple of 8FD/(πd³)) reaches τY. Pressing a spring whose
 * deflection s would cause the elastic stress τe > τY leaves the permanent set s_set = s·(1 − 4r/3 + r⁴/3),
 * r = τY/τe (torsion of a round bar with an elastic core of radius r·c; derived from the bar formulas
 * T = (4/3)·TY·(1 − r³/4) and the elastic spring-back T/(GJ), Beer, Johnston, DeWolf & Mazurek, Mechanics of Materials, 7th ed., §3.11, from memory).
 *
 * Stress is proportional to deflection, so with sY the deflection at which yield starts (τe = τY), the
 * finished length to solid is s − s_set = 4sY/3 − sY⁴/(3s³). Setting that equal to the finished deflection
 * to solid s0 gives the coiled deflection in closed form: s = sY · (sY / (4sY − 3s0))^(1/3), which exists
 * while s0 < 4sY/3 (a fully plastic section carries 4/3 of the yield torque).
 */
export interface SetRemovalSolution {
  /** Deflection from coiled free length to solid. */
  coiledDeflection: number;
  expectedSet: number;
  /** False when no coiled length can reach the finished one within this model. */
  reachable: boolean;
}

export function permanentSet(deflection: number, yieldDeflection: number): number {
  if (deflection <= yieldDeflection) return 0;
  const r = yieldDeflection / deflection;
  return deflection * (1 - (4 * r) / 3 + r ** 4 / 3);
}

/** The coiled deflection to solid for a finished one (NaN beyond the fully plastic section); allocation-free for the engine. */
export function coiledDeflectionFor(finishedDeflection: number, yieldDeflection: number): number {
  const s0 = finishedDeflection;
  const sY = yieldDeflection;
  if (s0 <= sY) return s0;
  const denominator = 4 * sY - 3 * s0;
  return denominator > 0 ? sY * Math.cbrt(sY / denominator) : Number.NaN;
}

export function solveCoiledDeflection(finishedDeflection: number, yieldDeflection: number): SetRemovalSolution {
  const s = coiledDeflectionFor(finishedDeflection, yieldDeflection);
  return Number.isNaN(s)
    ? { coiledDeflection: Number.NaN, expectedSet: Number.NaN, reachable: false }
    : { coiledDeflection: s, expectedSet: s - finishedDeflection, reachable: true };
}

/** Presses to solid at set removal; some makers press several times (common trade practice). */
export const SET_STROKES = 3;

/**
 * Physical limits of a coiled length (common trade practice, stated here so a planner can check them):
 * - the coiled pitch of the active coils at most 0.65 × the mean diameter (helix angle about 12°): beyond it
 *   the pitch tool of an ordinary coiler runs out and the close-coiled formulas no longer hold;
 * - the set at most the finished spring's own deflection to solid (coiled deflection at most twice the
 *   finished one): a larger set is outside what presetting controls and what the model predicts.
 */
export const coiledLimits = { maximumPitchPerMeanDiameter: 0.65, maximumSetPerFinishedDeflection: 1 } as const;

/** Why a method gives no coiled length. */
export type CoiledBound = 'beyond-fully-plastic' | 'set-over-deflection' | 'pitch-over-coiler';

export type SetRemovalMethod = 'handbook' | 'en13906';
/** Which method's verdict routes the job: one of them, or the stricter of the two. */
export type SetRemovalGoverning = SetRemovalMethod | 'stricter';
