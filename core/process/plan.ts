import type { Finding } from '../result';
import type { QuantityMap, UnitSystem } from '../units';
import { convertFields, fromInternal } from '../units';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import type { ToleranceGrade } from '../tolerances';
import { compressionDesign } from '../springs/compression/design';
import type { CompressionDesign } from '../springs/compression/design';
import { analyseCompression } from '../springs/compression/analyse';
import type { CompressionReport } from '../springs/compression/report';
import { reviewCompression } from '../review/compression';
import { compressionRouting } from './compression-routing';
import type { RoutingChoices } from './compression-routing';
import { compressionInspection } from './inspection-plan';
import type { Characteristic, InspectionPlan } from './inspection-plan';
import { lotWire, startQuantity } from './lot-wire';
import type { LotWire, Operation, OperationSetting } from './types';

/** How the shop makes one order of a spring. Internal units; `planQuantities` converts out. */
export interface ManufacturingPlan {
  kind: Spec['kind'];
  units: Spec['units'];
  orderQuantity: number;
  toleranceGrade: ToleranceGrade;
  material: { grade: string; name: string; wireDiameter: number; tensileStrength: number; diameterTolerance: string };
  coiledFreeLength: number;
  freeLength: number;
  wireLengthPerPiece: number;
  massPerPiece: number;
  massPer1000: number;
  lotWire: LotWire;
  operations: Operation[];
  inspection: InspectionPlan;
  findings: Finding[];
}

export const DEFAULT_AQL = 1.0;

function routingChoices(spec: Spec, settings: Settings, findings: Finding[], start: number): RoutingChoices {
  const finishId = spec.finish ?? 'none';
  const finish = finishId === 'none' ? null : settings.finishes.find((f) => f.id === finishId) ?? null;
  if (finishId !== 'none' && !finish) {
    findings.push({ code: 'unknown-finish', severity: 'error', path: 'finish',
      message: `finish "${finishId}" is not in the shop's finishes`, fix: 'choose one from Settings → Finishes, or "none"' });
  }
  const bake = spec.bakeSpecification ?? finish?.bakeSpecification ?? null;
  if (finish?.electroplated && !bake) {
    findings.push({ code: 'bake-specification-missing', severity: 'error', path: 'bakeSpecification',
      message: `${finish.name} is electroplated: a hydrogen-embrittlement relief bake must be specified`,
      fix: 'name the bake specification the customer requires (e.g. ASTM B850, ISO 4042, SAE/USCAR-5)' });
  }
  return {
    directionOfWind: spec.directionOfWind ?? 'either',
    shotPeen: spec.shotPeen ?? (spec.duty.type === 'cyclic' && spec.duty.peened),
    finish, bakeSpecification: bake, startQuantity: start,
  };
}

function assemble(
  spec: Spec, settings: Settings, x: CompressionDesign, r: CompressionReport, orderQuantity: number, findings: Finding[],
): ManufacturingPlan {
  const grade = (spec.toleranceGrade ?? settings.defaults.toleranceGrade) as ToleranceGrade;
  // The routing's scrap rates set the start quantity, which in turn sets oven batches: route twice.
  const first = compressionRouting(settings, x, r, routingChoices(spec, settings, [], orderQuantity));
  const start = startQuantity(orderQuantity, first);
  const operations = compressionRouting(settings, x, r, routingChoices(spec, settings, findings, start));
  const coiled = r.setRemoval.required && r.setRemoval.coiledFreeLength !== null ? r.setRemoval.coiledFreeLength : r.freeLength;
  return {
    kind: spec.kind, units: spec.units, orderQuantity, toleranceGrade: grade,
    material: {
      grade: x.wire.gradeId, name: x.wire.gradeName, wireDiameter: x.d, tensileStrength: x.wire.tensileStrength,
      diameterTolerance: 'per the wire standard of the grade',
    },
    coiledFreeLength: coiled, freeLength: r.freeLength,
    wireLengthPerPiece: r.wireLength, massPerPiece: r.mass, massPer1000: 1000 * r.mass,
    lotWire: lotWire(start, r.wireLength, settings.costing.setupScrapMetres, x.d, x.wire.density),
    operations,
    inspection: compressionInspection(x, r, orderQuantity, spec.aql ?? DEFAULT_AQL, grade, findings),
    findings,
  };
}

/** The manufacturing plan for an order quantity: routing, wire, tolerances and inspection. */
export function planManufacture(spec: Spec, settings: Settings, orderQuantity: number): ManufacturingPlan {
  const x = compressionDesign(spec);
  if (!x) throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
  const r = analyseCompression(x);
  const findings = reviewCompression(x, r);
  return assemble(spec, settings, x, r, orderQuantity, findings);
}

/** Unit map for converting a plan to the spec's units (operation settings carry their own quantity). */
const planQuantities: QuantityMap = {
  material: { wireDiameter: 'length', tensileStrength: 'stress' },
  coiledFreeLength: 'length', freeLength: 'length', wireLengthPerPiece: 'length', massPerPiece: 'mass', massPer1000: 'massBulk',
};

const convertSetting = (s: OperationSetting, units: UnitSystem): OperationSetting =>
  s.quantity && typeof s.value === 'number' ? { ...s, value: fromInternal(s.value, s.quantity, units) } : s;

const convertCharacteristic = (c: Characteristic, units: UnitSystem): Characteristic => {
  const out = (v: number | null) => (v === null ? null : fromInternal(v, c.quantity, units));
  const atLength = c.atLength === null ? null : fromInternal(c.atLength, 'length', units);
  return { ...c, nominal: fromInternal(c.nominal, c.quantity, units), lower: out(c.lower), upper: out(c.upper), atLength };
};

/** The plan in the spec's unit system; the lot's wire stays in metres and kg, as wire is bought. */
export function planInSpecUnits(plan: ManufacturingPlan): ManufacturingPlan {
  const u = plan.units;
  const base = convertFields(plan, planQuantities, u, 'out');
  return {
    ...base,
    operations: plan.operations.map((op) => ({ ...op, settings: op.settings.map((s) => convertSetting(s, u)) })),
    inspection: { ...plan.inspection, characteristics: plan.inspection.characteristics.map((c) => convertCharacteristic(c, u)) },
  };
}
