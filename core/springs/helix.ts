/**
 * Helix formulas shared by the three kinds. Units: mm, N, MPa, kg/dm³.
 */

/** Uncorrected torsional stress of the wire: τ = 8FD/(πd³) (EN 13906-1; Shigley 9e Eq. 10-1 without Ks). */
export const torsionStressPerForce = (D: number, d: number): number => (8 * D) / (Math.PI * d ** 3);

/** Rate of a helical spring in torsion of the wire: R = G d⁴/(8 D³ n) (Shigley 9e Eq. 10-9; EN 13906-1). */
export const helicalRate = (G: number, d: number, D: number, n: number): number => (G * d ** 4) / (8 * D ** 3 * n);

/** Length of wire in one coil of mean diameter D at pitch p (a helix turn). */
export const coilWireLength = (D: number, p: number): number => Math.hypot(Math.PI * D, p);

/** Mass (kg) of a wire of diameter d (mm) and length L (mm) at density ρ (kg/dm³ = 1e-6 kg/mm³). */
export const wireMass = (d: number, length: number, density: number): number =>
  density * 1e-6 * ((Math.PI * d * d) / 4) * length;
