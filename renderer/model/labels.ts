import type { JobDateField, JobStatus } from '../../core/api';
import type { CompressionEnds, ExtensionEndForm, FreeParameter, LegForm, Seating } from '../../core/spec';
import type { Term, Wind } from '../../core/vocabulary';
import {
  compressionEndTerms, extensionEndTerms, legFormTerms, seatingTerms, sentenceCase, symbols, windTerms,
} from '../../core/vocabulary';

/** A select list's labels from the shared vocabulary's short terms. */
const shortLabels = <K extends string>(terms: Record<K, Term>): Record<K, string> =>
  Object.fromEntries(Object.entries<Term>(terms).map(([k, t]) => [k, sentenceCase(t.short)])) as Record<K, string>;

/** A job's dates as the list's date range names them. */
export const jobDateLabels: Record<JobDateField, string> = { created: 'Created', updated: 'Last saved', due: 'Due' };

export const statusLabels: Record<JobStatus, string> = {
  draft: 'Draft', quoted: 'Quoted', ordered: 'Ordered', 'in-production': 'In production', done: 'Done', lost: 'Lost',
};

export const endsLabels: Record<CompressionEnds, string> = shortLabels(compressionEndTerms);

export const seatingLabels: Record<Seating, string> = shortLabels(seatingTerms);

export const windLabels: Record<Wind, string> = shortLabels(windTerms);

export const freeParameterLabels: Record<FreeParameter, string> = {
  wireDiameter: 'Wire diameter', diameter: 'Coil diameter', coils: 'Number of coils', freeLength: 'Free length',
};

export const dimensionLabels = {
  wireDiameter: symbols.wireDiameter, outerDiameter: symbols.outerDiameter, meanDiameter: symbols.meanDiameter,
  freeLength: symbols.freeLength, activeCoils: symbols.activeCoils, rate: symbols.rate,
} as const;

const fieldNames: Record<string, string> = {
  material: 'wire grade', wireDiameter: 'wire diameter', outerDiameter: 'outside diameter', innerDiameter: 'inside diameter',
  meanDiameter: 'mean diameter', totalCoils: 'total coils', activeCoils: 'active coils', ends: 'ends', freeLength: 'free length',
  seating: 'seating', finish: 'finish', bakeSpecification: 'bake specification', aql: 'AQL', quantities: 'price-break quantities',
  toleranceGrade: 'tolerance grade', 'duty.cycles': 'cycles', 'duty.frequency': 'frequency', 'duty.between[0]': 'working length L1',
  'duty.between[1]': 'working length L2', 'serviceTemperature.min': 'lowest service temperature',
  'serviceTemperature.max': 'highest service temperature', partNumber: 'part number', 'customer.name': 'customer',
  orderQuantity: 'order quantity', leadTimeDays: 'lead time', dueDate: 'due date', bodyCoils: 'body coils',
  initialTension: 'initial tension', bodyLength: 'body length', mechanicalStop: 'mechanical stop', loopAngle: 'loop angle',
  loopAngleTolerance: 'loop angle tolerance', arborDiameter: 'arbor diameter', freeAngle: 'free angle',
  freeAngleTolerance: 'free angle tolerance', loadDirection: 'load direction', windDirection: 'direction of wind',
  directionOfWind: 'direction of wind', duty: 'duty', 'duty.type': 'duty', 'duty.peened': 'shot peened (duty)', units: 'units',
  kind: 'kind of spring', shotPeen: 'shot peen', freeParameters: 'what the maker may adjust', notes: 'spec notes',
};

/** A spec or job path in words, for "go to" buttons: "loads[1].force" → "force F2". */
export function fieldName(path: string): string {
  const load = /^loads\[(\d+)\]\.(length|force|tolerancePercent)$/.exec(path);
  if (load) {
    const n = Number(load[1]) + 1;
    return load[2] === 'length' ? `test length L${n}` : load[2] === 'force' ? `force F${n}` : `tolerance on F${n}`;
  }
  const angle = /^loads\[(\d+)\]\.(angle|torque)$/.exec(path);
  if (angle) return angle[2] === 'angle' ? `working angle α${Number(angle[1]) + 1}` : `torque M${Number(angle[1]) + 1}`;
  const part = /^(ends|legs)\[(\d+)\](?:\.(\w+))?$/.exec(path);
  if (part) {
    const which = `${part[2] === '0' ? 'first' : 'second'} ${part[1] === 'ends' ? 'end' : 'leg'}`;
    return part[3] ? `${which}: ${part[3] === 'bendRadius' ? 'bend radius' : part[3]}` : which;
  }
  const override = /^materialOverrides\.(\w+)$/.exec(path);
  if (override) return `certificate ${override[1]}`;
  return fieldNames[path] ?? path;
}

export const extensionEndLabels: Record<ExtensionEndForm, string> = shortLabels(extensionEndTerms);

export const legFormLabels: Record<LegForm, string> = shortLabels(legFormTerms);
