import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ratioThroughOrigin } from '../../core/process/ratio-fit';
import { calibrateSet, calibrationInSpecUnits } from '../../core/process/set-calibration';
import type { CalibrationTarget, PastFirstOff } from '../../core/process/set-calibration';
import { CALIBRATION_RULES } from '../../core/process/set-calibration-rules';
import type { SetModelValues } from '../../core/process/set-model-values';
import { MM_PER_IN } from '../../core/units';

describe('least squares through the origin', () => {
  // NIST Statistical Reference Datasets, linear regression, "NoInt1" (x = 60…70, y = 130…140) and "NoInt2"
  // (x = 4, 5, 6; y = 3, 4, 4): certified slope and residual standard deviation, model y = B1·x.
  it('reproduces the certified values of NIST StRD NoInt1', () => {
    const points = Array.from({ length: 11 }, (_, i) => ({ x: 60 + i, y: 130 + i }));
    const fit = ratioThroughOrigin(points)!;
    expect(fit.ratio).toBeCloseTo(2.07438016528926, 12);
    expect(fit.residualSd!).toBeCloseTo(3.56753034006338, 11);
  });

  it('reproduces the certified values of NIST StRD NoInt2', () => {
    const fit = ratioThroughOrigin([{ x: 4, y: 3 }, { x: 5, y: 4 }, { x: 6, y: 4 }])!;
    expect(fit.ratio).toBeCloseTo(0.727272727272727, 12);
    expect(fit.residualSd!).toBeCloseTo(0.369274472937998, 12);
  });

  it('has no spread with one point and no fit with none', () => {
    expect(ratioThroughOrigin([{ x: 2, y: 3 }])).toEqual({ ratio: 1.5, residualSd: null, relativeSpread: null, n: 1 });
    expect(ratioThroughOrigin([])).toBeNull();
  });
});

/** Invented springs (demo data): a 60 mm spring the model says to coil to 62 mm, 2 mm of set, solid 27 mm. */
const model = (expectedSet: number, freeLength = 60): SetModelValues => ({
  freeLength, solidLength: 27, coiledFreeLength: freeLength + expectedSet, expectedSet, required: expectedSet > 0,
});
const target: CalibrationTarget = { materialFamily: 'cold-drawn-carbon', units: 'metric', model: model(2) };

let nextId = 1;
/** A past record whose measured set is `ratio` × the model's predicted set for its job. */
function record(over: Partial<PastFirstOff> & { ratio: number; predicted?: number }): PastFirstOff {
  const id = nextId++;
  const predicted = over.predicted ?? 1.6;
  const m = over.model ?? model(predicted, 50);
  const coiled = m.coiledFreeLength ?? 52;
  return {
    recordId: id, jobId: over.jobId ?? 1000 + id, jobNumber: `J-DEMO-${id}`, material: 'en10270-1-sm', materialFamily: 'cold-drawn-carbon',
    distance: 0.4, measuredOn: '2026-05-04', measuredBy: 'R. Demo', coiledFreeLength: coiled,
    freeLengthAfterSet: coiled - over.ratio * (m.expectedSet ?? 0), model: m, ...over,
  };
}

