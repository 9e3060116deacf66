/**
 * Least squares through the origin: y ≈ b·x, b = Σxy ÷ Σx², with the residual standard deviation
 * s = √(Σ(y − b·x)² ÷ (n − 1)) (one fitted parameter). Through the origin because a spring the model
 * expects to take no set takes none; least squares rather than the mean of the ratios y/x because a
 * small set gives a ratio dominated by the gauge's reading error, and least squares weighs each record
 * by the size of its set.
 */
export interface RatioFit {
  ratio: number;
  /** Null with a single point: no spread can be measured. */
  residualSd: number | null;
  /** residualSd ÷ the root mean square of x: the scatter as a fraction of a typical x. */
  relativeSpread: number | null;
  n: number;
}

export function ratioThroughOrigin(points: readonly { x: number; y: number }[]): RatioFit | null {
  let sxy = 0;
  let sxx = 0;
  for (const p of points) {
    sxy += p.x * p.y;
    sxx += p.x * p.x;
  }
  const n = points.length;
  if (n === 0 || !(sxx > 0)) return null;
  const ratio = sxy / sxx;
  if (n < 2) return { ratio, residualSd: null, relativeSpread: null, n };
  let sse = 0;
  for (const p of points) sse += (p.y - ratio * p.x) ** 2;
  const residualSd = Math.sqrt(sse / (n - 1));
  return { ratio, residualSd, relativeSpread: residualSd / Math.sqrt(sxx / n), n };
}
