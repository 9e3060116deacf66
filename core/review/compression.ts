import type { Finding } from '../result';
import { formatQuantity, significant } from '../format';
import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import type { FreeParameter } from '../spec/compression';
import { endForms } from '../springs/compression/ends';
import { SURGE_MARGIN } from '../springs/compression/surge';
import { reviewLimits as lim } from './limits';
import { add, reviewIndex, reviewServiceTemperature } from './common';
import type { Sink } from './common';

function reviewSolidStress(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const s = r.setRemoval;
  const u = x.units;
  if (!s.achievable) {
    add(out, 'error', 'solid-stress-over-set-removed-allowable', 'freeLength',
      `uncorrected stress at solid ${formatQuantity(r.stressAtSolidUncorrected, 'stress', u)} exceeds the allowable ` +
      `after set removal ${formatQuantity(r.allowableStressSetRemoved, 'stress', u)}: the spring would take a set in use`,
      'shorten the free length, add coils, use heavier wire or a stronger grade, or add a stop before solid');
    return;
  }
  if (!s.required) return;
  if (s.coiledFreeLength === null) {
    add(out, 'warning', 'set-beyond-model', 'freeLength',
      'the set needed is beyond what the set-removal model can predict; establish the coiled free length by trials',
      'coil trial pieces long and press them to solid');
    return;
  }
  add(out, 'note', 'set-removal-required', 'freeLength',
    `corrected stress at solid ${formatQuantity(r.stressAtSolid, 'stress', u)} is over the allowable ` +
    `${formatQuantity(r.allowableStress, 'stress', u)}: coil to ${formatQuantity(s.coiledFreeLength, 'length', u)} ` +
    `and press to solid (expected set ${formatQuantity(s.expectedSet ?? 0, 'length', u)})`);
  if ((s.setFraction ?? 0) < lim.minimumSetFraction) {
    add(out, 'warning', 'set-too-small', 'freeLength',
      `the expected set is ${significant(100 * (s.setFraction ?? 0), 2)} % of the deflection to solid, under ` +
      `${100 * lim.minimumSetFraction} %: the free length will be hard to hold`,
      'accept the stress without set removal, or design for a larger set');
  }
  if (s.ratio > lim.maximumSetRatio) {
    add(out, 'warning', 'set-ratio-high', 'freeLength',
      `stress ratio at solid ${significant(s.ratio)} is over ${lim.maximumSetRatio}: set removal distorts the spring and adds little`,
      'reduce the stress at solid');
  }
}

function workingPoints(x: CompressionDesign): { length: number; path: string }[] {
  const points = x.loads.map((l, i) => ({ length: l.length, path: `loads[${i}].length` }));
  if (x.duty.type === 'cyclic') {
    x.duty.between.forEach((length, i) => points.push({ length, path: `duty.between[${i}]` }));
  }
  return points;
}

function reviewWorkingLengths(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const u = x.units;
  const points = workingPoints(x);
  if (points.length === 0) return;
  let deepest = points[0]!;
  for (const p of points) if (p.length < deepest.length) deepest = p;
  if (deepest.length <= r.solidLength) {
    add(out, 'error', 'working-length-below-solid', deepest.path,
      `working length ${formatQuantity(deepest.length, 'length', u)} is at or below the solid length ${formatQuantity(r.solidLength, 'length', u)}`,
      'lengthen the working length, or use finer wire or fewer coils');
  } else if (deepest.length < r.minimumWorkingLength) {
    add(out, 'warning', 'coil-clearance', deepest.path,
      `working length ${formatQuantity(deepest.length, 'length', u)} is below the minimum ${formatQuantity(r.minimumWorkingLength, 'length', u)} ` +
      '(solid length plus the EN 13906-1 minimum coil gaps): coils may touch in service',
      'lengthen the working length or reduce the solid length');
  }
  const deflection = r.freeLength - deepest.length;
  if (r.bucklingDeflection !== null && deflection >= r.bucklingDeflection) {
    add(out, 'warning', 'buckling', 'seating',
      `buckles at ${formatQuantity(r.freeLength - r.bucklingDeflection, 'length', u)} for ${x.seating} seating ` +
      `(L0/D ${significant(r.slenderness)} over the limit ${significant(r.slendernessLimit)}), before the working length`,
      'guide the spring on a rod or in a bore, seat both ends on parallel plates, or raise the coil diameter');
  }
  const stressed = (deflection / (r.freeLength - r.solidLength)) * (r.setRemoval.required ? r.stressAtSolidUncorrected : r.stressAtSolid);
  const allowable = r.setRemoval.required ? r.allowableStressSetRemoved : r.allowableStress;
  if (stressed > allowable && r.setRemoval.achievable) {
    add(out, 'error', 'working-stress-over-allowable', deepest.path,
      `stress at the working length ${formatQuantity(stressed, 'stress', u)} is over the allowable ${formatQuantity(allowable, 'stress', u)}`,
      'use heavier wire, more coils or a stronger grade');
  }
}

