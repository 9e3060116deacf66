import type { Finding } from '../result';
import { formatQuantity, significant } from '../format';
import type { CompressionDesign } from '../springs/compression/design';
import type { CompressionReport } from '../springs/compression/report';
import type { FreeParameter } from '../spec/compression';
import { endForms } from '../springs/compression/ends';
import { SURGE_MARGIN } from '../springs/compression/surge';
import { reviewLimits as lim } from './limits';
import { freeLengthTolerance } from '../tolerances';
import type { UnitSystem } from '../units';
import type { SetRemovalResult, SetRemovalVerdict } from '../springs/compression/report';
import { coiledLimits } from '../springs/compression/set-removal';
import type { CoiledBound, SetRemovalMethod } from '../springs/compression/set-removal';
import { add, fatigueFix, fatigueWords, NO_FATIGUE_DATA_FIX, noFatigueData, reviewIndex, reviewServiceTemperature } from './common';
import { hasSteelFatigueData } from '../springs/fatigue';
import type { Sink } from './common';
import type { Settings } from '../settings/schema';
import type { ShopToleranceTable } from '../tolerances/shop-tables';
import { shopTablesOf } from '../tolerances/shop-settings';

const methodNames: Record<SetRemovalMethod, string> = { handbook: 'handbook method', en13906: 'EN 13906-1 static method' };

function methodLine(v: SetRemovalVerdict, u: UnitSystem): string {
  const state = !v.achievable ? 'over the limit after set removal' : v.required ? 'set removal required' : 'no set removal needed';
  return `${methodNames[v.method]}: ${formatQuantity(v.stressAtSolid, 'stress', u)} at solid against ` +
    `${formatQuantity(v.allowableBefore, 'stress', u)} before / ${formatQuantity(v.allowableAfter, 'stress', u)} after set removal, ${state}`;
}

function governingWords(s: SetRemovalResult): string {
  return s.governedBy === 'stricter' ? `the stricter, ${methodNames[s.governing]}, governs` : `the shop's setting: ${methodNames[s.governing]} governs`;
}

const boundWords: Record<CoiledBound, { message: string; fix: string }> = {
  'beyond-fully-plastic': {
    message: 'no coiled length reaches the free length: the stress at solid is beyond what a fully plastic wire carries',
    fix: 'shorten the free length, add coils, use heavier wire or a stronger grade, or add a stop before solid',
  },
  'set-over-deflection': {
    message: `the set needed is more than the spring's own deflection to solid (limit: set ≤ ${coiledLimits.maximumSetPerFinishedDeflection} × deflection to solid)`,
    fix: 'reduce the stress at solid: a shorter free length, more coils or heavier wire',
  },
  'pitch-over-coiler': {
    message: `the coiled pitch would be over ${coiledLimits.maximumPitchPerMeanDiameter} × the mean diameter, more than a coiler's pitch tool makes`,
    fix: 'reduce the stress at solid (more coils, heavier wire), or establish the coiled length by trials on a coiler that can make the pitch',
  },
};

/**
 * The set the first-off can tell from the coiling scatter: at least the free-length tolerance (common trade
 * practice). Null when the shop's table gives no tolerance for the spring. The design search screens with it too.
 */
export function setControlTolerance(
  s: { freeLength: number; toleranceGrade: 1 | 2 | 3 | undefined; springIndex: number; activeCoils: number },
  table?: ShopToleranceTable,
): { plusMinus: number; source: string } | null {
  const t = freeLengthTolerance({
    L0: s.freeLength, grade: s.toleranceGrade ?? 2, index: s.springIndex, activeCoils: s.activeCoils, loadSpecified: false,
  }, table);
  return t.ok && !t.value.reference ? { plusMinus: t.value.plusMinus, source: t.source } : null;
}

function reviewSetSize(x: CompressionDesign, r: CompressionReport, out: Sink, settings: Settings | undefined): void {
  const s = r.setRemoval;
  const u = x.units;
  const tolerance = setControlTolerance({
    freeLength: r.freeLength, toleranceGrade: x.toleranceGrade, springIndex: r.springIndex, activeCoils: r.activeCoils,
  }, settings && shopTablesOf(settings.toleranceTables).freeLength);
  if (tolerance && (s.expectedSet ?? 0) < tolerance.plusMinus) {
    add(out, 'warning', 'set-below-length-tolerance', 'freeLength',
      `the expected set ${formatQuantity(s.expectedSet ?? 0, 'length', u)} is under the free-length tolerance ` +
      `±${formatQuantity(tolerance.plusMinus, 'length', u)} (${tolerance.source}): the first pieces cannot show whether the ` +
      'set was taken, so the free length is not controlled by the press (common trade practice)',
      'lower the stress at solid so no set removal is needed, or raise it for a set the first-off can measure');
  }
}

