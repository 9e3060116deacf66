import type { FieldError } from '../../core/result';
import type { CompressionEnds } from '../../core/spec/compression';
import type { ExtensionLoop } from '../../core/requirement/extension';
import type { FieldMeasure } from '../../core/typed-number';
import { parseList, parseNumber } from './numbers';

/** The requirement form as typed: every number stays text until the requirement is built. */
export interface RequirementDraft {
  kind: 'compression' | 'extension';
  units: 'metric' | 'inch';
  reference: string;
  bore: string; rod: string; maxOuterDiameter: string; minInnerDiameter: string; maxSolidLength: string; maxFreeLength: string;
  functionType: 'two-loads' | 'load-and-rate';
  length1: string; force1: string; length2: string; force2: string; tolerancePercent: string;
  rate: string; rateTolerancePercent: string;
  maxStressRatio: string;
  dutyType: 'static' | 'cyclic';
  strokeFrom: string; strokeTo: string; cycles: string; peeningAllowed: boolean;
  temperatureMin: string; temperatureMax: string;
  wireSizes: 'stock' | 'priced' | 'preferred';
  families: string[];
  ends: CompressionEnds[];
  /** Extension: loop forms to try, the initial-tension window, and whether the assembly has a stop. */
  loops: ExtensionLoop[];
  initialTensionMin: string;
  initialTensionMax: string;
  mechanicalStop: boolean;
  finish: string;
  quantities: string;
  mainQuantity: string;
}

export const allEnds: CompressionEnds[] = ['closed-ground', 'closed', 'open-ground', 'open'];
export const allLoops: ExtensionLoop[] = ['machine-loop', 'full-loop', 'crossover-loop', 'side-loop'];
export const gradeFamilies = [
  { value: 'cold-drawn-carbon', label: 'Cold-drawn carbon' },
  { value: 'hardened-tempered', label: 'Hardened and tempered' },
  { value: 'austenitic-stainless', label: 'Stainless' },
  { value: 'non-ferrous', label: 'Non-ferrous' },
] as const;

export function emptyRequirementDraft(units: 'metric' | 'inch'): RequirementDraft {
  return {
    kind: 'compression', units, reference: '', bore: '', rod: '', maxOuterDiameter: '', minInnerDiameter: '', maxSolidLength: '', maxFreeLength: '',
    functionType: 'two-loads', length1: '', force1: '', length2: '', force2: '', tolerancePercent: '10', rate: '', rateTolerancePercent: '10',
    maxStressRatio: '', dutyType: 'static', strokeFrom: '', strokeTo: '', cycles: '', peeningAllowed: false,
    temperatureMin: '', temperatureMax: '', wireSizes: 'stock', families: [], ends: [...allEnds],
    loops: ['machine-loop', 'full-loop'], initialTensionMin: '', initialTensionMax: '', mechanicalStop: false, finish: 'none', quantities: '', mainQuantity: '',
  };
}

/** What a requirement field measures, so a unit typed after its number is read (and converted) by it. */
function requirementMeasure(path: string): FieldMeasure | undefined {
  if (/Percent|Ratio|cycles/.test(path)) return undefined;
  if (/mainQuantity|quantities/.test(path)) return 'pieces';
  if (/serviceTemperature/.test(path)) return 'temperature';
  if (/force|initialTension/.test(path)) return 'force';
  if (/rate$/.test(path)) return 'rate';
  return 'length';
}

/** The raw requirement and the typing errors (text that is not a number), each at the requirement's own path. */
export function requirementOfDraft(d: RequirementDraft): { requirement: Record<string, unknown>; errors: FieldError[] } {
  const errors: FieldError[] = [];
  const num = (text: string, path: string): number | undefined => {
    const p = parseNumber(text, requirementMeasure(path), d.units);
    if (!p.ok) errors.push({ code: p.code, path, message: p.message });
    return p.ok ? p.value : undefined;
  };
  const defined = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));
  const tolerance = num(d.tolerancePercent, 'function.loads[0].tolerancePercent');
  const load = (length: string, force: string, path: string) =>
    defined({ length: num(length, `${path}.length`), force: num(force, `${path}.force`), tolerancePercent: tolerance });
  const extension = d.kind === 'extension';
  const fn = extension || d.functionType === 'two-loads'
    ? { type: 'two-loads', loads: [load(d.length1, d.force1, 'function.loads[0]'), load(d.length2, d.force2, 'function.loads[1]')] }
    : defined({ type: 'load-and-rate', load: load(d.length1, d.force1, 'function.load'), rate: num(d.rate, 'function.rate'),
      rateTolerancePercent: num(d.rateTolerancePercent, 'function.rateTolerancePercent') });
  const list = parseList(d.quantities);
  if (!list.ok) errors.push({ code: list.code, path: 'choices.quantities', message: `break ${list.item + 1}: ${list.message}` });
  const quantities = list.ok ? list.value : [];
  const tMin = num(d.temperatureMin, 'serviceTemperature.min');
  const tMax = num(d.temperatureMax, 'serviceTemperature.max');
  const initialTension = defined({ min: num(d.initialTensionMin, 'initialTension.min'), max: num(d.initialTensionMax, 'initialTension.max') });
  const requirement = defined({
    kind: d.kind, units: d.units, reference: d.reference.trim() || undefined,
    envelope: defined({
      bore: num(d.bore, 'envelope.bore'), maxOuterDiameter: num(d.maxOuterDiameter, 'envelope.maxOuterDiameter'),
      maxFreeLength: num(d.maxFreeLength, 'envelope.maxFreeLength'),
      ...(extension ? {} : {
        rod: num(d.rod, 'envelope.rod'), minInnerDiameter: num(d.minInnerDiameter, 'envelope.minInnerDiameter'),
        maxSolidLength: num(d.maxSolidLength, 'envelope.maxSolidLength'),
      }),
    }),
    function: fn,
    maxStressRatio: extension ? undefined : num(d.maxStressRatio, 'maxStressRatio'),
    initialTension: extension && Object.keys(initialTension).length > 0 ? initialTension : undefined,
    mechanicalStop: extension ? d.mechanicalStop : undefined,
    duty: d.dutyType === 'static' ? { type: 'static' } : defined({
      type: 'cyclic', between: [num(d.strokeFrom, 'duty.between[0]'), num(d.strokeTo, 'duty.between[1]')],
      cycles: num(d.cycles, 'duty.cycles'), peeningAllowed: extension ? undefined : d.peeningAllowed,
    }),
    serviceTemperature: tMin === undefined && tMax === undefined ? undefined : { min: tMin ?? tMax, max: tMax ?? tMin },
    choices: defined({
      wireSizes: d.wireSizes, ends: extension ? d.loops : d.ends, families: d.families.length > 0 ? d.families : undefined,
      finish: d.finish === 'none' ? undefined : d.finish,
      quantities: quantities.length > 0 ? quantities : undefined,
      mainQuantity: num(d.mainQuantity, 'choices.mainQuantity'),
    }),
  });
  return { requirement, errors };
}
