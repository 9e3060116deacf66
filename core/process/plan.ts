import type { Finding } from '../result';
import type { QuantityMap, UnitSystem } from '../units';
import { convertFields, fromInternal } from '../units';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import type { ToleranceGrade } from '../tolerances';
import type { CoilBody } from '../springs/coil-body';
import { compressionDesign } from '../springs/compression/design';
import { analyseCompression } from '../springs/compression/analyse';
import { extensionDesign } from '../springs/extension/design';
import { analyseExtension } from '../springs/extension/analyse';
import { torsionDesign } from '../springs/torsion/design';
import { analyseTorsion } from '../springs/torsion/analyse';
import { reviewCompression } from '../review/compression';
import { reviewExtension } from '../review/extension';
import { reviewTorsion } from '../review/torsion';
import { checkBakeSpecification } from '../finishing/bake';
import { findGrade } from '../materials';
import { compressionRouting } from './compression-routing';
import { extensionRouting } from './extension-routing';
import { torsionRouting } from './torsion-routing';
import type { RoutingChoices } from './operations';
import { compressionInspection } from './compression-inspection';
import { extensionInspection } from './extension-inspection';
import { torsionInspection } from './torsion-inspection';
import type { Characteristic, InspectionPlan } from './inspection-plan';
import { lotWire, startQuantity } from './lot-wire';
import { assignWorkCentres } from './assign';
import { judgedOperations, pinsOf, withRunOverrides } from './judged-routing';
import type { RemovedOperation } from './judged-routing';
import { noJudgement } from '../quoting/judgement';
import type { JobJudgement } from '../quoting/judgement';
import { wirePrice } from '../costing/wire-price';
import type { LotWire, Operation, OperationSetting } from './types';

/** How the shop makes one order of a spring. Internal units; `planInSpecUnits` converts out. */
export interface ManufacturingPlan {
  kind: Spec['kind'];
  units: Spec['units'];
  orderQuantity: number;
  toleranceGrade: ToleranceGrade;
  material: { grade: string; name: string; wireDiameter: number; tensileStrength: number; diameterTolerance: string };
  /** Free length to coil to (compression: with the set-removal allowance); null for torsion springs. */
  coiledFreeLength: number | null;
  freeLength: number | null;
  wireLengthPerPiece: number;
  massPerPiece: number;
  massPer1000: number;
  lotWire: LotWire;
  operations: Operation[];
  /** Operations the estimator took out of this job's routing, with the reason. */
  removed: RemovedOperation[];
  inspection: InspectionPlan;
  findings: Finding[];
}

export const DEFAULT_AQL = 1.0;

/** Where the wire's diameter tolerance is set: EN 10270 wire refers to EN 10218-2; ASTM grades carry their own table. */
function wireDiameterTolerance(gradeId: string): string {
  const standard = findGrade(gradeId)?.standard ?? '';
  return standard.startsWith('EN 10270') ? `EN 10218-2 tolerance class (${standard})` : `${standard} diameter tolerance`;
}

function routingChoices(spec: Spec, settings: Settings, findings: Finding[], tensileStrength: number): RoutingChoices {
  const finishId = spec.finish ?? 'none';
  const finish = finishId === 'none' ? null : settings.finishes.find((f) => f.id === finishId) ?? null;
  if (finishId !== 'none' && !finish) {
    findings.push({ code: 'unknown-finish', severity: 'error', path: 'finish',
      message: `finish "${finishId}" is not in the shop's finishes`, fix: 'choose one from Settings → Finishes, or "none"' });
  }
  const bake = spec.bakeSpecification ?? finish?.bakeSpecification ?? null;
  if (finish?.electroplated) findings.push(...checkBakeSpecification(bake, tensileStrength));
  const peened = spec.duty.type === 'cyclic' && spec.duty.peened;
  return {
    directionOfWind: spec.kind === 'torsion' ? spec.windDirection : spec.directionOfWind ?? 'either',
    shotPeen: spec.kind === 'compression' && (spec.shotPeen ?? peened),
    finish, bakeSpecification: bake,
  };
}

/** What the plan needs from one kind of spring: its resolved design, findings, routing and inspection. */
interface KindPlanner {
  body: CoilBody;
  findings: Finding[];
  coiledFreeLength: number | null;
  freeLength: number | null;
  wireLength: number;
  mass: number;
  route(choices: RoutingChoices): Operation[];
  inspect(lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[]): InspectionPlan;
}

