import { describe, expect, it } from 'vitest';
import { bucklingDeflection, slendernessLimit } from '../../core/springs/compression/buckling';
import { minimumCoilGapSum } from '../../core/springs/compression/clearance';
import { naturalFrequency } from '../../core/springs/compression/surge';
import { helicalRate, torsionStressPerForce } from '../../core/springs/helix';
import { permanentSet, solveCoiledDeflection } from '../../core/springs/compression/set-removal';
import { gerberSafetyFactor, goodmanSafetyFactor } from '../../core/springs/fatigue';
import { MM_PER_IN, MPA_PER_PSI, N_PER_LBF } from '../../core/units';

const G = 81_500;
const E = 206_000;

describe('buckling (EN 13906-1, from memory; Shigley 9e Eq. 10-10)', () => {
  it('sK = 11.87 mm for L0 = 100, D = 20, ν = 1 with EN moduli (derived from Shigley 9e Eq. 10-10)', () => {
    expect(bucklingDeflection(100, 20, 1, G, E)).toBeCloseTo(11.87, 2);
  });

  it('slenderness limits 5.24 / 2.62 at G/E ≈ 0.383 (aabag.de "Knicksicherheit"; Shigley 9e 2.63/α) — §8 row 17', () => {
    const g = 11.5e6;
    const e = 30e6;
    expect(slendernessLimit(0.5, g, e) / 5.24).toBeCloseTo(1, 2);
    expect(slendernessLimit(1, g, e) / 2.62).toBeCloseTo(1, 2);
  });

  it('with EN moduli the limits are 5.16 / 2.58 (§8 row 17, derived note)', () => {
    expect(slendernessLimit(0.5, G, E)).toBeCloseTo(5.16, 2);
    expect(slendernessLimit(1, G, E)).toBeCloseTo(2.58, 2);
  });

  it('a spring shorter than the limit cannot buckle', () => {
    expect(bucklingDeflection(2.5 * 20, 20, 1, G, E)).toBeNull();
    expect(bucklingDeflection(2.6 * 20, 20, 1, G, E)).not.toBeNull();
  });
});

describe('minimum coil gaps (EN 13906-1 via the FEBROTEC FAQ)', () => {
  it('Sa = 4.0 mm static, 6.0 mm cyclic for D = 20, d = 2, n = 8 (§8 row 19, derived)', () => {
    expect(minimumCoilGapSum(20, 2, 8, false)).toBeCloseTo(4.0, 10);
    expect(minimumCoilGapSum(20, 2, 8, true)).toBeCloseTo(6.0, 10);
  });
});

describe('rate and surge (Shigley 9e Eqs. 10-9, 10-25)', () => {
  it('k = 2.547 N/mm and fe = 226.6 Hz for d = 2, D = 20, n = 8 (§8 row 21, derived)', () => {
    expect(helicalRate(G, 2, 20, 8)).toBeCloseTo(2.547, 3);
    expect(naturalFrequency(2, 20, 8, G, 7.85) / 226.6).toBeCloseTo(1, 2);
  });

  it('fe equals ½√(k/m_active) with the active mass 12.40 g (§8 row 21)', () => {
    const k = helicalRate(G, 2, 20, 8) * 1000; // N/m
    const activeMass = 7.85e-6 * (Math.PI * 4 / 4) * Math.PI * 20 * 8; // kg: ρ·A·πDn
    expect(activeMass * 1000).toBeCloseTo(12.40, 2);
    expect(naturalFrequency(2, 20, 8, G, 7.85)).toBeCloseTo(0.5 * Math.sqrt(k / activeMass), 6);
  });
});

describe('uncorrected stress (Machinery\'s Handbook 31e Table 4, 8PD/(πd³))', () => {
  it('7171 psi per lbf for d = 0.0625 in, D = 0.6875 in (§8 row 13, reproduces the handbook p. 328 example)', () => {
    const perForce = torsionStressPerForce(0.6875 * MM_PER_IN, 0.0625 * MM_PER_IN); // MPa per N
    const psiPerLbf = (perForce * N_PER_LBF) / MPA_PER_PSI;
    expect(psiPerLbf / 7171).toBeCloseTo(1, 3);
    // Handbook example: 2 lbf initial tension → 14 340 psi; 7 lbf → 50 200 psi (±0.2 %).
    expect((2 * psiPerLbf) / 14340).toBeCloseTo(1, 2);
    expect((7 * psiPerLbf) / 50200).toBeCloseTo(1, 2);
  });
});

describe('permanent set, elastic–perfectly-plastic bar in torsion', () => {
  // Derived from the elastic–perfectly-plastic round bar in torsion (Beer, Johnston, DeWolf & Mazurek, Mechanics of
  // Materials, 7th ed., §3.11, from memory; see docs/sources.md): T = (4/3)·TY·(1 − r³/4) and the
  // elastic spring-back T/(GJ).
  it.each([[1.1, 0.016], [1.2, 0.05], [1.3, 0.091], [1.5, 0.177], [2.0, 0.354]])(
    'τe/τY = %f leaves %f of the imposed deflection as set', (ratio, fraction) => {
      expect(permanentSet(ratio, 1) / ratio).toBeCloseTo(fraction, 3);
    });

  it('the solved coiled deflection sets back exactly to the finished deflection', () => {
    for (const s0 of [1.05, 1.1, 1.2, 1.3]) {
      const sol = solveCoiledDeflection(s0, 1);
      expect(sol.reachable).toBe(true);
      expect(sol.coiledDeflection - permanentSet(sol.coiledDeflection, 1)).toBeCloseTo(s0, 12);
    }
    expect(solveCoiledDeflection(4 / 3 + 0.01, 1).reachable).toBe(false);
  });
});

describe('fatigue lines with Zimmerli data (Shigley 9e §10-9)', () => {
  // Shigley 9e §10-9, Ssu = 0.67·Sut: Sut = 1800 MPa → Ssu = 1206 MPa; Gerber Sse 267.4, Goodman Sse 351.4 (derived).
  // With zero mean stress the safety factor per unit alternating stress equals the endurance intercept.
  it('endurance intercepts for Sut = 1800 MPa, unpeened', () => {
    const ssu = 0.67 * 1800;
    expect(gerberSafetyFactor(1, 0, 241, 379, ssu)).toBeCloseTo(267.4, 1);
    expect(goodmanSafetyFactor(1, 0, 241, 379, ssu)).toBeCloseTo(351.4, 1);
  });

  it('the Zimmerli point itself has a safety factor of 1 on both lines', () => {
    const ssu = 0.67 * 1800;
    expect(gerberSafetyFactor(241, 379, 241, 379, ssu)).toBeCloseTo(1, 10);
    expect(goodmanSafetyFactor(241, 379, 241, 379, ssu)).toBeCloseTo(1, 10);
  });
});
