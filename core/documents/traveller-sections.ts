/** The blocks of a traveller built from the manufacturing plan (internal units in, job's units out). */
import { formatQuantity } from '../format';
import type { ManufacturingPlan } from '../process/plan';
import type { Characteristic, InspectionPlan } from '../process/inspection-plan';
import type { OperationOverride, Operation, OperationSetting } from '../process/types';
import type { UnitSystem } from '../units';
import type { Finish } from '../settings/schema';
import { fixedText, percentText, piecesText, plainText, quantityText, wordText } from './text';
import type { Field, OperationModel, TableModel } from './types';

const OPERATOR_SIGN_OFF = ['Operator', 'Date', 'Qty good', 'Qty scrap'];
const OUTSIDE_SIGN_OFF = ['Vendor PO', 'Date out', 'Date back', 'Qty back'];
export const MATERIAL_FILL_IN = ['Heat / lot number', 'Mill certificate ref.', 'Issued by / date'];
export const INSPECTION_SIGN_OFF = ['Inspector', 'Date', 'Lot accepted / rejected', 'Certificate of conformance no.'];
/** Before the run goes on: the first pieces approved, and the job released by engineering. */
export const RELEASE_SIGN_OFF = ['First article approved by', 'Date', 'Engineering release by', 'Date'];

/** What the inspector records of a finish: its thickness where it has one, the plater's bake certificate after plating. */
export function finishChecks(finish: Finish | null): string[] {
  if (!finish) return [];
  const checks = finish.inHouse ? ['Finish checked (visual)'] : ['Coating thickness measured'];
  if (finish.electroplated) checks.push('Plater\'s bake certificate no.');
  return checks;
}

export function settingText(s: OperationSetting, units: UnitSystem): string {
  if (typeof s.value === 'string') return wordText(s.value);
  return s.quantity ? quantityText(s.value, s.quantity, units) : plainText(s.value);
}

/** The lot's wire in metres and kilograms, as wire is bought; inch jobs also get feet and pounds. */
export function lotWireTexts(plan: ManufacturingPlan): { length: string; mass: string } {
  const { metres, kg } = plan.lotWire;
  const m = `${fixedText(metres, 1)} m`;
  const k = `${fixedText(kg, 2)} kg`;
  if (plan.units === 'metric') return { length: m, mass: k };
  return {
    length: `${m} (${formatQuantity(metres * 1000, 'lengthLong', 'inch')})`,
    mass: `${k} (${formatQuantity(kg, 'massBulk', 'inch')})`,
  };
}

export function materialFields(plan: ManufacturingPlan): Field[] {
  const u = plan.units;
  const lot = lotWireTexts(plan);
  return [
    { label: 'Grade', value: plan.material.name },
    { label: 'Wire Ø d', value: formatQuantity(plan.material.wireDiameter, 'length', u) },
    { label: 'Tolerance on d', value: plan.material.diameterTolerance },
    { label: 'Min. tensile strength', value: quantityText(plan.material.tensileStrength, 'stress', u) },
    { label: 'Wire per piece', value: formatQuantity(plan.wireLengthPerPiece, 'length', u) },
    { label: 'Mass per piece', value: formatQuantity(plan.massPerPiece, 'mass', u) },
    { label: `Wire for ${piecesText(plan.lotWire.startQuantity)} pcs + setup`, value: lot.length },
    { label: 'Wire mass for the lot', value: lot.mass },
    { label: 'Wire stock', value: plan.lotWire.stock.text },
  ];
}

function paceField(op: Operation): Field | null {
  if (op.batch) {
    const b = op.batch;
    return { label: 'Batches', value: `${b.batches} × up to ${piecesText(b.capacityPieces)} pcs, ${plainText(b.cycleMinutes)} min each` };
  }
  if (op.piecesPerHour) return { label: 'Run rate', value: `${piecesText(op.piecesPerHour)} pcs/h` };
  return null;
}

/** What an operation without a run rate is paced by: the lot sent out and its mass, or the rate still to set. */
function lotField(op: Operation, lot: OperationLot, units: UnitSystem): Field {
  const pieces = `${piecesText(lot.pieces)} pcs`;
  if (op.outside) return { label: 'Lot out', value: `${pieces}, about ${formatQuantity(lot.mass, 'massBulk', units)}` };
  return { label: 'Lot', value: `${pieces}; run rate not set: add a work centre for it in Settings` };
}

function operationFields(op: Operation, lot: OperationLot, units: UnitSystem): Field[] {
  const fields: Field[] = [];
  if (!op.outside && op.setupMinutes > 0) fields.push({ label: 'Setup', value: `${plainText(op.setupMinutes, 0)} min` });
  const pace = paceField(op);
  fields.push(pace ? { ...pace, value: `${pace.value} (lot ${piecesText(lot.pieces)} pcs)` } : lotField(op, lot, units));
  if (op.scrapFraction > 0) fields.push({ label: 'Scrap allowance', value: percentText(op.scrapFraction) });
  for (const o of op.overrides) fields.push({ label: `${OVERRIDE_LABELS[o.field]} set for this job`, value: overrideText(o) });
  if (op.addedBecause) fields.push({ label: 'Added for this job', value: op.addedBecause });
  return fields;
}

