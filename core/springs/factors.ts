/** Stress correction factors, one place for all three spring kinds. C (= w) is the spring index D/d. */

/** EN 13906-1 stress correction factor k = (w + 0.5)/(w − 0.75); algebraically the Bergsträsser factor (4C + 2)/(4C − 3), Shigley 9e Eq. (10-6). */
export const bergstraesser = (c: number): number => (c + 0.5) / (c - 0.75);

/** Wahl factor KW = (4C − 1)/(4C − 4) + 0.615/C, Shigley 9e Eq. (10-5). */
export const wahl = (c: number): number => (4 * c - 1) / (4 * c - 4) + 0.615 / c;

/** Direct-shear factor Ks = (2C + 1)/(2C), Shigley 9e Eq. (10-2) (from memory). */
export const directShear = (c: number): number => (2 * c + 1) / (2 * c);

/**
 * Bending factor at the inside of a curved wire: Ki = (4C² − C − 1)/(4C(C − 1)), Shigley 9e §10-12 for torsion
 * springs; the same form is (K)A of an extension hook's bending section with C1 = 2r1/d (§10-11).
 */
export const bendingInner = (c: number): number => (4 * c * c - c - 1) / (4 * c * (c - 1));

/** Torsion-spring bending factor, outer fibre: Ko = (4C² + C − 1)/(4C(C + 1)), Shigley 9e §10-12. */
export const bendingOuter = (c: number): number => (4 * c * c + c - 1) / (4 * c * (c + 1));

/** EN 13906-3 bending correction q = (w + 0.07)/(w − 0.75) (from memory). */
export const enBending = (c: number): number => (c + 0.07) / (c - 0.75);

/** Torsion curvature factor of an extension hook's side bend: (K)B = (4C2 − 1)/(4C2 − 4), C2 = 2r2/d (Shigley 9e §10-11). */
export const hookTorsion = (c2: number): number => (4 * c2 - 1) / (4 * c2 - 4);
