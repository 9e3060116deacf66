import { formatQuantity as q, significant } from '../../../../../core/format';
import type { ExtensionReport } from '../../../../../core/springs/extension/report';
import { symbols as s } from '../../../../../core/vocabulary';
import type { Readout, StressBar } from '../../results/readout-data';

export function extensionFigures(r: ExtensionReport): Readout[] {
  const u = r.units;
  return [
    { name: 'Rate', symbol: s.rate, value: q(r.rate, 'rate', u) },
    { name: 'Spring index', symbol: s.springIndex, value: significant(r.springIndex) },
    { name: 'Body / active coils', symbol: `${s.bodyCoils} / ${s.activeCoils}`, value: `${significant(r.bodyCoils)} / ${significant(r.activeCoils)}` },
    { name: 'Outside / inside diameter', symbol: `${s.outerDiameter} / ${s.innerDiameter}`, value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Free length inside ends', symbol: s.freeLength, value: q(r.freeLength, 'length', u) },
    { name: 'Body length', symbol: s.bodyLength, value: q(r.bodyLength, 'length', u) },
    { name: r.initialTensionProposed ? 'Initial tension (proposed)' : 'Initial tension', symbol: s.initialTension, value: q(r.initialTension, 'force', u) },
    { name: 'Largest safe force', symbol: s.maximumSafeForce, value: `${q(r.maximumSafeForce, 'force', u)} (${r.governing})` },
    { name: 'Longest safe length', symbol: s.maximumSafeLength, value: q(r.maximumSafeLength, 'length', u) },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Tensile strength', symbol: s.tensileStrength, value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

export function extensionBars(r: ExtensionReport): StressBar[] {
  const a = r.allowables;
  const bars: StressBar[] = r.loads.map((l, i) => ({ label: `τ body at ${s.length(i + 1)}`, value: l.stress, allowable: a.body, basis: 'corrected body stress' }));
  bars.push(
    { label: 'σ hook bending', value: r.hookBendingStress, allowable: a.hookBending, basis: 'at the largest load' },
    { label: 'τ hook torsion', value: r.hookTorsionStress, allowable: a.hookTorsion, basis: 'at the largest load' },
  );
  return bars;
}