export const OVERRIDE_LABELS: Record<OperationOverride['field'], string> = {
  machine: 'Machine', setupMinutes: 'Setup', piecesPerHour: 'Run rate', scrapPercent: 'Scrap',
};

const OVERRIDE_UNITS: Record<OperationOverride['field'], string> = { machine: '', setupMinutes: ' min', piecesPerHour: ' pcs/h', scrapPercent: ' %' };

/** "45 min (shop 30 min): new fixture" — the estimator's figure, the shop's beside it, and why. */
export function overrideText(o: OperationOverride): string {
  const unit = OVERRIDE_UNITS[o.field];
  const show = (v: number | string) => (typeof v === 'number' ? `${plainText(v, 2)}${unit}` : v);
  return `${show(o.value)} (shop ${o.shopDefault === null ? 'none' : show(o.shopDefault)}): ${o.reason}`;
}

function workCentreText(op: Operation): string {
  if (op.workCentre) return op.workCentre.name;
  if (op.outside) return 'outside processing';
  return op.kind === 'pack' || op.kind === 'load-test' ? 'bench' : 'no work centre assigned';
}

/** Pieces reaching an operation (the start quantity less the scrap of those before it) and their mass (kg). */
export interface OperationLot {
  pieces: number;
  mass: number;
}

export function operationLots(plan: ManufacturingPlan): OperationLot[] {
  let pieces = plan.lotWire.startQuantity;
  return plan.operations.map((op) => {
    const lot = { pieces, mass: pieces * plan.massPerPiece };
    pieces = Math.ceil(pieces * (1 - op.scrapFraction));
    return lot;
  });
}

export function operationModel(op: Operation, units: UnitSystem, lot: OperationLot): OperationModel {
  return {
    sequence: String(op.sequence), title: op.title, workCentre: workCentreText(op), outside: op.outside,
    fields: operationFields(op, lot, units),
    settings: op.settings.map((s) => ({ label: s.label, value: settingText(s, units) })),
    notes: [...op.notes],
    signOff: op.outside ? OUTSIDE_SIGN_OFF : OPERATOR_SIGN_OFF,
  };
}

function limitsText(c: Characteristic, units: UnitSystem): string {
  const q = (v: number) => quantityText(v, c.quantity, units);
  if (c.lower !== null && c.upper !== null) return `${q(c.lower)} to ${q(c.upper)}`;
  if (c.upper !== null) return `max ${q(c.upper)}`;
  if (c.lower !== null) return `min ${q(c.lower)}`;
  return 'reference';
}

/** Sample size with its accept and reject numbers, or 100 % where every piece is tested. */
export function sampleText(plan: InspectionPlan, c: Characteristic): string {
  if (c.reference && c.lower === null && c.upper === null) return 'first pieces';
  if (c.everyPiece || plan.hundredPercent) return '100 %';
  return `n = ${plan.sampleSize}, Ac ${plan.accept} / Re ${plan.reject}`;
}

const REFERENCE_SUFFIX = ' (reference)';

/** "Force at L1 = 45.00 mm (reference)": the test length goes with the name, before the remark. */
function characteristicName(c: Characteristic, units: UnitSystem): string {
  if (c.atLength === null) return c.name;
  const remark = c.name.endsWith(REFERENCE_SUFFIX) ? REFERENCE_SUFFIX : '';
  const name = remark ? c.name.slice(0, -remark.length) : c.name;
  return `${name} = ${formatQuantity(c.atLength, 'length', units)}${remark}`;
}

/** A limit-only characteristic (squareness, a maximum) has no nominal worth printing. */
function nominalText(c: Characteristic, units: UnitSystem): string {
  const limitOnly = c.nominal === 0 && (c.lower === null) !== (c.upper === null);
  return limitOnly ? '–' : quantityText(c.nominal, c.quantity, units);
}

/** AQL as the sampling tables print it: 0.65, 1.0, 2.5, 10. */
export function aqlText(aql: number): string {
  return aql >= 10 ? plainText(aql, 1) : aql.toFixed(aql < 1 ? 2 : 1);
}

export function inspectionTable(plan: InspectionPlan, units: UnitSystem): TableModel {
  return {
    columns: [
      { header: 'Characteristic', weight: 2.2, align: 'left' },
      { header: 'Nominal', weight: 1, align: 'right' },
      { header: 'Limits', weight: 1.6, align: 'left' },
      { header: 'Gauge', weight: 1.8, align: 'left' },
      { header: 'Sample', weight: 1.9, align: 'left' },
      { header: 'Measured', weight: 1.1, align: 'left' },
    ],
    rows: plan.characteristics.map((c) => [
      characteristicName(c, units), nominalText(c, units), limitsText(c, units), c.gauge, sampleText(plan, c), '',
    ]),
  };
}

export function samplingSummary(plan: InspectionPlan): string[] {
  const lot = `Lot ${piecesText(plan.lotSize)} pcs, AQL ${aqlText(plan.aql)}`;
  const head = plan.hundredPercent
    ? `${lot}: inspect every piece (100 %).`
    : `${lot}, code letter ${plan.code ?? '–'}: sample n = ${plan.sampleSize}, accept Ac ${plan.accept}, reject Re ${plan.reject}.`;
  return [head, 'Lines marked 100 % are tested on every piece whatever the sample.', `Sampling plan: ${plan.samplingSource}.`];
}