describe('calibrating the coiled free length by first-off records', () => {
  it('keeps the model\'s value, and says why, without records', () => {
    const c = calibrateSet(target, []);
    expect(c.status).toBe('model');
    expect(c.calibrated).toBeNull();
    expect(c.model).toEqual({ coiledFreeLength: 62, expectedSet: 2 });
    expect(c.reason).toMatch(/no first-off records/);
    expect(c.evidence).toEqual([]);
  });

  it('moves toward the recorded data with each consistent record and reaches it with enough of them', () => {
    const full = CALIBRATION_RULES.recordsForFullWeight.value;
    const past: PastFirstOff[] = [];
    let gap = Infinity;
    for (let n = 1; n <= full + 2; n++) {
      past.push(record({ ratio: 1.4, predicted: 1 + 0.2 * n }));
      const c = calibrateSet(target, past);
      expect(c.status).toBe('calibrated');
      const next = Math.abs(c.calibrated!.expectedSet - 2 * 1.4);
      if (n <= full) expect(next).toBeLessThan(gap);
      gap = next;
      // The fit's ratio is the data's whatever the count: only the weight grows.
      expect(c.fit!.ratio).toBeCloseTo(1.4, 12);
      expect(c.fit!.weight).toBeCloseTo(Math.min(1, n / full), 12);
    }
    expect(gap).toBeLessThan(1e-12);
    const c = calibrateSet(target, past);
    expect(c.calibrated!.coiledFreeLength).toBeCloseTo(60 + 2.8, 12);
    expect(c.model.coiledFreeLength).toBe(62);
  });

  it('for any consistent records, lands between the model and the data, and on the data from full weight on', () => {
    const full = CALIBRATION_RULES.recordsForFullWeight.value;
    fc.assert(fc.property(
      fc.double({ min: 0.5, max: 2, noNaN: true }),
      fc.array(fc.double({ min: 0.1, max: 5, noNaN: true }), { minLength: 1, maxLength: 8 }),
      (ratio, predicted) => {
        const c = calibrateSet(target, predicted.map((p) => record({ ratio, predicted: p })));
        const set = c.calibrated!.expectedSet;
        expect(Math.min(2, 2 * ratio) - 1e-9).toBeLessThanOrEqual(set);
        expect(set).toBeLessThanOrEqual(Math.max(2, 2 * ratio) + 1e-9);
        if (predicted.length >= full) expect(set).toBeCloseTo(2 * ratio, 9);
      }), { numRuns: 200 });
  });

  it('moves a fraction records ÷ full weight of the way after fewer records', () => {
    const c = calibrateSet(target, [record({ ratio: 1.5 }), record({ ratio: 1.5, predicted: 2.2 })]);
    const w = 2 / CALIBRATION_RULES.recordsForFullWeight.value;
    expect(c.calibrated!.expectedSet).toBeCloseTo(2 * (1 + w * 0.5), 12);
  });

  it('is not changed at all by records of another grade family', () => {
    const own = [record({ ratio: 1.3 }), record({ ratio: 1.25, predicted: 2 }), record({ ratio: 1.35, predicted: 1.2 })];
    const other = [
      record({ ratio: 3, materialFamily: 'austenitic-stainless', material: 'en10270-3-1.4310', distance: 0.3 }),
      record({ ratio: 0.2, materialFamily: 'hardened-tempered', distance: 0 }),
    ];
    const alone = calibrateSet(target, own);
    const mixed = calibrateSet(target, [...other, ...own]);
    expect(mixed.calibrated).toEqual(alone.calibrated);
    expect(mixed.fit).toEqual(alone.fit);
    expect(mixed.evidence).toEqual(alone.evidence);
    expect(mixed.excluded.map((e) => e.recordId)).toEqual(other.map((r) => r.recordId));
    expect(mixed.excluded[0]!.reason).toMatch(/another grade family/);
    // Only other-family records: nothing to go on, the model stands.
    expect(calibrateSet(target, other).status).toBe('model');
  });

  it('lists as evidence exactly the records used, with the predicted and measured set of each', () => {
    const used = [record({ ratio: 1.2 }), record({ ratio: 1.1, predicted: 2.4 })];
    const far = record({ ratio: 1.2, distance: CALIBRATION_RULES.maxDistance.value + 0.01 });
    const noSet = record({ ratio: 1, model: model(0, 50) });
    const unreachable = record({ ratio: 1, model: { ...model(1, 50), coiledFreeLength: null, expectedSet: null } });
    const c = calibrateSet(target, [far, used[0]!, noSet, used[1]!, unreachable]);
    expect(c.evidence.map((e) => e.recordId)).toEqual(used.map((r) => r.recordId));
    expect(c.evidence.map((e) => [e.predictedSet, e.measuredSet])).toEqual(
      used.map((r) => [r.model!.expectedSet, r.coiledFreeLength - r.freeLengthAfterSet]));
    expect(c.evidence[0]).toMatchObject({ jobNumber: used[0]!.jobNumber, measuredBy: 'R. Demo', modelCoiledFreeLength: 51.6 });
    expect(c.excluded.map((e) => e.recordId).sort()).toEqual([far, noSet, unreachable].map((r) => r.recordId).sort());
    expect(c.fit!.records).toBe(2);
  });

  it('uses only the records of the nearest jobs', () => {
    const n = CALIBRATION_RULES.nearestJobs.value;
    const past = Array.from({ length: n + 2 }, (_, i) => record({ ratio: 1.2, distance: 0.1 * (n + 2 - i) }));
    const c = calibrateSet(target, past);
    expect(c.evidence).toHaveLength(n);
    expect(c.excluded.map((e) => e.recordId).sort()).toEqual([past[0]!.recordId, past[1]!.recordId].sort());
    expect(Math.max(...c.evidence.map((e) => e.distance))).toBeLessThan(past[1]!.distance);
  });

  it('keeps the model\'s value when the records disagree too much to trust', () => {
    const c = calibrateSet(target, [record({ ratio: 0.6 }), record({ ratio: 1.9 }), record({ ratio: 1.2 })]);
    expect(c.fit!.relativeSpread!).toBeGreaterThan(CALIBRATION_RULES.maxRelativeSpread.value);
    expect(c.status).toBe('model');
    expect(c.calibrated).toBeNull();
    expect(c.reason).toMatch(/disagree too much/);
    expect(c.evidence).toHaveLength(3);
  });

  it('keeps the model\'s value for a spring the model expects no set on, or finds no coiled length for', () => {
    const past = [record({ ratio: 1.5 })];
    const none = calibrateSet({ ...target, model: model(0) }, past);
    expect(none.status).toBe('model');
    expect(none.reason).toMatch(/expects no set/);
    const unreachable = calibrateSet({ ...target, model: { ...model(2), coiledFreeLength: null, expectedSet: null } }, past);
    expect(unreachable.reason).toMatch(/finds no coiled free length/);
    expect(calibrateSet({ ...target, model: null }, past).status).toBe('not-applicable');
  });

  it('refuses a calibrated set beyond the deflection to solid', () => {
    const past = Array.from({ length: 5 }, () => record({ ratio: 20 }));
    const c = calibrateSet(target, past);
    expect(c.status).toBe('model');
    expect(c.reason).toMatch(/more than the deflection to solid/);
  });

  it('converts to the asked spring\'s units at the edge', () => {
    const inch = calibrateSet({ ...target, units: 'inch' }, [record({ ratio: 1.2 })]);
    const out = calibrationInSpecUnits(inch);
    expect(out.model.coiledFreeLength).toBeCloseTo(62 / MM_PER_IN, 12);
    expect(out.calibrated!.coiledFreeLength).toBeCloseTo(inch.calibrated!.coiledFreeLength / MM_PER_IN, 12);
    expect(out.evidence[0]!.measuredSet).toBeCloseTo(inch.evidence[0]!.measuredSet / MM_PER_IN, 12);
    expect(out.fit!.ratio).toBe(inch.fit!.ratio);
  });
});
