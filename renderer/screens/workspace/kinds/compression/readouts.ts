import { formatQuantity as q, significant } from '../../../../../core/format';
import type { CompressionReport } from '../../../../../core/springs/compression/report';
import { symbols as s } from '../../../../../core/vocabulary';
import type { ExtensionReport } from '../../../../../core/springs/extension/report';
import type { LoadRow, Readout, StressBar } from '../../results/readout-data';
import { askedText } from '../../results/asked';

export function compressionFigures(r: CompressionReport): Readout[] {
  const u = r.units;
  const set = r.setRemoval;
  return [
    { name: 'Rate', symbol: s.rate, value: q(r.rate, 'rate', u) },
    { name: 'Spring index', symbol: s.springIndex, value: significant(r.springIndex) },
    { name: 'Active / total coils', symbol: `${s.activeCoils} / ${s.totalCoils}`, value: `${significant(r.activeCoils)} / ${significant(r.totalCoils)}` },
    { name: 'Outside / inside diameter', symbol: `${s.outerDiameter} / ${s.innerDiameter}`, value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Solid length / maximum', symbol: `${s.solidLength} / Lc,max`, value: `${q(r.solidLength, 'length', u)} / ${q(r.solidLengthMaximum, 'length', u)}` },
    { name: 'Force at solid', symbol: s.solidForce, value: q(r.solidForce, 'force', u) },
    { name: 'Minimum working length', symbol: s.minimumWorkingLength, value: q(r.minimumWorkingLength, 'length', u) },
    { name: 'Pitch', symbol: s.pitch, value: q(r.pitch, 'length', u) },
    { name: 'Coil to (set removal)', symbol: `${s.freeLength} coiled`, value: !set.required ? 'not needed' : set.coiledFreeLength === null ? 'no length within limits' : `${q(set.coiledFreeLength, 'length', u)} (${set.governing === 'handbook' ? 'handbook' : 'EN 13906-1'} governs)` },
    { name: 'Buckling', symbol: s.bucklingDeflection, value: r.bucklingDeflection === null ? 'stable' : `at ${q(r.freeLength - r.bucklingDeflection, 'length', u)}` },
    { name: 'Natural frequency', symbol: s.naturalFrequency, value: q(r.naturalFrequency, 'frequency', u) },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Energy stored at solid', symbol: s.storedEnergy, value: q(r.storedEnergyAtSolid, 'energy', u) },
    { name: 'Tensile strength', symbol: s.tensileStrength, value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

export function compressionBars(r: CompressionReport): StressBar[] {
  const set = r.setRemoval;
  const toSolid = r.freeLength - r.solidLength;
  const working = set.required ? set.allowableAfter : set.allowableBefore;
  const name = (m: 'handbook' | 'en13906') => (m === 'handbook' ? 'handbook, Ks stress' : 'EN 13906-1, uncorrected stress');
  const basis = `${name(set.governing)}, against the allowable ${set.required ? 'after' : 'before'} set removal`;
  const bars: StressBar[] = r.loads.map((l, i) => ({
    label: `τ at ${s.length(i + 1)}`, value: toSolid > 0 ? (l.deflection / toSolid) * set.stressAtSolid : 0, allowable: working, basis,
  }));
  for (const v of [set.methods.handbook, set.methods.en13906]) {
    bars.push({ label: `τ at solid (${name(v.method)})`, value: v.stressAtSolid, allowable: v.required ? v.allowableAfter : v.allowableBefore,
      basis: `${v.required ? 'after' : 'before'} set removal${v.method === set.governing ? ', governs' : ''}` });
  }
  if (r.fatigue) bars.push({ label: 'τ max in cycle', value: r.fatigue.stressMax, allowable: r.allowableStress, basis: 'corrected, against the static allowable' });
  return bars;
}

/** Rows of the load table for springs loaded along their axis: length, force, what the drawing asks. */
export function axialLoadRows(r: CompressionReport | ExtensionReport): LoadRow[] {
  return r.loads.map((l, i) => ({
    point: s.length(i + 1), at: q(l.length, 'length', r.units), load: q(l.force, 'force', r.units),
    asked: askedText(l.specifiedForce, l.tolerancePercent, 'force', r.units), within: l.withinTolerance,
  }));
}