function reviewLoads(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const u = x.units;
  r.loads.forEach((l, i) => {
    if (l.withinTolerance !== false || l.specifiedForce === null) return;
    const freeLengthForForce = l.length + l.specifiedForce / r.rate;
    add(out, 'error', 'load-outside-tolerance', `loads[${i}].force`,
      `force at ${formatQuantity(l.length, 'length', u)} is ${formatQuantity(l.force, 'force', u)}; the drawing asks ` +
      `${formatQuantity(l.specifiedForce, 'force', u)} ±${l.tolerancePercent} %`,
      `a free length of ${formatQuantity(freeLengthForForce, 'length', u)} gives the force with these coils, or change the coil count`);
  });
}

const freeParameterWords: Record<FreeParameter, string> = {
  wireDiameter: 'wire diameter', diameter: 'coil diameter', coils: 'coils', freeLength: 'free length',
};

function reviewDetermination(x: CompressionDesign, out: Sink): void {
  const forced = x.loads.map((l, i) => ({ l, i })).filter((e) => e.l.force !== undefined);
  if (forced.length === 0) return;
  const free = new Set(x.freeParameters);
  // EN 15800 (from memory): one force with L0 fixed frees n and d; two forces free L0, n and d.
  const needed: FreeParameter[] = forced.length >= 2 ? ['freeLength', 'coils', 'wireDiameter']
    : free.has('freeLength') ? ['freeLength'] : ['coils', 'wireDiameter'];
  const missing = needed.filter((p) => !free.has(p));
  if (missing.length === 0) return;
  add(out, 'warning', 'over-determined', `loads[${forced[0]!.i}].force`,
    `the drawing fixes wire, coil diameter, coils and free length and ${forced.length === 1 ? 'a toleranced force' : 'two toleranced forces'}: over-determined`,
    `per EN 15800 let the maker adjust the ${missing.map((m) => freeParameterWords[m]).join(' and ')} (free parameters), or accept a wider load tolerance`);
}

function reviewManufacture(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  if (endForms[x.ends].ground && x.d < lim.minimumGroundWire) {
    add(out, 'warning', 'grinding-fine-wire', 'ends',
      `wire under ${lim.minimumGroundWire} mm is normally not ground`, 'specify closed ends, not ground');
  }
  if (r.activeCoils < lim.minimumActiveCoils) {
    add(out, 'note', 'few-active-coils', x.coilsGiven === 'active' ? 'activeCoils' : 'totalCoils',
      `${significant(r.activeCoils)} active coils: rate and load scatter more with fewer than ${lim.minimumActiveCoils}`);
  }
}

function reviewScope(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const s = lim.en15800;
  const outside: string[] = [];
  if (x.d < s.d.min || x.d > s.d.max) outside.push('wire diameter');
  if (x.D < s.D.min || x.D > s.D.max) outside.push('mean diameter');
  if (x.L0 > s.L0Max) outside.push('free length');
  if (x.na < s.nMin) outside.push('active coils');
  if (r.springIndex < s.w.min || r.springIndex > s.w.max) outside.push('spring index');
  if (outside.length === 0) return;
  add(out, 'note', 'outside-en15800-scope', '',
    `outside the scope of EN 15800 (${outside.join(', ')}): tolerances by agreement with the customer`);
}

function reviewService(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  reviewServiceTemperature(x, out);
  if (x.duty.type !== 'cyclic') return;
  if (!x.wire.dynamicGrade) {
    add(out, 'warning', 'grade-not-for-cyclic-duty', 'material',
      `${x.wire.gradeName} is not a grade for cyclic duty`, 'choose a dynamic grade (e.g. EN 10270-1 DH, music wire, VDSiCr)');
  }
  if (x.duty.frequency !== undefined && r.naturalFrequency < SURGE_MARGIN * x.duty.frequency) {
    add(out, 'warning', 'surge', 'duty.frequency',
      `natural frequency ${significant(r.naturalFrequency)} Hz is under ${SURGE_MARGIN}× the operating ${significant(x.duty.frequency)} Hz: surge raises stresses`,
      'raise the natural frequency: heavier wire, smaller coil diameter, fewer coils');
  }
  const f = r.fatigue;
  if (f && f.verdict !== 'pass') {
    add(out, f.verdict === 'fail' ? 'error' : 'warning', `fatigue-${f.verdict}`, 'duty',
      `infinite-life check ${f.verdict}: Goodman safety factor ${significant(f.goodmanSafetyFactor)}, ` +
      `Gerber ${significant(f.gerberSafetyFactor)} (Zimmerli data, ${f.peened ? 'peened' : 'not peened'})`,
      f.peened ? 'reduce the stroke stress: more coils or a larger coil diameter' : 'shot peen, or reduce the stroke stress');
  }
}

/** The maker's review of a compression spring: every finding names the field it concerns. */
export function reviewCompression(x: CompressionDesign, r: CompressionReport): Finding[] {
  const out: Finding[] = [...x.wireFindings];
  reviewIndex(x, r.springIndex, out);
  reviewSolidStress(x, r, out);
  reviewWorkingLengths(x, r, out);
  reviewLoads(x, r, out);
  reviewDetermination(x, out);
  reviewManufacture(x, r, out);
  reviewScope(x, r, out);
  reviewService(x, r, out);
  return out;
}
