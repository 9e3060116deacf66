/** Axis scales with ticks on the 1-2-5 series, linear and logarithmic. Pure numbers, no markup. */

export interface Scale {
  kind: 'linear' | 'log';
  /** Data values at the two ends of the axis (already widened to tick values). */
  domain: [number, number];
  /** Drawing coordinates of the two ends. */
  range: [number, number];
  ticks: number[];
  map(value: number): number;
  label(value: number): string;
}

const series = [1, 2, 5, 10];

/** Smallest 1-2-5 step that divides `span` into at most `maxTicks` intervals. */
export function niceStep(span: number, maxTicks: number): number {
  const raw = Math.abs(span) / Math.max(1, maxTicks);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const factor = series.find((f) => f * magnitude >= raw * (1 - 1e-12)) ?? 10;
  return factor * magnitude;
}

/** Decimal places a tick label needs to show multiples of `step` exactly. */
export function stepDecimals(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

function snap(value: number, step: number): number {
  return Number((Math.round(value / step) * step).toFixed(stepDecimals(step)));
}

/** Tick values covering [min, max], widened outward to whole steps. */
export function linearTicks(min: number, max: number, maxTicks = 6): { step: number; values: number[] } {
  const [lo, hi] = min === max ? [min - 1, max + 1] : [Math.min(min, max), Math.max(min, max)];
  const step = niceStep(hi - lo, maxTicks);
  const first = Math.floor(lo / step + 1e-9);
  const last = Math.ceil(hi / step - 1e-9);
  const values: number[] = [];
  for (let i = first; i <= last; i++) values.push(snap(i * step, step));
  return { step, values };
}

export function linearScale(min: number, max: number, range: [number, number], maxTicks = 6): Scale {
  const { step, values } = linearTicks(min, max, maxTicks);
  const lo = values[0] ?? min;
  const hi = values[values.length - 1] ?? max;
  const decimals = stepDecimals(step);
  return {
    kind: 'linear', domain: [lo, hi], range, ticks: values,
    map: (v) => range[0] + ((v - lo) / (hi - lo)) * (range[1] - range[0]),
    label: (v) => v.toFixed(decimals),
  };
}

/** 1-2-5 values from the one at or below `min` to the one at or above `max`; decades only when wide. */
export function logTicks(min: number, max: number): number[] {
  const lo = Math.min(min, max);
  const hi = Math.max(min, max);
  const decades = Math.log10(hi / lo);
  const factors = decades > 3 ? [1] : [1, 2, 5];
  const candidates: number[] = [];
  for (let e = Math.floor(Math.log10(lo)) - 1; e <= Math.ceil(Math.log10(hi)) + 1; e++) {
    for (const f of factors) candidates.push(Number((f * 10 ** e).toPrecision(12)));
  }
  const start = candidates.filter((c) => c <= lo * (1 + 1e-9)).pop() ?? lo;
  const end = candidates.find((c) => c >= hi * (1 - 1e-9)) ?? hi;
  return candidates.filter((c) => c >= start && c <= end);
}

export function logScale(min: number, max: number, range: [number, number]): Scale {
  const [a, b] = min === max ? [min / 2, max * 2] : [min, max];
  const ticks = logTicks(a, b);
  const lo = ticks[0] ?? a;
  const hi = ticks[ticks.length - 1] ?? b;
  const span = Math.log10(hi / lo);
  return {
    kind: 'log', domain: [lo, hi], range, ticks,
    map: (v) => range[0] + (Math.log10(v / lo) / span) * (range[1] - range[0]),
    label: (v) => (v >= 1 ? v.toFixed(0) : String(v)),
  };
}
