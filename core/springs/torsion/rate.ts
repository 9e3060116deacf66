/**
 * Torsion-spring rates. Theory gives θ (turns) = 64·M·D·N/(2π·E·d⁴) = 10.19·M·D·N/(E·d⁴); the handbook
 * form uses 10.8 instead to allow for friction between coils and on the arbor (Shigley 9e §10-12, from
 * memory). EN 13906-3 gives the theoretical rate per degree R = E·d⁴/(3667·D·n), 3667 = 64·180/π (from memory).
 */
export const HANDBOOK_TURN_CONSTANT = 10.8;
export const EN_DEGREE_CONSTANT = 3667;

/** Torque per turn, handbook form: k' = d⁴E/(10.8·D·Na). */
export const torqueRatePerTurn = (E: number, d: number, D: number, na: number): number => (d ** 4 * E) / (HANDBOOK_TURN_CONSTANT * D * na);

/** Torque per degree, EN 13906-3 theoretical form. */
export const torqueRatePerDegreeEn = (E: number, d: number, D: number, na: number): number => (E * d ** 4) / (EN_DEGREE_CONSTANT * D * na);

/** Each straight leg bends like a cantilever: it adds (l1 + l2)/(3πD) equivalent coils (Shigley 9e §10-12; EN 13906-3). */
export const legCoils = (l1: number, l2: number, D: number): number => (l1 + l2) / (3 * Math.PI * D);

/** Bending stress per unit moment, uncorrected: 32/(πd³). */
export const bendingStressPerMoment = (d: number): number => 32 / (Math.PI * d ** 3);
