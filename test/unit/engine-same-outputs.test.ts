/**
 * The engine's quicker paths give exactly what the plain paths give, checked on thousands of generated specs
 * of every kind (test/support/random-springs.ts; demo data): `calculate` converts its own fresh report out in
 * place, where `reportInSpecUnits` converts a copy; the bounds check walks a compiled map, where the plain
 * walk below (the earlier implementation, kept here as the reference) follows the map object by object.
 * No published value is involved: both sides run the same formulas; only the bookkeeping differs.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSpec, calculate, reportInSpecUnits } from '../../core/calculate';
import { boundsIssues, kindBounds, outsideMessage, parseSpec, specBounds, withinBound } from '../../core/spec';
import type { Bound, BoundName, BoundsMap } from '../../core/spec';
import type { UnitSystem } from '../../core/units';
import { validSpecInput } from '../support/random-springs';

/** JSON with NaN and ±∞ spelled out, so a number that differs in any way shows. */
const exactly = (value: unknown): string =>
  JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? `number:${v}` : Object.is(v, -0) ? 'number:-0' : v));

type Issue = { path: PropertyKey[]; message: string };

function plainWalk(value: unknown, map: BoundName | BoundsMap, path: PropertyKey[], units: UnitSystem, out: Issue[]): void {
  if (value === null || value === undefined) return;
  if (Array.isArray(value)) {
    value.forEach((item, i) => plainWalk(item, map, [...path, i], units, out));
    return;
  }
  if (typeof map === 'string') {
    const b: Bound = specBounds[map];
    if (typeof value === 'number' && !withinBound(value, b, units)) out.push({ path, message: outsideMessage(b, units) });
    return;
  }
  if (typeof value !== 'object') return;
  for (const [key, inner] of Object.entries(value as Record<string, unknown>)) {
    const sub = map[key];
    if (sub !== undefined) plainWalk(inner, sub, [...path, key], units, out);
  }
}

/** A generated spec with some of its numbers pushed far out of their plausible range. */
const strayed = fc.tuple(validSpecInput, fc.array(fc.tuple(fc.nat(), fc.constantFrom(1e-9, 1e9, -5, 0)), { maxLength: 4 }))
  .map(([raw, pushes]) => {
    const spec = structuredClone(raw) as Record<string, unknown>;
    const numeric = Object.keys(spec).filter((k) => typeof spec[k] === 'number');
    for (const [at, value] of pushes) if (numeric.length > 0) spec[numeric[at % numeric.length]!] = value;
    return spec;
  });

describe('the quicker engine paths give the same outputs', () => {
  it('calculate gives, number for number and key for key, the report reportInSpecUnits makes of a copy', () => {
    fc.assert(fc.property(validSpecInput, (raw) => {
      const parsed = parseSpec(structuredClone(raw));
      if (!parsed.ok) throw new Error('generated specs are valid');
      const viaCopy = reportInSpecUnits(analyseSpec(parsed.value));
      const result = calculate(structuredClone(raw));
      expect(result.ok).toBe(true);
      if (result.ok) expect(exactly(result.value)).toBe(exactly(viaCopy));
    }), { numRuns: 2000, seed: 20261204 });
  });

  it('the compiled bounds walk finds the same issues, in the same order, as the plain walk', () => {
    fc.assert(fc.property(strayed, (spec) => {
      const kind = spec.kind as keyof typeof kindBounds;
      const units = spec.units as UnitSystem;
      const expected: Issue[] = [];
      plainWalk(spec, kindBounds[kind], [], units, expected);
      expect(boundsIssues({ ...spec, units }, kindBounds[kind])).toEqual(expected);
    }), { numRuns: 2000, seed: 20261205 });
  });

  it('a report is converted only once when it comes out of calculate (inch, every kind)', () => {
    const specs = fc.sample(validSpecInput.filter((r) => (r as { units: string }).units === 'inch'), { numRuns: 60, seed: 7 });
    const kinds = new Set(specs.map((s) => (s as { kind: string }).kind));
    expect([...kinds].sort()).toEqual(['compression', 'extension', 'torsion']);
    for (const raw of specs) {
      const result = calculate(raw);
      const parsed = parseSpec(raw);
      if (!result.ok || !parsed.ok) throw new Error('generated specs are valid');
      // A nested object reached twice by the quantity map would be converted twice and differ here.
      expect(result.value.wireDiameter).toBeCloseTo((raw as { wireDiameter: number }).wireDiameter, 12);
      expect(exactly(result.value)).toBe(exactly(reportInSpecUnits(analyseSpec(parsed.value))));
    }
  });
});
