import type { FieldError, Result } from '../result';
import { fail, fieldError, formatPath, ok } from '../result';
import type { Spec } from '../spec';
import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';
import { fromInternal, toInternal } from '../units';
import { zodErrors } from '../validation';
import { finishedLengths } from '../process/set-model-values';
import type { FirstOffFields } from './record';
import { firstOffFieldsSchema } from './record';

type Path = readonly PropertyKey[];

const at = (prefix: Path, ...rest: PropertyKey[]) => formatPath([...prefix, ...rest]);

/**
 * The lengths against the job's spring. Pressing to solid only shortens a spring, and never below its solid
 * length: so the set lies between zero and the coiled deflection to solid (coiled free length − solid length).
 */
function lengthErrors(f: FirstOffFields, u: UnitSystem, solidLength: number, prefix: Path): FieldError[] {
  const solid = fromInternal(solidLength, 'length', u);
  const solidText = formatQuantity(solidLength, 'length', u);
  const errors: FieldError[] = [];
  if (f.coiledFreeLength <= solid) {
    errors.push(fieldError('coiled-below-solid', at(prefix, 'coiledFreeLength'),
      `the coiled free length used must be longer than the solid length (${solidText})`));
  }
  if (f.freeLengthAfterSet > f.coiledFreeLength) {
    errors.push(fieldError('negative-set', at(prefix, 'freeLengthAfterSet'),
      'the free length after set removal is longer than the coiled free length used: pressing to solid cannot lengthen a spring; check both values'));
  } else if (f.freeLengthAfterSet < solid) {
    const deflection = formatQuantity(toInternal(Math.max(0, f.coiledFreeLength - solid), 'length', u), 'length', u);
    errors.push(fieldError('set-beyond-deflection', at(prefix, 'freeLengthAfterSet'),
      `the set (coiled − measured) is larger than the coiled deflection to solid (${deflection}): a spring cannot end below its solid length (${solidText})`));
  }
  return errors;
}

/** Each test length lies within the spring's travel: below the measured free length, above solid. */
function testLengthErrors(f: FirstOffFields, u: UnitSystem, solidLength: number, prefix: Path): FieldError[] {
  const solid = fromInternal(solidLength, 'length', u);
  const errors: FieldError[] = [];
  f.forces.forEach((force, i) => {
    if (force.length >= f.freeLengthAfterSet || force.length <= solid) {
      errors.push(fieldError('test-length-outside-travel', at(prefix, 'forces', i, 'length'),
        `a test length lies between the solid length (${formatQuantity(solidLength, 'length', u)}) and the free length after set removal`));
    }
  });
  return errors;
}

function physicalErrors(f: FirstOffFields, spec: Spec, solidLength: number, prefix: Path): FieldError[] {
  const errors = lengthErrors(f, spec.units, solidLength, prefix);
  if (f.outerDiameter <= spec.wireDiameter) {
    errors.push(fieldError('diameter-below-wire', at(prefix, 'outerDiameter'), 'the outside diameter must be larger than the wire diameter'));
  }
  // A test length is judged against a believable free length only.
  const freeLengthBad = errors.some((e) => e.path === at(prefix, 'freeLengthAfterSet'));
  return freeLengthBad ? errors : [...errors, ...testLengthErrors(f, spec.units, solidLength, prefix)];
}

/** Values in another unit system than the job's would be read at the wrong scale: refused, whatever else is wrong. */
function unitsError(raw: unknown, spec: Spec, prefix: Path): FieldError[] {
  const units = typeof raw === 'object' && raw !== null ? (raw as { units?: unknown }).units : undefined;
  if ((units !== 'metric' && units !== 'inch') || units === spec.units) return [];
  return [fieldError('other-unit-system', at(prefix, 'units'), `the job is in ${spec.units} units: enter the record in ${spec.units} units, not ${units}`)];
}

/** Checks a first-off record against the job's spec; every problem is a field error under `prefix`. */
export function checkFirstOff(raw: unknown, spec: Spec, prefix: Path = []): Result<FirstOffFields> {
  const model = finishedLengths(spec);
  if (!model) {
    return fail([fieldError('not-compression', at(prefix, 'jobId'), 'first-off records of set removal are kept for compression springs only')]);
  }
  const units = unitsError(raw, spec, prefix);
  const parsed = firstOffFieldsSchema.safeParse(raw);
  if (!parsed.success) return fail([...units, ...zodErrors(parsed.error, prefix)]);
  if (units.length > 0) return fail(units);
  const errors = physicalErrors(parsed.data, spec, model.solidLength, prefix);
  return errors.length > 0 ? fail(errors) : ok(parsed.data);
}
