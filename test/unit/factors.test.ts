import { describe, expect, it } from 'vitest';
import { bendingInner, bendingOuter, bergstraesser, directShear, enBending, wahl } from '../../core/springs/factors';

describe('stress correction factors at C = w = 8', () => {
  // Formulas: Shigley 9e Eqs. (10-2), (10-5), (10-6) and §10-12; EN 13906-1 k, EN 13906-3 q (from memory).
  // Values derived from those formulas at C = 8.
  it.each([
    ['Wahl KW', wahl, 1.184],
    ['Bergsträsser KB = EN k', bergstraesser, 1.1724],
    ['direct shear Ks', directShear, 1.0625],
    ['torsion inner fibre Ki', bendingInner, 1.1027],
    ['torsion outer fibre Ko', bendingOuter, 0.9132],
    ['EN 13906-3 q', enBending, 1.1131],
  ])('%s', (_name, factor, expected) => {
    expect(factor(8)).toBeCloseTo(expected, 4);
  });

  it('Bergsträsser (4C+2)/(4C−3) equals the EN form (w+0.5)/(w−0.75) at every index', () => {
    for (let c = 2.5; c < 30; c += 0.37) expect(bergstraesser(c)).toBeCloseTo((4 * c + 2) / (4 * c - 3), 12);
  });

  // Shigley 9e §10-2 notes KB and KW differ by under 1 % (values at C = 4…12 derived from Eqs. 10-5 and 10-6).
  it.each([[4, 1.404, 1.385], [6, 1.253, 1.238], [10, 1.145, 1.135], [12, 1.119, 1.111]])(
    'C = %d: KW %f, KB %f', (c, kw, kb) => {
      // The notes print three decimals: agree to half a unit in the last place.
      expect(Math.abs(wahl(c) - kw)).toBeLessThanOrEqual(0.00051);
      expect(Math.abs(bergstraesser(c) - kb)).toBeLessThanOrEqual(0.00051);
    });
});
