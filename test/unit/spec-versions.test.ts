import { describe, expect, it } from 'vitest';
import type { SpecUpgrade } from '../../core/spec';
import { SPEC_VERSION, parseSpec, specUpgrades, upgradeSpec } from '../../core/spec';

const stored = { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50 };

describe('spec versions and their declared upgrade steps', () => {
  it('the current version follows from the table, and a spec without a version is the first', () => {
    expect(SPEC_VERSION).toBe(specUpgrades.length + 1);
    const same = upgradeSpec(stored);
    expect(same.ok && same.value).toBe(stored);
    expect(parseSpec(stored).ok).toBe(true);
    expect(parseSpec({ ...stored, version: SPEC_VERSION }).ok).toBe(true);
  });

  it('runs every step from the spec\'s version up, in order, and stamps each version it reaches', () => {
    const seen: number[] = [];
    // Two steps as a later release might declare them: a renamed field, then a unit that moved into the value.
    const steps: SpecUpgrade[] = [
      (s) => { seen.push(Number(s.version ?? 1)); const { coilCount, ...rest } = s; return { ...rest, totalCoils: coilCount }; },
      (s) => { seen.push(Number(s.version)); return { ...s, wireDiameter: Number(s.wireDiameter) / 1000 }; },
    ];
    const { totalCoils, ...v1 } = { ...stored, coilCount: 10, wireDiameter: 2000 };
    void totalCoils;
    const upgraded = upgradeSpec(v1, steps);
    expect(upgraded).toEqual({ ok: true, value: { ...stored, version: 3 } });
    expect(seen).toEqual([1, 2]);
    const fromTwo = upgradeSpec({ ...stored, version: 2, wireDiameter: 2000 }, steps);
    expect(fromTwo.ok && fromTwo.value.wireDiameter).toBe(2);
  });

  it('a spec from a newer version, or with a version that is not a whole number, is refused on the version field', () => {
    const newer = parseSpec({ ...stored, version: SPEC_VERSION + 1 });
    expect(newer.ok ? null : newer.errors[0]).toMatchObject({ code: 'spec-too-new', path: 'version' });
    for (const version of [0, 1.5, '1', null]) {
      const bad = parseSpec({ ...stored, version });
      expect(bad.ok ? null : bad.errors[0]).toMatchObject({ code: 'invalid-version', path: 'version' });
    }
  });
});
