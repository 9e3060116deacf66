/**
 * Wire properties for one grade at one diameter, with mill-certificate overrides applied. Runs once per
 * analysed spec, so everything that does not depend on d is prepared when the module loads; the nested
 * objects of the result are shared and frozen.
 */
import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';
import type { Finding } from '../result';
import { staticAllowables } from './allowables';
import type { StaticAllowable } from './allowables';
import { wireGrades } from './catalog';
import type { CompiledStrength, StrengthScratch } from './lookup';
import { clampToRange, compiledStrength, modulusBandAt, strengthInto } from './lookup';
import type { DiameterChange, MaterialOverrides, WireGrade, WireProperties } from './types';

interface Prepared {
  grade: WireGrade;
  strength: CompiledStrength;
  /** The range widened by a relative 1e-9, so a size typed in mm matches an edge converted from inches. */
  lo: number;
  hi: number;
  rangeText: string;
  fitNotes: string[];
  serviceTemperature: { min: number; max: number };
  stressRelief: { temperature: number; minutes: number; diameterChange: DiameterChange };
  allowable: Readonly<StaticAllowable>;
}

const OVERRIDE_SOURCE = 'mill certificate (override)';
export const EDGE_TOLERANCE = 1e-9;

/** Up to four decimals, no trailing zeros. */
const mm = (x: number): string => String(Number(x.toFixed(4)));

function prepare(grade: WireGrade): Prepared {
  const { min, max } = grade.diameterRange;
  return {
    grade,
    strength: compiledStrength(grade),
    lo: min * (1 - EDGE_TOLERANCE),
    hi: max * (1 + EDGE_TOLERANCE),
    rangeText: `${mm(min)}–${mm(max)} mm`,
    fitNotes: grade.strengthFits.map((f) =>
      `The tensile strength of ${grade.name} at this size is not from the standard's table: ${f.source}.`),
    serviceTemperature: Object.freeze({ min: grade.serviceTemperature.min, max: grade.serviceTemperature.max }),
    stressRelief: Object.freeze({
      temperature: grade.stressRelief.temperature, minutes: grade.stressRelief.minutes,
      diameterChange: grade.stressRelief.diameterChange,
    }),
    allowable: staticAllowables[grade.family],
  };
}

const prepared = new Map(wireGrades.map((g) => [g.id, prepare(g)]));

// One lookup result, reused: JavaScript runs this synchronously, and the values are copied out at once.
const scratch: StrengthScratch = { min: 0, max: null, basis: 'table', source: '', verified: false, fitIndex: -1 };

function outsideRange(p: Prepared, d: number, units: UnitSystem): Finding {
  const len = (x: number) => formatQuantity(x, 'length', units);
  const range = units === 'metric' ? p.rangeText : `${len(p.grade.diameterRange.min)}–${len(p.grade.diameterRange.max)}`;
  return {
    code: 'wire-diameter-outside-grade',
    severity: 'error',
    path: 'wireDiameter',
    message: `Wire diameter ${units === 'metric' ? `${mm(d)} mm` : len(d)} is outside the sizes ${p.grade.name} is made in (${range}); `
      + 'its properties are taken at the nearest size in range.',
    fix: `Choose a grade made in this size, or a wire diameter within ${range}.`,
  };
}

function strengthNote(p: Prepared, fitIndex: number): Finding {
  return {
    code: 'strength-from-fit',
    severity: 'note',
    path: 'material',
    message: p.fitNotes[fitIndex] ?? '',
    fix: 'Check the tensile strength on the mill certificate and enter it as an override.',
  };
}

function properties(p: Prepared, d: number, o: MaterialOverrides | undefined): WireProperties {
  const g = p.grade;
  const band = modulusBandAt(g.moduli.bands, clampToRange(g.diameterRange, d));
  const given = o?.tensileStrength;
  return {
    gradeId: g.id,
    gradeName: g.name,
    family: g.family,
    d,
    tensileStrength: given ?? scratch.min,
    tensileStrengthMax: given === undefined ? scratch.max : null,
    tensileStrengthBasis: given === undefined ? scratch.basis : 'override',
    tensileStrengthSource: given === undefined ? scratch.source : OVERRIDE_SOURCE,
    elasticModulus: o?.elasticModulus ?? band.E,
    shearModulus: o?.shearModulus ?? band.G,
    density: o?.density ?? g.density.value,
    serviceTemperature: p.serviceTemperature,
    allowableStaticFraction: p.allowable,
    stressRelief: p.stressRelief,
    relativeCost: g.relativeCost.value,
    dynamicGrade: g.dynamicGrade,
  };
}

/**
 * Properties of grade `gradeId` at wire diameter d (mm); undefined only for an unknown id. Overrides replace
 * library values; an overridden tensile strength has basis 'override'.
 */
export function wireProperties(
  gradeId: string, d: number, overrides?: MaterialOverrides, units: UnitSystem = 'metric',
): { props: WireProperties; findings: Finding[] } | undefined {
  const p = prepared.get(gradeId);
  if (!p) return undefined;
  strengthInto(p.strength, d, scratch);
  const props = properties(p, d, overrides);
  const findings: Finding[] = [];
  if (!(d >= p.lo && d <= p.hi)) findings.push(outsideRange(p, d, units));
  if (props.tensileStrengthBasis === 'fit') findings.push(strengthNote(p, scratch.fitIndex));
  return { props, findings };
}
