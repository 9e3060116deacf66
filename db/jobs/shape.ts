import { analyseSpec } from '../../core/calculate';
import type { SpringReport } from '../../core/calculate';
import { findGrade } from '../../core/materials';
import type { Spec } from '../../core/spec';
import { toInternal } from '../../core/units';
import type { JobShape } from '../../core/api/store';

/**
 * The length and rate each kind is compared on. Similar-job search only compares jobs of one kind, so
 * each kind may use its own: free length and N/mm for compression; free length inside the ends and N/mm
 * for extension; body length and N·mm per degree for torsion.
 */
function lengthAndRate(report: SpringReport): { length: number; rate: number } {
  switch (report.kind) {
    case 'compression': return { length: report.freeLength, rate: report.rate };
    case 'extension': return { length: report.freeLength, rate: report.rate };
    case 'torsion': return { length: report.bodyLength, rate: report.ratePerDegree };
  }
}

/**
 * The indexed numbers of a job, in internal units (mm, N/mm) whatever the spec's unit system, from
 * the same analysis the engine shows, so the search compares what the shop would compare.
 */
export function jobShape(spec: Spec): JobShape {
  const report = analyseSpec(spec);
  const d = toInternal(spec.wireDiameter, 'length', spec.units);
  const { length, rate } = lengthAndRate(report);
  return {
    kind: spec.kind,
    material: spec.material,
    materialFamily: findGrade(spec.material)?.family ?? 'unknown',
    units: spec.units,
    wireDiameter: d,
    meanDiameter: report.meanDiameter,
    outerDiameter: report.meanDiameter + d,
    freeLength: length,
    activeCoils: report.activeCoils,
    rate,
  };
}
