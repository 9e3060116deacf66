/**
 * Approximate hardness for a tensile strength, for the specifications that set their limits in HV or
 * HRC. Conversions are approximate by nature: a measured hardness, where one is given, always wins.
 */
export interface HardnessEstimate {
  hrc: number;
  hv: number;
  /** 'at-least' / 'at-most': the strength lies beyond the conversion points; the value is that end point. */
  bound: 'exact' | 'at-least' | 'at-most';
  /** True for a measured or specified hardness, false for a conversion. */
  measured: boolean;
  source: string;
}

type Points = readonly (readonly [number, number])[];

/** The ≈HRC column printed beside the ASTM B850 bake chart: band edges in MPa against HRC. */
export const tensileToHrc = {
  source: 'the ≈HRC column of the ASTM B850 bake chart as published by sonicplatinginc.com; approximate',
  verified: false,
  points: [[1000, 31], [1100, 33], [1200, 36], [1300, 39], [1400, 43], [1500, 45], [1600, 47], [1700, 49], [1800, 51]] as Points,
} as const;

/** HRC against HV for non-austenitic steels. */
export const hrcToHv = {
  source: 'ASTM E140 (HRC–HV, non-austenitic steels), from memory; approximate',
  verified: false,
  points: [
    [30, 302], [31, 310], [32, 318], [33, 327], [34, 336], [35, 345], [36, 354], [37, 364], [38, 373], [39, 382],
    [40, 392], [41, 402], [42, 412], [43, 423], [44, 434], [45, 446], [46, 458], [47, 471], [48, 484], [49, 498],
    [50, 513], [51, 528], [52, 544], [53, 560], [54, 577], [55, 595], [56, 613], [57, 633], [58, 653],
  ] as Points,
} as const;

/**
 * Near a threshold the conversion decides nothing: the B850 chart and ISO 18265 (from memory) differ by
 * up to about 2 HRC around 1300 MPa. A tool margin, not a value from any source.
 */
export const BORDERLINE_HRC = 2;

/** Piecewise-linear reading of ascending points, clamped at the ends. */
function read(points: Points, x: number, column: 0 | 1): { y: number; bound: HardnessEstimate['bound'] } {
  const other = column === 0 ? 1 : 0;
  const first = points[0] as readonly [number, number];
  const last = points[points.length - 1] as readonly [number, number];
  if (x < first[column]) return { y: first[other], bound: 'at-most' };
  if (x > last[column]) return { y: last[other], bound: 'at-least' };
  const i = points.findIndex((p) => p[column] >= x);
  const hi = points[i] as readonly [number, number];
  const lo = points[Math.max(0, i - 1)] as readonly [number, number];
  const t = hi[column] === lo[column] ? 0 : (x - lo[column]) / (hi[column] - lo[column]);
  return { y: lo[other] + t * (hi[other] - lo[other]), bound: 'exact' };
}

export function hardnessFromTensile(tensileStrength: number): HardnessEstimate {
  const hrc = read(tensileToHrc.points, tensileStrength, 0);
  return {
    hrc: hrc.y, hv: read(hrcToHv.points, hrc.y, 0).y, bound: hrc.bound, measured: false,
    source: 'approximate conversion: B850 chart ≈HRC column (sonicplatinginc.com), then ASTM E140 HRC–HV from memory',
  };
}

export function hardnessFromHv(hv: number): HardnessEstimate {
  const hrc = read(hrcToHv.points, hv, 1);
  return { hrc: hrc.y, hv, bound: 'exact', measured: true, source: 'stated hardness; HRC by ASTM E140 from memory' };
}

/** Whether an estimate could lie on either side of a threshold given in HRC. */
export function isBorderline(h: HardnessEstimate, thresholdHrc: number): boolean {
  return !h.measured && h.bound === 'exact' && Math.abs(h.hrc - thresholdHrc) <= BORDERLINE_HRC;
}

/** HV threshold expressed in HRC, for the borderline test. */
export const hvAsHrc = (hv: number): number => read(hrcToHv.points, hv, 1).y;
