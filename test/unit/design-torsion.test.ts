import { describe, expect, it } from 'vitest';
import { calculate } from '../../core/calculate';
import type { TorsionReport } from '../../core/springs/torsion/report';
import { designFromRequirement, searchTorsion, wireChoices } from '../../core/design';
import { torsionDiameterRange, torsionMisses, torsionPoint, torsionPointSpec, torsionRequirementInternal } from '../../core/design/torsion-search';
import { meanDiameterGrid } from '../../core/design/space';
import { parseRequirement } from '../../core/requirement';
import type { TorsionRequirement } from '../../core/requirement';
import { wireProperties } from '../../core/materials';
import { estimateCost } from '../../core/costing/estimate';
import { demoShop } from './design-fixtures';
import hinge from '../../examples/hinge.requirement.json';

function torsionOf(raw: unknown): TorsionRequirement {
  const r = parseRequirement(raw);
  if (!r.ok || r.value.kind !== 'torsion') throw new Error(JSON.stringify(r));
  return r.value;
}

describe('torsion springs from a requirement (demo hinge return spring)', () => {
  const answer = designFromRequirement(hinge, demoShop);
  const a = answer.ok ? answer.value : null;

  it('finds designs, each priced as the costing prices its spec alone, cheapest first', () => {
    expect(a!.kind).toBe('torsion');
    expect(a!.candidates.length).toBeGreaterThan(2);
    for (const c of a!.candidates) {
      expect(c.unitPrice).toBeCloseTo(estimateCost(JSON.parse(JSON.stringify(c.spec)), demoShop, [a!.mainQuantity]).breaks[0]!.unitPrice, 10);
    }
    const prices = a!.candidates.map((c) => c.unitPrice);
    expect(prices).toEqual([...prices].sort((x, y) => x - y));
  });

  it('every design gives the two torques 60° apart and fits the arbor and the space, analysed alone', () => {
    for (const c of a!.candidates) {
      const result = calculate(JSON.parse(JSON.stringify(c.spec)));
      expect(result.ok).toBe(true);
      const r = (result as { value: TorsionReport }).value;
      expect(r.findings.filter((f) => f.severity === 'error')).toEqual([]);
      expect(r.loads[1]!.angle - r.loads[0]!.angle).toBeCloseTo(60, 9);
      expect(Math.abs(r.loads[0]!.torque - 150)).toBeLessThanOrEqual(15);
      expect(Math.abs(r.loads[1]!.torque - 400)).toBeLessThanOrEqual(40);
      // Rate per turn d⁴E/(10.8·D·Na), Na = Nb + (l1 + l2)/(3πD) (Shigley 9e §10-12, from memory).
      const na = r.bodyCoils + (25 + 30) / (3 * Math.PI * r.meanDiameter);
      expect(r.ratePerTurn).toBeCloseTo((r.wireDiameter ** 4 * r.elasticModulus) / (10.8 * r.meanDiameter * na), 6);
      // Arbor: the loaded inside diameter clears the 8 mm arbor by at least 10 % (common practice).
      expect((r.insideDiameterAtLoad - 8) / r.insideDiameterAtLoad).toBeGreaterThanOrEqual(0.1 - 1e-9);
      expect(r.outsideDiameterAtLoad).toBeLessThanOrEqual(18 + 1e-9);
      expect(r.bodyLengthAtLoad).toBeLessThanOrEqual(20 + 1e-9);
    }
  });

  it('misses no feasible design: against the full engine at every diameter of the envelope', () => {
    const r = torsionOf({ ...hinge, choices: { ...hinge.choices, grades: ['en10270-1-sh', 'astm-a229'] } });
    const req = torsionRequirementInternal(r);
    const brute = new Map<string, number>();
    for (const wire of wireChoices(req, demoShop)) {
      const props = wireProperties(wire.grade.id, wire.d)!.props;
      for (const D of meanDiameterGrid(torsionDiameterRange(req, wire.d), demoShop.design.diameterStep)) {
        const calc = calculate(JSON.parse(JSON.stringify(torsionPointSpec(r, torsionPoint(req, props, wire.grade.id, wire.d, D, demoShop.design)))));
        if (!calc.ok || torsionMisses(req, calc.value as TorsionReport).length > 0) continue;
        const key = `${wire.grade.id}|${wire.d}`;
        brute.set(key, Math.min(brute.get(key) ?? Infinity, (calc.value as TorsionReport).wireLength));
      }
    }
    const fast = new Map(searchTorsion(r, demoShop).combinations.map((c) => [`${c.wire.grade.id}|${c.wire.d}`, c.designs[0]!.wireLength]));
    expect(brute.size).toBeGreaterThan(0);
    expect([...fast.keys()].sort()).toEqual([...brute.keys()].sort());
    for (const [key, least] of brute) expect(fast.get(key), key).toBeCloseTo(least, 6);
  }, 60_000);

  it('an arbor too large for the space names the binding limit', () => {
    const none = designFromRequirement({ ...hinge, envelope: { arbor: 15, maxOuterDiameter: 18 } }, demoShop);
    const x = none.ok ? none.value.infeasible : null;
    expect(x).not.toBeNull();
    expect(x!.binding.by).toBeGreaterThan(0);
    expect(x!.message).toContain(x!.binding.label);
  });

  it('refuses torques that fall as the spring is wound, naming the field', () => {
    const r = parseRequirement({ ...hinge, function: { ...hinge.function, torques: [{ torque: 400 }, { torque: 150 }] } });
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['function.torques[1].torque']);
  });
});
