import { formatQuantity } from '../format';
import type { QuantityMap, UnitSystem } from '../units';
import { convertFields } from '../units';
import { CALIBRATION_RULES as RULES } from './set-calibration-rules';
import { ratioThroughOrigin } from './ratio-fit';
import type { SetModelValues } from './set-model-values';

/** One first-off record of a past job, in internal units, with the model's values for the spec it was made to. */
export interface PastFirstOff {
  recordId: number;
  jobId: number;
  jobNumber: string;
  material: string;
  materialFamily: string;
  /** How far the past job is from the spring asked about, as the store ranks similar jobs (0 = the same). */
  distance: number;
  measuredOn: string;
  measuredBy: string;
  coiledFreeLength: number;
  freeLengthAfterSet: number;
  model: SetModelValues | null;
}

/** The spring asked about: its grade family and what the model predicts for it. */
export interface CalibrationTarget {
  materialFamily: string;
  units: UnitSystem;
  model: SetModelValues | null;
}

/** A record the fit used: which job, what the model predicted and what the floor measured. */
export interface SetEvidence {
  recordId: number;
  jobId: number;
  jobNumber: string;
  material: string;
  distance: number;
  measuredOn: string;
  measuredBy: string;
  coiledFreeLength: number;
  /** The model's coiled free length for that job, beside the one the floor used. */
  modelCoiledFreeLength: number;
  predictedSet: number;
  measuredSet: number;
}

export interface SetFit {
  method: 'least squares through the origin (measured set = ratio × predicted set)';
  ratio: number;
  residualSd: number | null;
  relativeSpread: number | null;
  records: number;
  jobs: number;
  /** How far the calibration moves from the model to the fit: records ÷ records for full weight, at most 1. */
  weight: number;
}

export type CalibrationStatus = 'calibrated' | 'model' | 'not-applicable';

export interface SetCalibration {
  status: CalibrationStatus;
  units: UnitSystem;
  /** Why the model's value stands, or what the calibration rests on. */
  reason: string;
  freeLength: number | null;
  model: { coiledFreeLength: number | null; expectedSet: number | null };
  calibrated: { coiledFreeLength: number; expectedSet: number } | null;
  fit: SetFit | null;
  evidence: SetEvidence[];
  /** Records looked at and not used, each with why. */
  excluded: { recordId: number; jobNumber: string; reason: string }[];
  rules: string[];
  caution: string;
}

export const CALIBRATION_CAUTION = 'A calibrated coiled free length is a proposal from the shop\'s past first-off results: confirm it on the '
  + 'first pieces of this job. It supports, and does not replace, review by a qualified engineer and the customer\'s approval.';

const mm = (v: number, u: UnitSystem) => formatQuantity(v, 'length', u);
const pct = (v: number) => `${Math.round(v * 100)} %`;

export function calibrationRules(u: UnitSystem): string[] {
  return [
    `Evidence: first-off records of compression springs of the same grade family, within similarity distance ${RULES.maxDistance.value} (as similar jobs are ranked), from the ${RULES.nearestJobs.value} nearest jobs.`,
    `A record counts when the model predicts at least ${mm(RULES.minPredictedSet.value, u)} of set for its job.`,
    'Fit: least squares through the origin of the measured set against the predicted set; spread is the residual standard deviation.',
    `Not trusted when the spread exceeds ${pct(RULES.maxRelativeSpread.value)} of the typical predicted set.`,
    `The correction moves by records ÷ ${RULES.recordsForFullWeight.value} of the way to the fit, all the way from ${RULES.recordsForFullWeight.value} records.`,
  ];
}

export const NO_RECORDS = 'no first-off records of similar compression springs of the same grade family: the model\'s coiled free length stands';

type Exclusion = SetCalibration['excluded'][number];

/** Why a record is not evidence for this spring, or null when it is. */
function exclusion(target: CalibrationTarget, r: PastFirstOff, u: UnitSystem): string | null {
  if (r.materialFamily !== target.materialFamily) return `another grade family (${r.materialFamily})`;
  if (r.distance > RULES.maxDistance.value) return `not similar enough (distance ${r.distance.toFixed(2)} > ${RULES.maxDistance.value})`;
  if (!r.model || r.model.expectedSet === null) return 'the model finds no coiled length for that job';
  if (r.model.expectedSet < RULES.minPredictedSet.value) {
    return `the model predicts ${mm(r.model.expectedSet, u)} of set for that job: too little to scale`;
  }
  return null;
}

function evidenceOf(r: PastFirstOff): SetEvidence {
  const m = r.model!;
  return {
    recordId: r.recordId, jobId: r.jobId, jobNumber: r.jobNumber, material: r.material, distance: r.distance,
    measuredOn: r.measuredOn, measuredBy: r.measuredBy, coiledFreeLength: r.coiledFreeLength,
    modelCoiledFreeLength: m.coiledFreeLength!, predictedSet: m.expectedSet!, measuredSet: r.coiledFreeLength - r.freeLengthAfterSet,
  };
}