function reviewSolidStress(x: CompressionDesign, r: CompressionReport, out: Sink, settings: Settings | undefined): void {
  const s = r.setRemoval;
  const u = x.units;
  if (!s.achievable) {
    add(out, 'error', 'solid-stress-over-set-removed-allowable', 'freeLength',
      `stress at solid ${formatQuantity(s.stressAtSolid, 'stress', u)} is over the allowable after set removal ` +
      `${formatQuantity(s.allowableAfter, 'stress', u)} (${methodNames[s.governing]}; ${governingWords(s)}): the spring would take a set in use`,
      'shorten the free length, add coils, use heavier wire or a stronger grade, or add a stop before solid');
    return;
  }
  if (!s.required) return;
  const both = `${methodLine(s.methods.handbook, u)}; ${methodLine(s.methods.en13906, u)}; ${governingWords(s)}`;
  if (s.bound !== null) {
    add(out, 'error', 'coiled-length-out-of-bounds', 'freeLength', `${boundWords[s.bound].message} (${both})`, boundWords[s.bound].fix);
  } else {
    add(out, 'note', 'set-removal-required', 'freeLength',
      `coil to ${formatQuantity(s.coiledFreeLength ?? r.freeLength, 'length', u)} and press to solid ` +
      `(expected set ${formatQuantity(s.expectedSet ?? 0, 'length', u)}): ${both}`);
    reviewSetSize(x, r, out, settings);
  }
  if (s.ratio > lim.maximumSetRatio) {
    add(out, 'warning', 'set-ratio-high', 'freeLength',
      `stress ratio at solid ${significant(s.ratio)} is over ${lim.maximumSetRatio}: set removal distorts the spring and adds little (SMI, reprinted by spring makers)`,
      'reduce the stress at solid: a shorter free length, more coils or heavier wire');
  }
}

/** The shortest working length the drawing names (a load's or a cyclic duty's), with its field path. */
function deepestWorkingPoint(x: CompressionDesign): { length: number; path: string } | undefined {
  let length = Number.POSITIVE_INFINITY;
  let at = -1;
  for (let i = 0; i < x.loads.length; i++) {
    if (x.loads[i]!.length < length) { length = x.loads[i]!.length; at = i; }
  }
  let inDuty = false;
  if (x.duty.type === 'cyclic') {
    for (let i = 0; i < 2; i++) {
      if (x.duty.between[i]! < length) { length = x.duty.between[i]!; at = i; inDuty = true; }
    }
  }
  if (at < 0) return undefined;
  return { length, path: inDuty ? `duty.between[${at}]` : `loads[${at}].length` };
}

function reviewWorkingLengths(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const u = x.units;
  const deepest = deepestWorkingPoint(x);
  if (deepest === undefined) return;
  if (deepest.length <= r.solidLength) {
    add(out, 'error', 'working-length-below-solid', deepest.path,
      `working length ${formatQuantity(deepest.length, 'length', u)} is at or below the solid length ${formatQuantity(r.solidLength, 'length', u)}`,
      'lengthen the working length, or use finer wire or fewer coils');
  } else if (deepest.length < r.minimumWorkingLength) {
    add(out, 'warning', 'coil-clearance', deepest.path,
      `working length ${formatQuantity(deepest.length, 'length', u)} is below the minimum ${formatQuantity(r.minimumWorkingLength, 'length', u)} ` +
      `(largest solid length ${formatQuantity(r.solidLengthMaximum, 'length', u)} with the wire at its upper tolerance, plus the EN 13906-1 minimum coil gaps): coils may touch in service`,
      'lengthen the working length or reduce the solid length');
  }
  const deflection = r.freeLength - deepest.length;
  if (r.bucklingDeflection !== null && deflection >= r.bucklingDeflection) {
    add(out, 'warning', 'buckling', 'seating',
      `buckles at ${formatQuantity(r.freeLength - r.bucklingDeflection, 'length', u)} for ${x.seating} seating ` +
      `(L0/D ${significant(r.slenderness)} over the limit ${significant(r.slendernessLimit)}), before the working length`,
      'guide the spring on a rod or in a bore, seat both ends on parallel plates, or raise the coil diameter');
  }
  if (r.bucklingDeflection !== null && deflection < r.bucklingDeflection && deflection >= (1 - lim.bucklingMargin) * r.bucklingDeflection) {
    add(out, 'note', 'near-buckling', 'seating',
      `the working deflection ${formatQuantity(deflection, 'length', u)} is within ${100 * lim.bucklingMargin} % of the buckling ` +
      `deflection ${formatQuantity(r.bucklingDeflection, 'length', u)} (common trade practice margin)`,
      'guide the spring on a rod or in a bore, or raise the coil diameter');
  }
}

