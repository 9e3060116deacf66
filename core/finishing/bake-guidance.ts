/** What each bake specification says for a strength, and reading a specification named in free text. */
import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { hardnessFromHv, hardnessFromTensile } from './bake-hardness';
import type { BakeStatement } from './bake-rules';
import { ams2759_9, b850, f1941, iso4042Rule, makerPractice, uscar5 } from './bake-rules';
import type { BakeSpecId } from './bake-specs';

export interface BakeOptions {
  /** A measured or specified maximum hardness; used instead of the approximate conversion. */
  hardnessHv?: number;
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
  const specs = [b850(tensileStrength), iso4042Rule(h), uscar5(h), f1941(h), ams2759_9()];
  return ok([...specs, makerPractice(specs)]);
}

const aliases: Readonly<Record<string, BakeSpecId>> = {
  astmb850: 'astm-b850', b850: 'astm-b850',
  iso4042: 'iso-4042',
  saeuscar5: 'sae-uscar-5', uscar5: 'sae-uscar-5',
  astmf1941: 'astm-f1941', f1941: 'astm-f1941',
  saeams27599: 'sae-ams-2759-9', ams27599: 'sae-ams-2759-9',
};

/** Reads "ASTM B850-98", "ISO 4042:2018", "SAE/USCAR-5" or an id; edition years are ignored. */
export function parseBakeSpecification(text: string): BakeSpecId | null {
  const key = text.toLowerCase()
    .replace(/\(r\d{4}\)/g, '')
    .replace(/[:\-–]\s*(?:19|20)?\d{2}(?!\d)/g, '')
    .replace(/[^a-z0-9]/g, '');
  return aliases[key] ?? null;
}
