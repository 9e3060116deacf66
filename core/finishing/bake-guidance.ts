/** What each bake specification says for a strength, and reading a specification named in free text. */
import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { hardnessFromHv, hardnessFromTensile } from './bake-hardness';
import type { BakeStatement } from './bake-rules';
import { ams2759_9, b850, f1941, iso4042Rule, makerPractice, uscar5 } from './bake-rules';
import type { BakeSpecId } from './bake-specs';
import { toInternal } from '../units';
import type { UnitSystem } from '../units';

/** A bake as planned or written on the order. */
export interface PlannedBake {
  hours: number;
  temperatureC: number;
  /** Hours from leaving the plating line to the start of the bake. */
  startWithinHours?: number;
}

export interface BakeOptions {
  /** A measured or specified maximum hardness; used instead of the approximate conversion. */
  hardnessHv?: number;
  /** The job's unit system: strengths in the texts are written in it (MPa or psi). */
  units?: UnitSystem;
}

function checkInputs(tensileStrength: number, options: BakeOptions): FieldError[] {
  const errors: FieldError[] = [];
  if (!(Number.isFinite(tensileStrength) && tensileStrength > 0)) {
    errors.push(fieldError('invalid-input', 'tensileStrength', 'tensile strength must be a positive number of MPa'));
  }
  const hv = options.hardnessHv;
  if (hv !== undefined && !(Number.isFinite(hv) && hv > 0)) {
    errors.push(fieldError('invalid-input', 'hardnessHv', 'hardness must be a positive number of HV'));
  }
  return errors;
}

/** What every specification (and the conflicting maker practice, last) says for this tensile strength (MPa). */
export function bakeGuidance(tensileStrength: number, options: BakeOptions = {}): Result<BakeStatement[]> {
  const errors = checkInputs(tensileStrength, options);
  if (errors.length > 0) return fail(errors);
  const h = options.hardnessHv === undefined ? hardnessFromTensile(tensileStrength) : hardnessFromHv(options.hardnessHv);
  const specs = [b850(tensileStrength, options.units), iso4042Rule(h), uscar5(h), f1941(h), ams2759_9()];
  return ok([...specs, makerPractice(specs)]);
}

/** Each specification as people write it: optional body, the number, never followed by another digit. */
const patterns: ReadonlyArray<[BakeSpecId, RegExp]> = [
  ['astm-b850', /(?:^|[^a-z0-9])(?:astm[\s\-/]*)?b[\s\-]*850(?!\d)/],
  ['iso-4042', /(?:^|[^a-z0-9])iso[\s\-/]*4042(?!\d)/],
  ['sae-uscar-5', /(?:^|[^a-z0-9])(?:sae[\s\-/]*)?uscar[\s\-]*5(?!\d)/],
  ['astm-f1941', /(?:^|[^a-z0-9])(?:astm[\s\-/]*)?f[\s\-]*1941(?!\d)/],
  ['sae-ams-2759-9', /(?:^|[^a-z0-9])(?:sae[\s\-/]*)?ams[\s\-/]*2759[\s\-/]*9(?!\d)/],
];

/**
 * Reads "ASTM B850-98", "ISO 4042:2018", "SAE/USCAR-5", an id, or any of them with the bake written after it
 * ("ISO 4042, 4 h at 200 °C"). Edition years and the written condition do not change which standard it is;
 * text naming two different standards is not read as either.
 */
export function parseBakeSpecification(text: string): BakeSpecId | null {
  const lower = text.toLowerCase();
  const found = new Set(patterns.filter(([, re]) => re.test(lower)).map(([id]) => id));
  return found.size === 1 ? [...found][0]! : null;
}

/** A bake written with the specification: "4 h at 200 °C", "22 h at 392 °F", "3 h 190 °C". */
export function parseBakeCondition(text: string): PlannedBake | null {
  const m = /(\d+(?:\.\d+)?)\s*(?:h|hours?|hrs?)\b[^\d]*?(\d+(?:\.\d+)?)\s*°?\s*([cf])\b/i.exec(text);
  if (!m) return null;
  const value = Number(m[2]);
  const temperatureC = m[3]!.toLowerCase() === 'f' ? toInternal(value, 'temperature', 'inch') : value;
  return { hours: Number(m[1]), temperatureC };
}
