/**
 * First natural (surge) frequency of a compression spring with both ends against flat plates:
 * fe = d/(2π·n·D²)·√(G/(2ρ)) (Shigley 9e Eq. 10-25 in closed form; EN 13906-1 gives the same
 * expression, from memory). d, D in mm, G in MPa = N/mm², ρ in kg/dm³ (1e-9 t/mm³ per kg/dm³), result Hz.
 */
export function naturalFrequency(d: number, D: number, na: number, G: number, density: number): number {
  return (d / (2 * Math.PI * na * D * D)) * Math.sqrt(G / (2 * density * 1e-9));
}

/** Keep the surge frequency at least this many times the operating frequency (Shigley 9e §10-9, from memory: 15–20). */
export const SURGE_MARGIN = 15;