const unknownGrade = (spec: Spec): never => {
  throw new Error(`unknown wire grade ${spec.material}: validate specs with parseSpec first`);
};

function plannerFor(spec: Spec, settings: Settings): KindPlanner {
  switch (spec.kind) {
    case 'compression': {
      const x = compressionDesign(spec) ?? unknownGrade(spec);
      const r = analyseCompression(x, settings.defaults.setRemovalMethod);
      return {
        body: x, findings: reviewCompression(x, r), coiledFreeLength: r.coiler.freeLength, freeLength: r.freeLength, wireLength: r.wireLength, mass: r.mass,
        route: (c) => compressionRouting(settings, x, r, c),
        inspect: (lot, aql, grade, f) => compressionInspection(x, r, lot, aql, grade, f),
      };
    }
    case 'extension': {
      const x = extensionDesign(spec) ?? unknownGrade(spec);
      const r = analyseExtension(x);
      return {
        body: x, findings: reviewExtension(x, r), coiledFreeLength: r.freeLength, freeLength: r.freeLength, wireLength: r.wireLength, mass: r.mass,
        route: (c) => extensionRouting(settings, x, r, c),
        inspect: (lot, aql, grade, f) => extensionInspection(x, r, lot, aql, grade, f),
      };
    }
    case 'torsion': {
      const x = torsionDesign(spec) ?? unknownGrade(spec);
      const r = analyseTorsion(x);
      return {
        body: x, findings: reviewTorsion(x, r), coiledFreeLength: null, freeLength: null, wireLength: r.wireLength, mass: r.mass,
        route: (c) => torsionRouting(settings, x, r, c),
        inspect: (lot, aql, grade, f) => torsionInspection(x, r, lot, aql, grade, f),
      };
    }
  }
}

/** The wire in one piece at the newest price on file (0 when none): what a scrapped piece throws away. */
function pieceWireValue(settings: Settings, body: CoilBody, massPerPiece: number): number {
  const price = wirePrice(settings.materialPrices, body.wire.gradeId, body.d);
  return price ? massPerPiece * price.pricePerKg : 0;
}

/**
 * Work centres for the lot. The start quantity depends on the chosen machines' scrap and the choice on the
 * quantity, so the two are settled together (a few passes at most: scrap rates are small).
 */
function settleRouting(operations: Operation[], orderQuantity: number, pieceValue: number, judgement: JobJudgement) {
  const pins = pinsOf(judgement);
  const route = (pieces: number) => withRunOverrides(assignWorkCentres(operations, pieces, pieceValue, pins), judgement);
  let start = orderQuantity;
  let routed = route(start);
  for (let pass = 0; pass < 4; pass++) {
    const next = startQuantity(orderQuantity, routed);
    if (next === start) break;
    start = next;
    routed = route(start);
  }
  return { start, routed };
}

/** The manufacturing plan for an order quantity: routing, wire, tolerances and inspection. */
export function planManufacture(spec: Spec, settings: Settings, orderQuantity: number, judgement: JobJudgement = noJudgement()): ManufacturingPlan {
  const k = plannerFor(spec, settings);
  const { wire, d } = k.body;
  const findings = k.findings;
  const grade = (spec.toleranceGrade ?? settings.defaults.toleranceGrade) as ToleranceGrade;
  const judged = judgedOperations(k.route(routingChoices(spec, settings, findings, wire.tensileStrength)), judgement, settings, findings);
  const { start, routed } = settleRouting(judged.operations, orderQuantity, pieceWireValue(settings, k.body, k.mass), judgement);
  return {
    kind: spec.kind, units: spec.units, orderQuantity, toleranceGrade: grade,
    material: { grade: wire.gradeId, name: wire.gradeName, wireDiameter: d, tensileStrength: wire.tensileStrength,
      diameterTolerance: wireDiameterTolerance(wire.gradeId) },
    coiledFreeLength: k.coiledFreeLength, freeLength: k.freeLength,
    wireLengthPerPiece: k.wireLength, massPerPiece: k.mass, massPer1000: 1000 * k.mass,
    lotWire: lotWire(start, k.wireLength, settings.costing.setupScrapMetres, d, wire.density),
    operations: routed, removed: judged.removed,
    inspection: k.inspect(orderQuantity, spec.aql ?? DEFAULT_AQL, grade, findings),
    findings,
  };
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
