import type { SpringReport } from '../../../../core/calculate';
import { formatQuantity, significant } from '../../../../core/format';
import type { CompressionReport } from '../../../../core/springs/compression/report';
import type { ExtensionReport } from '../../../../core/springs/extension/report';
import type { TorsionReport } from '../../../../core/springs/torsion/report';

/** One key figure as shown: its name, the trade symbol and the formatted value. */
export interface Readout {
  name: string;
  symbol: string;
  value: string;
}

/** One stress against the allowable that applies to it. */
export interface StressBar {
  label: string;
  value: number;
  allowable: number;
  basis: string;
}

const q = formatQuantity;

function compressionFigures(r: CompressionReport): Readout[] {
  const u = r.units;
  const set = r.setRemoval;
  return [
    { name: 'Rate', symbol: 'R', value: q(r.rate, 'rate', u) },
    { name: 'Spring index', symbol: 'w', value: significant(r.springIndex) },
    { name: 'Active / total coils', symbol: 'n / Nt', value: `${significant(r.activeCoils)} / ${significant(r.totalCoils)}` },
    { name: 'Outside / inside diameter', symbol: 'OD / ID', value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Solid length / maximum', symbol: 'Ls / Lc,max', value: `${q(r.solidLength, 'length', u)} / ${q(r.solidLengthMaximum, 'length', u)}` },
    { name: 'Force at solid', symbol: 'Fs', value: q(r.solidForce, 'force', u) },
    { name: 'Minimum working length', symbol: 'Ln', value: q(r.minimumWorkingLength, 'length', u) },
    { name: 'Pitch', symbol: 'p', value: q(r.pitch, 'length', u) },
    { name: 'Coil to (set removal)', symbol: 'L0 coiled', value: !set.required ? 'not needed' : set.coiledFreeLength === null ? 'no length within limits' : `${q(set.coiledFreeLength, 'length', u)} (${set.governing === 'handbook' ? 'handbook' : 'EN 13906-1'} governs)` },
    { name: 'Buckling', symbol: 'sk', value: r.bucklingDeflection === null ? 'stable' : `at ${q(r.freeLength - r.bucklingDeflection, 'length', u)}` },
    { name: 'Natural frequency', symbol: 'fe', value: q(r.naturalFrequency, 'frequency', u) },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Energy stored at solid', symbol: 'W', value: q(r.storedEnergyAtSolid, 'energy', u) },
    { name: 'Tensile strength', symbol: 'Rm', value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

function extensionFigures(r: ExtensionReport): Readout[] {
  const u = r.units;
  return [
    { name: 'Rate', symbol: 'R', value: q(r.rate, 'rate', u) },
    { name: 'Spring index', symbol: 'w', value: significant(r.springIndex) },
    { name: 'Body / active coils', symbol: 'Nb / n', value: `${significant(r.bodyCoils)} / ${significant(r.activeCoils)}` },
    { name: 'Outside / inside diameter', symbol: 'OD / ID', value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Free length inside ends', symbol: 'L0', value: q(r.freeLength, 'length', u) },
    { name: 'Body length', symbol: 'Lk', value: q(r.bodyLength, 'length', u) },
    { name: r.initialTensionProposed ? 'Initial tension (proposed)' : 'Initial tension', symbol: 'F0', value: q(r.initialTension, 'force', u) },
    { name: 'Largest safe force', symbol: 'Fmax', value: `${q(r.maximumSafeForce, 'force', u)} (${r.governing})` },
    { name: 'Longest safe length', symbol: 'Lmax', value: q(r.maximumSafeLength, 'length', u) },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Tensile strength', symbol: 'Rm', value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

function torsionFigures(r: TorsionReport): Readout[] {
  const u = r.units;
  return [
    { name: 'Rate per degree', symbol: 'R°', value: q(r.ratePerDegree, 'torqueRatePerDegree', u) },
    { name: 'Rate per turn', symbol: 'Rt', value: q(r.ratePerTurn, 'torqueRatePerTurn', u) },
    { name: 'Spring index', symbol: 'w', value: significant(r.springIndex) },
    { name: 'Body / active coils', symbol: 'Nb / n', value: `${significant(r.bodyCoils)} / ${significant(r.activeCoils)}` },
    { name: 'Outside / inside diameter', symbol: 'OD / ID', value: `${q(r.outerDiameter, 'length', u)} / ${q(r.innerDiameter, 'length', u)}` },
    { name: 'Inside diameter at full load', symbol: 'ID at α max', value: q(r.insideDiameterAtLoad, 'length', u) },
    { name: 'Arbor clearance', symbol: 'c', value: r.arborClearance === null ? 'no arbor given' : q(r.arborClearance, 'length', u) },
    { name: 'Body length at full load', symbol: 'Lk', value: q(r.bodyLengthAtLoad, 'length', u) },
    { name: 'Largest safe deflection', symbol: 'α max', value: `${significant(r.maximumSafeAngle)}°` },
    { name: 'Wire length / mass', symbol: 'l / m', value: `${q(r.wireLength, 'length', u)} / ${q(r.mass, 'mass', u)}` },
    { name: 'Tensile strength', symbol: 'Rm', value: `${q(r.tensileStrength, 'stress', u)} (${r.tensileStrengthBasis})` },
  ];
}

export function readouts(r: SpringReport): Readout[] {
  return r.kind === 'compression' ? compressionFigures(r) : r.kind === 'extension' ? extensionFigures(r) : torsionFigures(r);
}

function compressionBars(r: CompressionReport): StressBar[] {
  const s = r.setRemoval;
  const toSolid = r.freeLength - r.solidLength;
  const working = s.required ? s.allowableAfter : s.allowableBefore;
  const name = (m: 'handbook' | 'en13906') => (m === 'handbook' ? 'handbook, Ks stress' : 'EN 13906-1, uncorrected stress');
  const basis = `${name(s.governing)}, against the allowable ${s.required ? 'after' : 'before'} set removal`;
  const bars: StressBar[] = r.loads.map((l, i) => ({
    label: `τ at L${i + 1}`, value: toSolid > 0 ? (l.deflection / toSolid) * s.stressAtSolid : 0, allowable: working, basis,
  }));
  for (const v of [s.methods.handbook, s.methods.en13906]) {
    bars.push({ label: `τ at solid (${name(v.method)})`, value: v.stressAtSolid, allowable: v.required ? v.allowableAfter : v.allowableBefore,
      basis: `${v.required ? 'after' : 'before'} set removal${v.method === s.governing ? ', governs' : ''}` });
  }
  if (r.fatigue) bars.push({ label: 'τ max in cycle', value: r.fatigue.stressMax, allowable: r.allowableStress, basis: 'corrected, against the static allowable' });
  return bars;
}

function extensionBars(r: ExtensionReport): StressBar[] {
  const a = r.allowables;
  const bars: StressBar[] = r.loads.map((l, i) => ({ label: `τ body at L${i + 1}`, value: l.stress, allowable: a.body, basis: 'corrected body stress' }));
  bars.push(
    { label: 'σ hook bending', value: r.hookBendingStress, allowable: a.hookBending, basis: 'at the largest load' },
    { label: 'τ hook torsion', value: r.hookTorsionStress, allowable: a.hookTorsion, basis: 'at the largest load' },
  );
  return bars;
}

function torsionBars(r: TorsionReport): StressBar[] {
  const bars: StressBar[] = r.loads.map((l, i) => ({ label: `σ at α${i + 1}`, value: l.stress, allowable: r.allowableStress, basis: 'corrected bending stress' }));
  if (r.fatigue) bars.push({ label: 'σ max in cycle', value: r.fatigue.stressMax, allowable: r.fatigue.limit, basis: `repeated-bending limit for ${significant(r.fatigue.cycles)} cycles` });
  return bars;
}

/** Stresses against the allowables that apply (after set removal when it is done). */
export function stressBars(r: SpringReport): StressBar[] {
  return r.kind === 'compression' ? compressionBars(r) : r.kind === 'extension' ? extensionBars(r) : torsionBars(r);
}

/** Rows of the load table: the point, the calculated load, what the drawing asks, and whether it is met. */
export function loadRows(r: SpringReport): { point: string; at: string; load: string; asked: string; within: boolean | null }[] {
  const u = r.units;
  const asked = (v: number | null, t: number | null, quantity: 'force' | 'torque') => (v === null ? '—' : `${q(v, quantity, u)} ±${t ?? 10} %`);
  if (r.kind === 'torsion') {
    return r.loads.map((l, i) => ({ point: `α${i + 1}`, at: `${significant(l.angle)}°`, load: q(l.torque, 'torque', u), asked: asked(l.specifiedTorque, l.tolerancePercent, 'torque'), within: l.withinTolerance }));
  }
  return r.loads.map((l, i) => ({ point: `L${i + 1}`, at: q(l.length, 'length', u), load: q(l.force, 'force', u), asked: asked(l.specifiedForce, l.tolerancePercent, 'force'), within: l.withinTolerance }));
}
