/**
 * Random valid specs and jobs over the whole of each bound, for the property tests and the fuzz bench.
 * Values are drawn in internal units (log-uniform where a range spans decades) and written in the spec's
 * units, then kept only when parseSpec accepts them. DEMO DATA: every customer and part is invented.
 */
import fc from 'fast-check';
import { gradeSummaries } from '../../core/materials';
import { ISO_2859_AQLS, parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { fromInternal } from '../../core/units';
import type { Quantity, UnitSystem } from '../../core/units';

const grades = gradeSummaries().map((g) => g.id);

/** Log-uniform between lo and hi. */
const logBetween = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.min(hi, Math.max(lo, Math.exp(x))));
const share = (lo = 0.02, hi = 0.98) => fc.double({ min: lo, max: hi, noNaN: true });

type Raw = Record<string, unknown>;

const out = (units: UnitSystem) => (v: number, q: Quantity) => fromInternal(v, q, units);

const orderFields = (units: UnitSystem) => fc.record({
  quantities: fc.option(fc.uniqueArray(fc.integer({ min: 1, max: 10_000_000 }), { minLength: 1, maxLength: 4 }), { nil: undefined }),
  aql: fc.option(fc.constantFrom(...ISO_2859_AQLS), { nil: undefined }),
  toleranceGrade: fc.option(fc.constantFrom(1, 2, 3), { nil: undefined }),
  temps: fc.option(fc.tuple(fc.double({ min: -273, max: 1200, noNaN: true }), fc.double({ min: -273, max: 1200, noNaN: true })), { nil: undefined }),
  finish: fc.option(fc.constantFrom('zinc', 'oil', 'none', 'black oxide (demo)'), { nil: undefined }),
}).map((o): Raw => ({
  ...(o.quantities ? { quantities: o.quantities } : {}),
  ...(o.aql !== undefined ? { aql: o.aql } : {}),
  ...(o.toleranceGrade ? { toleranceGrade: o.toleranceGrade } : {}),
  ...(o.finish ? { finish: o.finish } : {}),
  ...(o.temps ? { serviceTemperature: { min: out(units)(Math.min(...o.temps), 'temperature'), max: out(units)(Math.max(...o.temps), 'temperature') } } : {}),
}));

/** Wire, index and one coil diameter: every kind's body. */
const body = fc.record({
  units: fc.constantFrom<UnitSystem>('metric', 'inch'),
  material: fc.constantFrom(...grades),
  d: logBetween(0.02, 100),
  index: logBetween(2.05, 40),
  given: fc.constantFrom('outerDiameter', 'innerDiameter', 'meanDiameter'),
  overrides: fc.option(fc.record({
    tensileStrength: fc.double({ min: 100, max: 4500, noNaN: true }),
    density: fc.double({ min: 1.5, max: 22, noNaN: true }),
  }), { nil: undefined }),
}).filter((b) => b.d * (b.index + 1) <= 3000);

function bodyFields(b: { units: UnitSystem; material: string; d: number; index: number; given: string; overrides?: { tensileStrength: number; density: number } | undefined }): Raw {
  const o = out(b.units);
  const D = b.d * b.index;
  const diameter = b.given === 'outerDiameter' ? D + b.d : b.given === 'innerDiameter' ? D - b.d : D;
  return {
    units: b.units, material: b.material, wireDiameter: o(b.d, 'length'), [b.given]: o(diameter, 'length'),
    ...(b.overrides ? { materialOverrides: {
      tensileStrength: o(b.overrides.tensileStrength, 'stress'), density: o(b.overrides.density, 'density'),
    } } : {}),
  };
}

/**
 * One cyclic duty in twenty has a hairline stroke: a second length a few units in the last place from the first,
 * different as typed but not, after unit conversion and rounding, in stress (no alternating stress at all).
 */
const hairline = fc.nat({ max: 19 }).map((n) => n === 0);
const strokeEnds = (first: number, other: () => number, hair: boolean): [number, number] =>
  [first, hair ? first * (1 - 4 * Number.EPSILON) : other()];

const cyclic = fc.record({ cycles: logBetween(1, 1e12), peened: fc.boolean(), frequency: fc.option(logBetween(1e-6, 20_000), { nil: undefined }) });

const compression = fc.record({
  b: body, ends: fc.constantFrom('closed-ground', 'closed', 'open-ground', 'open'), nt: logBetween(3, 5000), stretch: logBetween(1.02, 8),
  loads: fc.array(fc.record({ at: share(), force: fc.option(logBetween(1e-3, 1e6), { nil: undefined }) }), { maxLength: 3 }),
  duty: fc.option(fc.tuple(share(), share(), cyclic, hairline), { nil: undefined }), order: fc.constantFrom('metric', 'inch').chain((u) => orderFields(u as UnitSystem)),
}).map(({ b, ends, nt, stretch, loads, duty, order }): Raw => {
  const o = out(b.units);
  const L0 = Math.min(20_000, (nt + 1) * b.d * stretch);
  return {
    kind: 'compression', ...bodyFields(b), ends, totalCoils: nt, freeLength: o(L0, 'length'),
    loads: loads.map((l) => ({ length: o(L0 * l.at, 'length'), ...(l.force ? { force: o(l.force, 'force') } : {}) })),
    ...(duty ? { duty: { type: 'cyclic', between: strokeEnds(o(L0 * Math.max(duty[0], duty[1]), 'length'), () => o(L0 * Math.min(duty[0], duty[1]) * 0.99, 'length'), duty[3]), ...duty[2] } } : {}),
    ...order,
  };
});

