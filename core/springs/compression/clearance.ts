/**
 * Sum of minimum gaps between active coils at the deepest working length, cold-coiled springs:
 * Sa = (0.0015·D²/d + 0.1·d)·n for static duty; raised by 50 % for cyclic duty (EN 13906-1, as given in
 * the FEBROTEC spring makers' FAQ; the 1.5 factor is marked there as an experience value).
 */
export const CYCLIC_GAP_FACTOR = 1.5;

export function minimumCoilGapSum(D: number, d: number, na: number, cyclic: boolean): number {
  const sa = (0.0015 * (D * D) / d + 0.1 * d) * na;
  return cyclic ? sa * CYCLIC_GAP_FACTOR : sa;
}

/**
 * Increase of the outside diameter when compressed to solid with ends free to turn, EN 13906-1 (from
 * memory): ΔDe = 0.1·(m² − 0.8·m·d − 0.2·d²)/D, m the pitch of the unloaded spring.
 */
export function outsideDiameterGrowth(pitch: number, d: number, D: number): number {
  return Math.max(0, (0.1 * (pitch * pitch - 0.8 * pitch * d - 0.2 * d * d)) / D);
}
