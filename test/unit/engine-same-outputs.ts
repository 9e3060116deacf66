/**
 * The engine's quicker paths give exactly what the plain paths give, checked on thousands of generated specs
 * of every kind (test/support/random-springs.ts; demo data): the compiled spec schema accepts only what zod
 * accepts and gives zod's data (values, defaults, key order); `calculate` converts its own fresh report out in
 * place, where `reportInSpecUnits` converts a copy; the bounds check walks a compiled map, where the plain
 * walk below (the earlier implementation, kept here as the reference) follows the map object by object.
 * No published value is involved: both sides run the same formulas; only the bookkeeping differs.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSpec, calculate, reportInSpecUnits } from '../../core/calculate';
import { boundsIssues, kindBounds, outsideMessage, parseSpec, specBounds, specSchema, withinBound } from '../../core/spec';
import { compileSchema, REFUSED } from '../../core/spec/compiled-schema';
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

/** Small damage of every kind a typed or imported spec shows: wrong types, unknown keys, gaps, bad members. */
const damaged = fc.tuple(validSpecInput, fc.nat(), fc.constantFrom<unknown>(undefined, null, 'x', -1, 0, 1e300, Number.NaN, [], {}, true, 2.5))
  .map(([raw, at, value]) => {
    const spec = structuredClone(raw) as Record<string, unknown>;
    const keys = [...Object.keys(spec), 'extra'];
    const key = keys[at % keys.length]!;
    const inner = spec[key];
    if (Array.isArray(inner) && inner.length > 0 && at % 3 === 0) inner[0] = value;
    else if (inner !== null && typeof inner === 'object' && at % 3 === 1) (inner as Record<string, unknown>)[at % 2 ? 'type' : 'stray'] = value;
    else if (value === undefined) delete spec[key];
    else spec[key] = value;
    return spec;
  });

/** The checks, run once with the generated functions and once with the generic walks (where code cannot be compiled). */
export const sameOutputs = (label: string): unknown => describe(`the quicker engine paths give the same outputs (${label})`, () => {
  const accepted = compileSchema(specSchema);

  it('the compiled schema gives zod\'s own data for every spec zod accepts', () => {
    fc.assert(fc.property(validSpecInput, (raw) => {
      const zod = specSchema.safeParse(raw);
      const compiled = accepted(raw);
      expect(zod.success).toBe(true);
      expect(compiled).not.toBe(REFUSED);
      if (zod.success) {
        expect(compiled).toStrictEqual(zod.data);
        expect(Object.keys(compiled as object)).toEqual(Object.keys(zod.data));
      }
    }), { numRuns: 2000, seed: 20261203 });
  });

  it('the compiled schema accepts nothing zod refuses, and leaves the errors to zod', () => {
    let refused = 0;
    fc.assert(fc.property(damaged, (raw) => {
      const zod = specSchema.safeParse(raw);
      const compiled = accepted(raw);
      if (!zod.success) {
        refused++;
        expect(compiled).toBe(REFUSED);
      } else if (compiled !== REFUSED) expect(exactly(compiled)).toBe(exactly(zod.data));
    }), { numRuns: 3000, seed: 20261206 });
    expect(refused).toBeGreaterThan(1000);
  });

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
