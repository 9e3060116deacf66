import type { ExtensionEndForm } from '../../spec/extension';

/**
 * Extension-spring ends. The inside height of a loop (from the end of the body to the inside of the
 * loop) is one inside diameter for the ordinary loops: Shigley 9e §10-11 writes L0 = 2(D − d) + (Nb + 1)·d
 * for two machine or full loops (from memory); EN 13906-2 Annex A gives LH ≈ 0.8–1.1·Di for a full loop
 * (from memory). An extended hook adds its straight length.
 * Wire per end: a full, crossover or side loop takes about one coil (π·D), a machine loop about ¾ of one
 * (common trade practice, as spring makers' nomenclature pages describe loops; see docs/sources.md).
 */
/** Geometry of each end form; its name is in core/vocabulary.ts. */
export interface ExtensionEndData {
  /** Inside height in inside diameters. */
  heightInInsideDiameters: number;
  /** Wire in coils of mean diameter. */
  wireInCoils: number;
  /** Formed on the coiler (true) or on a second machine after coiling. */
  formedOnCoiler: boolean;
}

export const extensionEnds: Record<ExtensionEndForm, ExtensionEndData> = {
  'machine-loop': { heightInInsideDiameters: 1, wireInCoils: 0.75, formedOnCoiler: true },
  'full-loop': { heightInInsideDiameters: 1, wireInCoils: 1, formedOnCoiler: false },
  'crossover-loop': { heightInInsideDiameters: 1, wireInCoils: 1, formedOnCoiler: false },
  'side-loop': { heightInInsideDiameters: 1, wireInCoils: 1, formedOnCoiler: false },
  'extended-hook': { heightInInsideDiameters: 1, wireInCoils: 1, formedOnCoiler: false },
};

/** Side-bend radius r2 assumed when the drawing gives none: 2·d, the least that keeps C2 = 2r2/d at 4 (Shigley 9e §10-11 asks C2 > 4). */
export const DEFAULT_BEND_RADIUS_IN_WIRE_DIAMETERS = 2;
