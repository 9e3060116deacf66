import type { Finding } from '../result';
import type { QuantityMap } from '../units';
import { convertFields, OWN } from '../units';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import type { ToleranceGrade } from '../tolerances';
import { shopTablesOf } from '../tolerances';
import type { CoilBody } from '../springs/coil-body';
import { kindEntryOf } from '../kinds/registry';
import { checkBakeSpecification } from '../finishing/bake';
import { effectiveFinish } from '../finishing/effective';
import { findGrade } from '../materials';
import type { RoutingChoices } from './operations';
import type { InspectionPlan } from './inspection-plan';
import { lotWire, startQuantity } from './lot-wire';
import { checkWireStock } from './wire-stock';
import { assignWorkCentres } from './assign';
import { judgedOperations, pinsOf, withRunOverrides } from './judged-routing';
import type { RemovedOperation } from './judged-routing';
import { noJudgement } from '../quoting/judgement';
import type { JobJudgement } from '../quoting/judgement';
import { wirePrice } from '../costing/wire-price';
import type { LotWire, Operation } from './types';

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
  const { id: finishId, finish, bakeSpecification: bake } = effectiveFinish(spec, settings.finishes);
  if (finishId !== null && !finish) {
    findings.push({ code: 'unknown-finish', severity: 'error', path: 'finish',
      message: `finish "${finishId}" is not in the shop's finishes`, fix: 'choose one from Settings → Finishes, or "none"' });
  }
  if (finish?.electroplated) findings.push(...checkBakeSpecification(bake, tensileStrength, { units: spec.units }));
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
  const kind = kindEntryOf(spec.kind);
  const x = kind.design(spec) ?? unknownGrade(spec);
  const r = kind.analyse(x, settings);
  const lengths = kind.freeLengths(r);
  return {
    body: x, findings: kind.review(x, r, settings), coiledFreeLength: lengths.coiled, freeLength: lengths.finished,
    wireLength: r.wireLength, mass: r.mass,
    route: (c) => kind.routing(settings, x, r, c),
    inspect: (lot, aql, grade, f) => kind.inspection(x, r, lot, aql, grade, f, shopTablesOf(settings.toleranceTables)),
  };
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

function withStock(wire: Omit<LotWire, 'stock'>, settings: Settings, grade: string, d: number, units: Spec['units']): LotWire {
  return { ...wire, stock: checkWireStock(settings.wireStock, grade, d, wire.kg, units) };
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
    lotWire: withStock(lotWire(start, k.wireLength, settings.costing.setupScrapMetres, d, wire.density), settings, wire.gradeId, d, spec.units),
    operations: routed, removed: judged.removed,
    inspection: k.inspect(orderQuantity, spec.aql ?? DEFAULT_AQL, grade, findings),
    findings,
  };
}

/** What each number of an operation measures; a setting names its own quantity. */
export const operationQuantities: QuantityMap = {
  sequence: 'ordinal', setupMinutes: 'minutes', piecesPerHour: 'perHour',
  batch: { capacityPieces: 'count', cycleMinutes: 'minutes', batches: 'count' },
  scrapFraction: 'ratio', settings: { value: OWN },
  workCentre: { hourlyRate: 'money' },
  choice: { lotCost: 'money', difference: 'money', runnerUp: { lotCost: 'money' } },
  offers: {
    hourlyRate: 'money', setupMinutes: 'minutes', piecesPerHour: 'perHour', scrapFraction: 'ratio', lotCost: 'money',
    batch: { capacityPieces: 'count', cycleMinutes: 'minutes' },
  },
  overrides: { value: 'figure', shopDefault: 'figure' },
};

/** What each number of an inspection plan measures; a characteristic names its own quantity. */
export const inspectionQuantities: QuantityMap = {
  lotSize: 'count', aql: 'percent', sampleSize: 'count', accept: 'count', reject: 'count',
  characteristics: { atLength: 'length', nominal: OWN, lower: OWN, upper: OWN },
};

/** What each number of a plan measures; `planInSpecUnits` converts with it. The lot's wire stays in m and kg. */
export const planQuantities: QuantityMap = {
  orderQuantity: 'count', toleranceGrade: 'ordinal',
  material: { wireDiameter: 'length', tensileStrength: 'stress' },
  coiledFreeLength: 'length', freeLength: 'length', wireLengthPerPiece: 'length', massPerPiece: 'mass', massPer1000: 'massBulk',
  lotWire: {
    startQuantity: 'count', metres: 'stockLength', kg: 'stockMass',
    stock: { onHandKg: 'stockMass', neededKg: 'stockMass', lots: { kg: 'stockMass' }, otherSizes: 'length' },
  },
  operations: operationQuantities,
  inspection: inspectionQuantities,
};

/** The plan in the spec's unit system; the lot's wire stays in metres and kg, as wire is bought. */
export function planInSpecUnits(plan: ManufacturingPlan): ManufacturingPlan {
  return convertFields(plan, planQuantities, plan.units, 'out');
}
