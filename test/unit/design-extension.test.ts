import { describe, expect, it } from 'vitest';
import { calculate } from '../../core/calculate';
import type { ExtensionReport } from '../../core/springs/extension/report';
import { designFromRequirement, searchExtension, wireChoices } from '../../core/design';
import { extensionPoint, extensionPointSpec, extensionDiameterRange } from '../../core/design/extension-search';
import { extensionMisses } from '../../core/design/extension-accept';
import { meanDiameterGrid } from '../../core/design/space';
import { extensionRequirementInternal, parseRequirement } from '../../core/requirement';
import type { ExtensionRequirement } from '../../core/requirement';
import { wireProperties } from '../../core/materials';
import { estimateCost } from '../../core/costing/estimate';
import { demoShop } from './design-fixtures';
import lidStay from '../../examples/lid-stay.requirement.json';

function extensionOf(raw: unknown): ExtensionRequirement {
  const r = parseRequirement(raw);
  if (!r.ok || r.value.kind !== 'extension') throw new Error(JSON.stringify(r));
  return r.value;
}

const narrow = { ...lidStay, choices: { ...lidStay.choices, grades: ['en10270-1-sh', 'astm-a228'] } };

describe('extension springs from a requirement (demo lid stay)', () => {
  const answer = designFromRequirement(lidStay, demoShop);
  const a = answer.ok ? answer.value : null;

  it('finds designs and ranks them by the costing of each alone', () => {
    expect(a!.kind).toBe('extension');
    expect(a!.candidates.length).toBeGreaterThan(2);
    for (const c of a!.candidates) {
      expect(c.unitPrice).toBeCloseTo(estimateCost(JSON.parse(JSON.stringify(c.spec)), demoShop, [a!.mainQuantity]).breaks[0]!.unitPrice, 10);
    }
    const prices = a!.candidates.map((c) => c.unitPrice);
    expect(prices).toEqual([...prices].sort((x, y) => x - y));
  });

  it('every design meets the requirement when the engine analyses its spec alone', () => {
    for (const c of a!.candidates) {
      const result = calculate(JSON.parse(JSON.stringify(c.spec)));
      expect(result.ok).toBe(true);
      const r = (result as { value: ExtensionReport }).value;
      expect(r.findings.filter((f) => f.severity === 'error')).toEqual([]);
      // Forces within ±10 % at 60 and 80 mm inside the ends; OD ≤ 14; free length ≤ 55; initial tension ≥ 3 N.
      expect(Math.abs(r.loads[0]!.force - 20)).toBeLessThanOrEqual(2);
      expect(Math.abs(r.loads[1]!.force - 45)).toBeLessThanOrEqual(4.5);
      expect(r.outerDiameter).toBeLessThanOrEqual(14 + 1e-9);
      expect(r.freeLength).toBeLessThanOrEqual(55 + 1e-9);
      expect(r.initialTension).toBeGreaterThanOrEqual(3);
      // Free length of two ordinary loops: L0 = 2(D − d) + (Nb + 1)·d (Shigley 9e §10-11, from memory).
      expect(r.freeLength).toBeCloseTo(2 * (r.meanDiameter - r.wireDiameter) + (r.bodyCoils + 1) * r.wireDiameter, 9);
      // Initial-tension stress inside the preferred window τi = 231/exp(0.105·C) ± 6.9·(4 − (C − 3)/6.5) MPa (Shigley 9e §10-11, from memory).
      const C = r.springIndex;
      const centre = 231 / Math.exp(0.105 * C);
      const half = 6.9 * (4 - (C - 3) / 6.5);
      expect(r.initialTensionStress).toBeGreaterThanOrEqual(centre - half - 1e-9);
      expect(r.initialTensionStress).toBeLessThanOrEqual(centre + half + 1e-9);
    }
  });

  it('misses no feasible design: against the full engine at every diameter of the envelope', () => {
    const r = extensionOf(narrow);
    const req = extensionRequirementInternal(r);
    const brute = new Map<string, number>();
    for (const wire of wireChoices(req, demoShop)) {
      const props = wireProperties(wire.grade.id, wire.d)!.props;
      for (const D of meanDiameterGrid(extensionDiameterRange(req, wire.d), demoShop.design.diameterStep)) {
        for (const ends of req.ends) {
          const p = extensionPoint(req, props, wire.grade.id, wire.d, D, ends, demoShop.design);
          const calc = calculate(JSON.parse(JSON.stringify(extensionPointSpec(r, p))));
          if (!calc.ok) continue;
          const report = calc.value as ExtensionReport;
          if (extensionMisses(req, report).length > 0) continue;
          const key = `${wire.grade.id}|${wire.d}|${ends}`;
          brute.set(key, Math.min(brute.get(key) ?? Infinity, report.wireLength));
        }
      }
    }
    const fast = new Map(searchExtension(r, demoShop).combinations.map((c) => [`${c.wire.grade.id}|${c.wire.d}|${c.ends}`, c.designs[0]!.wireLength]));
    expect(brute.size).toBeGreaterThan(0);
    expect([...fast.keys()].sort()).toEqual([...brute.keys()].sort());
    for (const [key, least] of brute) expect(fast.get(key), key).toBeCloseTo(least, 6);
  }, 60_000);

  it('an initial tension no loop can hold names that limit', () => {
    const none = designFromRequirement({ ...lidStay, initialTension: { min: 19 } }, demoShop);
    expect(none.ok && none.value.candidates).toEqual([]);
    const x = none.ok ? none.value.infeasible! : null;
    expect(x!.message).toMatch(/No design meets the requirement/);
    expect(x!.closest!.misses.map((m) => m.limit)).toContain('initial-tension');
  });

  it('refuses forces that fall as the spring is stretched, naming the field', () => {
    const r = parseRequirement({ ...lidStay, function: { type: 'two-loads', loads: [{ length: 60, force: 45 }, { length: 80, force: 20 }] } });
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['function.loads[1].force']);
  });
});
