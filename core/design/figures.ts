import type { UnitSystem } from '../units';
import { fromInternal } from '../units';
import { findGrade } from '../materials';
import type { CompressionReport } from '../springs/compression/report';
import type { ExtensionReport } from '../springs/extension/report';
import type { CandidateFigures } from './types';

const len = (v: number, u: UnitSystem) => fromInternal(v, 'length', u);
const force = (v: number, u: UnitSystem) => fromInternal(v, 'force', u);

function common(r: CompressionReport | ExtensionReport, u: UnitSystem) {
  return {
    material: r.material, gradeName: findGrade(r.material)?.name ?? r.material,
    wireDiameter: len(r.wireDiameter, u), outerDiameter: len(r.outerDiameter, u), innerDiameter: len(r.innerDiameter, u),
    meanDiameter: len(r.meanDiameter, u), springIndex: r.springIndex, activeCoils: r.activeCoils,
    freeLength: len(r.freeLength, u), rate: fromInternal(r.rate, 'rate', u),
    forces: r.loads.map((l) => ({ length: len(l.length, u), force: force(l.force, u), asked: force(l.specifiedForce ?? l.force, u) })),
    wireLengthPerPiece: len(r.wireLength, u), massPerPiece: fromInternal(r.mass, 'mass', u),
    fatigueSafetyFactor: r.fatigue ? r.fatigue.goodmanSafetyFactor : null,
  };
}

export function compressionFigures(r: CompressionReport, u: UnitSystem, stressMargin: number, peened: boolean): CandidateFigures {
  return {
    ...common(r, u), ends: r.ends, totalCoils: r.totalCoils, solidLength: len(r.solidLength, u), initialTension: null,
    stressRatio: r.setRemoval.ratio, stressMargin, setRemoval: r.setRemoval.required, shotPeened: peened,
  };
}

export function extensionFigures(r: ExtensionReport, u: UnitSystem, stressMargin: number): CandidateFigures {
  return {
    ...common(r, u), ends: r.ends[0], totalCoils: r.bodyCoils, solidLength: null, initialTension: force(r.initialTension, u),
    stressRatio: null, stressMargin, setRemoval: false, shotPeened: false,
  };
}
