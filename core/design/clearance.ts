/**
 * Room a compression spring needs in a bore or over a rod. The outside diameter grows as the spring is
 * compressed (EN 13906-1 ΔDe, core/springs/compression/clearance), so the bore is compared with the
 * outside diameter at solid; both sides then keep a clearance of a tenth of the mean coil diameter.
 */
export const guideClearance = {
  /** Diametral clearance as a fraction of the mean coil diameter D, to the bore and to the rod. */
  fractionOfMeanDiameter: 0.1,
  source: 'common trade practice: at least about 10 % clearance to a bore or rod, for the diameter growth and the coil-diameter tolerance',
  verified: false,
} as const;

/** Largest outside diameter at solid a bore takes: bore − 0.1·D. */
export const boreLimit = (bore: number, D: number): number => bore - guideClearance.fractionOfMeanDiameter * D;

/** Smallest inside diameter that clears a rod: rod + 0.1·D. */
export const rodLimit = (rod: number, D: number): number => rod + guideClearance.fractionOfMeanDiameter * D;
