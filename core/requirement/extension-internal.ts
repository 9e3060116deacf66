import type { UnitSystem } from '../units';
import { toInternal } from '../units';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../springs/specified';
import type { GradeFamily } from '../materials/types';
import type { ExtensionLoop, ExtensionRequirement } from './extension';
import type { WireSizeSource } from './schema';

/** An extension requirement in internal units (mm, N, N/mm, °C); loads shortest length first. */
export interface ExtensionRequirementInternal {
  kind: 'extension';
  units: UnitSystem;
  envelope: { bore?: number; maxOuterDiameter?: number; maxFreeLength?: number };
  loads: { length: number; force: number; tolerancePercent: number; path: string }[];
  rate: number;
  initialTension: { min: number; max: number };
  duty: ExtensionRequirement['duty'];
  serviceTemperature?: { min: number; max: number };
  grades?: string[];
  families?: GradeFamily[];
  ends: ExtensionLoop[];
  wireSizes: WireSizeSource;
}

export function extensionRequirementInternal(r: ExtensionRequirement): ExtensionRequirementInternal {
  const mm = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'length', r.units));
  const N = (v: number) => toInternal(v, 'force', r.units);
  const loads = r.function.loads
    .map((l, i) => ({ length: mm(l.length)!, force: N(l.force), tolerancePercent: l.tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT, path: `function.loads[${i}]` }))
    .sort((a, b) => a.length - b.length);
  const t = r.serviceTemperature;
  return {
    kind: 'extension', units: r.units,
    envelope: { bore: mm(r.envelope.bore), maxOuterDiameter: mm(r.envelope.maxOuterDiameter), maxFreeLength: mm(r.envelope.maxFreeLength) },
    loads,
    rate: (loads[1]!.force - loads[0]!.force) / (loads[1]!.length - loads[0]!.length),
    initialTension: { min: r.initialTension?.min === undefined ? 0 : N(r.initialTension.min), max: r.initialTension?.max === undefined ? Infinity : N(r.initialTension.max) },
    duty: r.duty.type === 'static' ? r.duty : { ...r.duty, between: [mm(r.duty.between[0])!, mm(r.duty.between[1])!] },
    serviceTemperature: t && { min: toInternal(t.min, 'temperature', r.units), max: toInternal(t.max, 'temperature', r.units) },
    grades: r.choices.grades, families: r.choices.families, ends: r.choices.ends, wireSizes: r.choices.wireSizes,
  };
}
