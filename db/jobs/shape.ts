import { kindEntryOf } from '../../core/kinds/registry';
import { findGrade } from '../../core/materials';
import type { Spec } from '../../core/spec';
import { toInternal } from '../../core/units';
import type { JobShape } from '../../core/api/store';

/**
 * The indexed numbers of a job, in internal units (mm, N/mm) whatever the spec's unit system, from
 * the same analysis the engine shows, so the search compares what the shop would compare. Each kind's
 * registry entry names the length and rate it is compared on (similar-job search compares one kind only).
 * The maker's review is left out: its findings never move these numbers, and an import of many jobs
 * would pay for it on every one.
 */
export function jobShape(spec: Spec): JobShape {
  const kind = kindEntryOf(spec.kind);
  const design = kind.design(spec);
  if (design === undefined) throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
  const report = kind.analyse(design);
  const shape = kind.shape;
  const d = toInternal(spec.wireDiameter, 'length', spec.units);
  return {
    kind: spec.kind,
    material: spec.material,
    materialFamily: findGrade(spec.material)?.family ?? 'unknown',
    units: spec.units,
    wireDiameter: d,
    meanDiameter: report.meanDiameter,
    outerDiameter: report.meanDiameter + d,
    freeLength: shape.length(report),
    activeCoils: report.activeCoils,
    rate: shape.rate(report),
  };
}