/** The records that count, from the nearest jobs, and the ones looked at and left out. */
function selectEvidence(target: CalibrationTarget, past: readonly PastFirstOff[]): { used: SetEvidence[]; excluded: Exclusion[] } {
  const excluded: Exclusion[] = [];
  const eligible: PastFirstOff[] = [];
  for (const r of past) {
    const why = exclusion(target, r, target.units);
    if (why) excluded.push({ recordId: r.recordId, jobNumber: r.jobNumber, reason: why });
    else eligible.push(r);
  }
  eligible.sort((a, b) => a.distance - b.distance || a.jobId - b.jobId || a.recordId - b.recordId);
  const jobs = [...new Set(eligible.map((r) => r.jobId))].slice(0, RULES.nearestJobs.value);
  const used: SetEvidence[] = [];
  for (const r of eligible) {
    if (jobs.includes(r.jobId)) used.push(evidenceOf(r));
    else excluded.push({ recordId: r.recordId, jobNumber: r.jobNumber, reason: `not among the ${RULES.nearestJobs.value} nearest jobs with records` });
  }
  return { used, excluded };
}

function fitOf(used: readonly SetEvidence[]): SetFit | null {
  const f = ratioThroughOrigin(used.map((e) => ({ x: e.predictedSet, y: e.measuredSet })));
  if (!f) return null;
  return {
    method: 'least squares through the origin (measured set = ratio × predicted set)',
    ratio: f.ratio, residualSd: f.residualSd, relativeSpread: f.relativeSpread, records: f.n,
    jobs: new Set(used.map((e) => e.jobId)).size, weight: Math.min(1, f.n / RULES.recordsForFullWeight.value),
  };
}

interface Outcome { status: CalibrationStatus; reason: string; calibrated: SetCalibration['calibrated'] }

const stands = (reason: string): Outcome => ({ status: 'model', reason, calibrated: null });

/** Given a fit, the calibrated values, or why the model's value stands. */
function calibrate(model: SetModelValues, fit: SetFit | null, u: UnitSystem): Outcome {
  if (!fit) return stands(NO_RECORDS);
  if (fit.relativeSpread !== null && fit.relativeSpread > RULES.maxRelativeSpread.value) {
    return stands(`the records disagree too much to trust: their spread about the fit is ${pct(fit.relativeSpread)} of the typical predicted set `
      + `(limit ${pct(RULES.maxRelativeSpread.value)}): the model's coiled free length stands; check the records`);
  }
  const factor = 1 + fit.weight * (fit.ratio - 1);
  const expectedSet = model.expectedSet! * factor;
  const finishedDeflection = model.freeLength - model.solidLength;
  if (expectedSet > finishedDeflection) {
    return stands(`the records call for a set of ${mm(expectedSet, u)}, more than the deflection to solid after set removal (${mm(finishedDeflection, u)}): `
      + 'no coiled length is trusted that far from the model; the model\'s coiled free length stands');
  }
  const shared = fit.weight < 1 ? `${fit.records} of the ${RULES.recordsForFullWeight.value} records for full weight: moved ${pct(fit.weight)} of the way` : 'full weight';
  return {
    status: 'calibrated',
    reason: `${fit.records} first-off record(s) of ${fit.jobs} similar job(s) measured ${fit.ratio.toFixed(2)} × the predicted set (${shared})`,
    calibrated: { coiledFreeLength: model.freeLength + expectedSet, expectedSet },
  };
}

/** Why no calibration applies to this spring at all, or null when records may correct it. */
function notCalibratable(model: SetModelValues | null): Outcome | null {
  if (!model) return { status: 'not-applicable', reason: 'set removal and its first-off records apply to compression springs only', calibrated: null };
  if (model.coiledFreeLength === null || model.expectedSet === null) {
    return stands('the set-removal model finds no coiled free length for this spring (see the findings): records cannot calibrate a value the model does not give');
  }
  if (!model.required || model.expectedSet === 0) {
    return stands('the model expects no set for this spring (the stress at solid is within the allowable): coil to the free length');
  }
  return null;
}

/**
 * Corrects the model's coiled free length by the shop's own first-off results on similar springs of the
 * same grade family. The correction scales the expected set: calibrated set = expected set × (1 + w·(ratio − 1)),
 * and the coiled free length is the free length plus that set. It reads each record's set against the
 * model's expected set for its job, to first order: a record coiled a little off the model's length is
 * taken as having the same set.
 */
export function calibrateSet(target: CalibrationTarget, past: readonly PastFirstOff[]): SetCalibration {
  const u = target.units;
  const model = target.model;
  const base = {
    units: u, freeLength: model?.freeLength ?? null,
    model: { coiledFreeLength: model?.coiledFreeLength ?? null, expectedSet: model?.expectedSet ?? null },
  };
  const tail = { rules: calibrationRules(u), caution: CALIBRATION_CAUTION };
  const early = notCalibratable(model);
  if (early) return { ...early, ...base, fit: null, evidence: [], excluded: [], ...tail };
  const { used, excluded } = selectEvidence(target, past);
  const fit = fitOf(used);
  return { ...calibrate(model!, fit, u), ...base, fit, evidence: used, excluded, ...tail };
}

const calibrationQuantities: QuantityMap = {
  freeLength: 'length',
  model: { coiledFreeLength: 'length', expectedSet: 'length' },
  calibrated: { coiledFreeLength: 'length', expectedSet: 'length' },
  fit: { residualSd: 'length' },
  evidence: { coiledFreeLength: 'length', modelCoiledFreeLength: 'length', predictedSet: 'length', measuredSet: 'length' },
};

/** The calibration in the asked spring's own units, as shown and printed. */
export function calibrationInSpecUnits(c: SetCalibration): SetCalibration {
  return convertFields(c, calibrationQuantities, c.units, 'out');
}