const extensionEnd = fc.oneof(
  fc.constantFrom('machine-loop', 'full-loop', 'crossover-loop', 'side-loop'),
  fc.record({ form: fc.constant('extended-hook'), extension: logBetween(0.1, 500) }),
);

const extension = fc.record({
  b: body, n: logBetween(1, 5000), ends: fc.tuple(extensionEnd, extensionEnd), it: fc.option(logBetween(1e-3, 1e5), { nil: undefined }),
  loads: fc.array(fc.record({ stretch: logBetween(1.001, 3), force: fc.option(logBetween(1e-3, 1e6), { nil: undefined }) }), { maxLength: 3 }),
  duty: fc.option(fc.tuple(logBetween(1.001, 2), logBetween(1.001, 2), cyclic, hairline), { nil: undefined }),
  loopAngle: fc.option(fc.double({ min: 0, max: 360, noNaN: true }), { nil: undefined }),
  order: orderFields('metric'),
}).map(({ b, n, ends, it, loads, duty, loopAngle, order }): Raw => {
  const o = out(b.units);
  const scale = (n + 1) * b.d + 2 * b.d * b.index;
  const end = (e: unknown) => (typeof e === 'string' ? e : { ...(e as Raw), extension: o((e as { extension: number }).extension * b.d, 'length') });
  const between = duty && strokeEnds(o(Math.min(20_000, scale * duty[0]), 'length'), () => o(Math.min(20_000, scale * duty[1]), 'length'), duty[3]);
  return {
    kind: 'extension', ...bodyFields(b), bodyCoils: n, ends: [end(ends[0]), end(ends[1])],
    ...(it !== undefined ? { initialTension: o(it, 'force') } : {}),
    loads: loads.map((l) => ({ length: o(Math.min(20_000, scale * l.stretch), 'length'), ...(l.force ? { force: o(l.force, 'force') } : {}) })),
    ...(duty && between && between[0] !== between[1] ? { duty: { type: 'cyclic', between, ...duty[2] } } : {}),
    ...(loopAngle !== undefined ? { loopAngle } : {}),
    ...order,
  };
});

const torsion = fc.record({
  b: body, n: logBetween(0.25, 5000), legs: fc.tuple(logBetween(0.01, 20_000), logBetween(0.01, 20_000)),
  forms: fc.tuple(fc.constantFrom('tangent', 'radial', 'hooked'), fc.constantFrom('tangent', 'radial', 'hooked')),
  wind: fc.constantFrom('right', 'left'), direction: fc.constantFrom('closing', 'opening'),
  arbor: fc.option(share(0.1, 0.95), { nil: undefined }),
  loads: fc.array(fc.record({ angle: fc.double({ min: 0.01, max: 3600, noNaN: true }), torque: fc.option(logBetween(1e-3, 1e8), { nil: undefined }) }), { maxLength: 3 }),
  duty: fc.option(fc.tuple(fc.double({ min: 0, max: 3600, noNaN: true }), fc.double({ min: 0, max: 3600, noNaN: true }), cyclic), { nil: undefined }),
  freeAngle: fc.option(fc.double({ min: 0, max: 360, noNaN: true }), { nil: undefined }),
  order: orderFields('metric'),
}).map(({ b, n, legs, forms, wind, direction, arbor, loads, duty, freeAngle, order }): Raw => {
  const o = out(b.units);
  const inside = b.d * b.index - b.d;
  return {
    kind: 'torsion', ...bodyFields(b), bodyCoils: n, windDirection: wind, loadDirection: direction,
    legs: [{ length: o(legs[0], 'length'), form: forms[0] }, { length: o(legs[1], 'length'), form: forms[1] }],
    ...(arbor !== undefined && inside * arbor >= 0.05 ? { arborDiameter: o(inside * arbor, 'length') } : {}),
    loads: loads.map((l) => ({ angle: l.angle, ...(l.torque ? { torque: o(l.torque, 'torque') } : {}) })),
    ...(duty && duty[0] !== duty[1] ? { duty: { type: 'cyclic', between: [duty[0], duty[1]], ...duty[2] } } : {}),
    ...(freeAngle !== undefined ? { freeAngle } : {}),
    ...order,
  };
});

/** A raw spec of any kind that parseSpec accepts. */
export const validSpecInput = fc.oneof(compression, extension, torsion).filter((raw) => parseSpec(raw).ok);

export const validSpec = validSpecInput.map((raw): Spec => {
  const r = parseSpec(raw);
  if (!r.ok) throw new Error('filtered above');
  return r.value;
});

/** A job file as `jobs add`, `sheet` and `print` read it, with long texts as a customer might type them. */
const typed = (max: number, min = 0) => fc.string({ minLength: min, maxLength: max }).map((t) => t.replace(/NaN|Infinity|∞/g, '~'));

export const validJobFile = fc.record({
  spec: validSpecInput,
  customer: fc.option(fc.record({ name: typed(120, 1).filter((s) => s.trim().length > 0) }), { nil: undefined }),
  partNumber: typed(64),
  drawing: typed(64),
  revision: typed(16),
  notes: typed(4000),
  orderQuantity: fc.integer({ min: 1, max: 10_000_000 }),
});

/** Paths of every number in `value` that is NaN or ±∞ ("report.rate", "breaks[2].unitPrice"). */
export function nonFiniteNumbers(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path || '(value)'];
  if (typeof value === 'string') return /\b(NaN|-?Infinity)\b|∞/.test(value) ? [`${path} (text "${value.slice(0, 60)}")`] : [];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFiniteNumbers(v, `${path}[${i}]`));
  if (typeof value === 'object' && value !== null) {
    return Object.entries(value).flatMap(([k, v]) => nonFiniteNumbers(v, path ? `${path}.${k}` : k));
  }
  return [];
}
