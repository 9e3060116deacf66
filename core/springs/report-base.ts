import type { Finding } from '../result';
import type { QuantityMap } from '../units';
import type { StrengthBasis } from '../materials/types';

/** What every kind's report says about the wire and the coil. Internal units: mm, MPa. */
export interface CoilReport {
  units: 'metric' | 'inch';
  material: string;
  wireDiameter: number;
  springIndex: number;
  meanDiameter: number;
  outerDiameter: number;
  innerDiameter: number;
  tensileStrength: number;
  tensileStrengthBasis: StrengthBasis;
  elasticModulus: number;
  wireLength: number;
  mass: number;
  findings: Finding[];
}

export const coilReportQuantities: QuantityMap = {
  wireDiameter: 'length', meanDiameter: 'length', outerDiameter: 'length', innerDiameter: 'length',
  tensileStrength: 'stress', elasticModulus: 'stress', wireLength: 'length', mass: 'mass', springIndex: 'ratio',
};