function reviewLoads(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  const u = x.units;
  for (let i = 0; i < r.loads.length; i++) {
    const l = r.loads[i]!;
    if (l.withinTolerance !== false || l.specifiedForce === null) continue;
    const freeLengthForForce = l.length + l.specifiedForce / r.rate;
    add(out, 'error', 'load-outside-tolerance', `loads[${i}].force`,
      `force at ${formatQuantity(l.length, 'length', u)} is ${formatQuantity(l.force, 'force', u)}; the drawing asks ` +
      `${formatQuantity(l.specifiedForce, 'force', u)} ±${l.tolerancePercent} %`,
      `a free length of ${formatQuantity(freeLengthForForce, 'length', u)} gives the force with these coils, or change the coil count`);
  }
}

const freeParameterWords: Record<FreeParameter, string> = {
  wireDiameter: 'wire diameter', diameter: 'coil diameter', coils: 'coils', freeLength: 'free length',
};

/** What the drawing holds fixed: every parameter not left to the maker, in the trade's order. */
function fixedWords(free: ReadonlySet<FreeParameter>): string {
  const fixed = (Object.keys(freeParameterWords) as FreeParameter[]).filter((p) => !free.has(p)).map((p) => freeParameterWords[p]);
  return fixed.length <= 1 ? fixed.join('') : `${fixed.slice(0, -1).join(', ')} and ${fixed.at(-1)}`;
}

function reviewDetermination(x: CompressionDesign, out: Sink): void {
  let first = -1;
  let count = 0;
  for (let i = 0; i < x.loads.length; i++) {
    if (x.loads[i]!.force === undefined) continue;
    if (first < 0) first = i;
    count++;
  }
  if (count === 0) return;
  const free = new Set(x.freeParameters);
  // EN 15800 (from memory): one force with L0 fixed frees n and d; two forces free L0, n and d.
  const needed: FreeParameter[] = count >= 2 ? ['freeLength', 'coils', 'wireDiameter']
    : free.has('freeLength') ? ['freeLength'] : ['coils', 'wireDiameter'];
  const missing = needed.filter((p) => !free.has(p));
  if (missing.length === 0) return;
  add(out, 'warning', 'over-determined', `loads[${first}].force`,
    `the drawing fixes ${fixedWords(free)} and ${count === 1 ? 'a toleranced force' : 'two toleranced forces'}: over-determined`,
    `per EN 15800 let the maker adjust the ${missing.map((m) => freeParameterWords[m]).join(' and ')} (free parameters), or accept a wider load tolerance`);
}

function reviewManufacture(x: CompressionDesign, r: CompressionReport, out: Sink): void {
  if (endForms[x.ends].ground && x.d < lim.minimumGroundWire) {
    add(out, 'warning', 'grinding-fine-wire', 'ends',
      `wire under ${formatQuantity(lim.minimumGroundWire, 'length', x.units)} is normally not ground`, 'specify closed ends, not ground');
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
  if (!hasSteelFatigueData(x.wire.family)) {
    add(out, 'warning', 'no-fatigue-data', 'duty', noFatigueData(x.wire.gradeName), NO_FATIGUE_DATA_FIX);
    return;
  }
  const f = r.fatigue;
  if (f && f.verdict !== 'pass') {
    add(out, f.verdict === 'fail' ? 'error' : 'warning', `fatigue-${f.verdict}`, 'duty', fatigueWords(f, x.units),
      fatigueFix(f, f.peened ? 'reduce the stroke stress: more coils or a larger coil diameter' : 'shot peen, or reduce the stroke stress'));
  }
}

/** The maker's review of a compression spring: every finding names the field it concerns. */
export function reviewCompression(x: CompressionDesign, r: CompressionReport, settings?: Settings): Finding[] {
  const out: Finding[] = [...x.wireFindings];
  reviewIndex(x, r.springIndex, out);
  reviewSolidStress(x, r, out, settings);
  reviewWorkingLengths(x, r, out);
  reviewLoads(x, r, out);
  reviewDetermination(x, out);
  reviewManufacture(x, r, out);
  reviewScope(x, r, out);
  reviewService(x, r, out);
  return out;
}
