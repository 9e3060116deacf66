import type { z } from 'zod';
import type { Quantity, UnitSystem } from '../units';
import { fromInternal, toInternal, unitSymbol } from '../units';
import { significant } from '../format';
import { generatedFunction, literal } from '../generated-code';

/**
 * The plausible range of every number a spec carries, in internal units (mm, N, N·mm, MPa, g/cm³, °C,
 * Hz), each with the reason it ends there. A value outside is not a spring any shop makes or any
 * standard covers, and it would make the calculation, the drawing or the price meaningless, so the
 * schema refuses it with the field's path. Ranges are generous on purpose: the review, not the schema,
 * judges what is unwise.
 */
export interface Bound {
  quantity: Quantity;
  min: number;
  max: number;
  /** The value must be above `min`, not equal to it. */
  minExclusive?: boolean;
  reason: string;
}

export const specBounds = {
  wireDiameter: {
    quantity: 'length', min: 0.02, max: 100,
    reason: 'spring wire is drawn from about 0.02 mm (EN 10270-3 and ASTM A313 fine sizes start near 0.05 mm) and bar is hot coiled up to about 100 mm (common trade practice)',
  },
  coilDiameter: {
    quantity: 'length', min: 0.05, max: 3000,
    reason: 'coil diameters run from a few hundredths of a millimetre (micro springs) to about 3 m (hot-coiled railway and press springs); common trade practice',
  },
  coils: {
    quantity: 'count', min: 0.25, max: 5000,
    reason: 'a quarter turn is the least a torsion body has; no coiler winds more than a few thousand coils in one part (common trade practice)',
  },
  length: {
    quantity: 'length', min: 0.01, max: 20000,
    reason: 'lengths of springs, legs, hooks and working positions: from 0.01 mm to 20 m, beyond any coiler or test rig (common trade practice)',
  },
  loopGap: {
    quantity: 'length', min: 0, max: 1000,
    reason: 'a loop opening is at most of the order of the coil diameter; 1 m is far past any made (common trade practice)',
  },
  bendRadius: {
    quantity: 'length', min: 0.01, max: 3000,
    reason: 'a bend radius is between a fraction of the wire and the coil diameter (common trade practice)',
  },
  force: {
    quantity: 'force', min: 0.0001, max: 10_000_000,
    reason: 'from 0.1 mN (micro springs) to 10 MN (the largest hot-coiled springs and test frames); common trade practice',
  },
  initialTension: {
    quantity: 'force', min: 0, max: 1_000_000,
    reason: 'initial tension is a share of the largest extension-spring loads; 1 MN is far past any (common trade practice)',
  },
  torque: {
    quantity: 'torque', min: 0.0001, max: 1_000_000_000,
    reason: 'from 0.1 µN·m (watch and instrument springs) to 1 MN·m; common trade practice',
  },
  shearModulus: {
    quantity: 'stress', min: 20_000, max: 120_000,
    reason: 'spring metals lie between about 40 GPa (titanium and copper alloys) and 82 GPa (steels); EN 13906-1 Table 3, with a margin either side',
  },
  elasticModulus: {
    quantity: 'stress', min: 50_000, max: 320_000,
    reason: 'spring metals lie between about 100 GPa (titanium and copper alloys) and 215 GPa (steels, nickel alloys); EN 13906-1 Table 3, with a margin either side',
  },
  tensileStrength: {
    quantity: 'stress', min: 100, max: 4500,
    reason: 'no spring wire is weaker than annealed copper alloy (a few hundred MPa) or stronger than the finest patented wire (EN 10270-1 tables top out near 3500 MPa); margin either side',
  },
  density: {
    quantity: 'density', min: 1.5, max: 22,
    reason: 'metals from magnesium (1.7 g/cm³) to tungsten (19.3 g/cm³); spring wires are 4.4–8.9 g/cm³',
  },
  temperature: {
    quantity: 'temperature', min: -273.15, minExclusive: true, max: 1200,
    reason: 'above absolute zero (−273.15 °C); no spring wire keeps its strength above 1200 °C (the grades\' own limits are checked by the review)',
  },
  cycles: {
    quantity: 'count', min: 1, max: 1e12,
    reason: 'at least one load cycle; 10¹² is past any test or service life a fatigue diagram covers (EN 13906-1 diagrams stop at 10⁷)',
  },
  frequency: {
    quantity: 'frequency', min: 0.000001, max: 20_000,
    reason: 'from one cycle in days to 20 kHz, beyond any spring\'s surge frequency (common trade practice)',
  },
  orderQuantity: {
    quantity: 'count', min: 1, max: 10_000_000,
    reason: 'one piece to ten million: larger orders are split into call-offs (common trade practice)',
  },
} as const satisfies Record<string, Bound>;

export type BoundName = keyof typeof specBounds;

/**
 * ISO 2859-1 preferred AQL values (percent nonconforming, or nonconformities per hundred units from 15 up),
 * as the standard's tables head their columns. An AQL is one of these or it has no sampling plan.
 */
export const ISO_2859_AQLS = [
  0.010, 0.015, 0.025, 0.040, 0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10, 15, 25, 40, 65,
  100, 150, 250, 400, 650, 1000,
] as const;

/** Which bound each field of a spec obeys; nested objects and arrays follow the map as QuantityMap does. */
export type BoundsMap = { [field: string]: BoundName | BoundsMap };

export const coilBodyBounds: BoundsMap = {
  wireDiameter: 'wireDiameter', outerDiameter: 'coilDiameter', innerDiameter: 'coilDiameter', meanDiameter: 'coilDiameter',
  materialOverrides: { shearModulus: 'shearModulus', elasticModulus: 'elasticModulus', tensileStrength: 'tensileStrength', density: 'density' },
  serviceTemperature: { min: 'temperature', max: 'temperature' },
  quantities: 'orderQuantity',
};

const linearDuty: BoundsMap = { between: 'length', cycles: 'cycles', frequency: 'frequency' };

export const kindBounds: Record<'compression' | 'extension' | 'torsion', BoundsMap> = {
  compression: {
    ...coilBodyBounds, totalCoils: 'coils', activeCoils: 'coils', freeLength: 'length',
    loads: { length: 'length', force: 'force' }, duty: linearDuty,
  },
  extension: {
    ...coilBodyBounds, bodyCoils: 'coils', freeLength: 'length', bodyLength: 'length', initialTension: 'initialTension',
    ends: { gap: 'loopGap', extension: 'length', bendRadius: 'bendRadius' },
    loads: { length: 'length', force: 'force' }, duty: linearDuty,
  },
  torsion: {
    ...coilBodyBounds, bodyCoils: 'coils', arborDiameter: 'coilDiameter',
    legs: { length: 'length', bendRadius: 'bendRadius' }, loads: { torque: 'torque' },
    duty: { cycles: 'cycles', frequency: 'frequency' },
  },
};

const shown = (internal: number, b: Bound, units: UnitSystem): string => {
  const symbol = unitSymbol(b.quantity, units);
  return `${significant(fromInternal(internal, b.quantity, units))}${symbol ? ` ${symbol}` : ''}`;
};

/** The message for a value outside its bound, in the spec's own units. */
export function outsideMessage(b: Bound, units: UnitSystem): string {
  const low = b.minExclusive ? `above ${shown(b.min, b, units)}` : `at least ${shown(b.min, b, units)}`;
  return `must be ${low} and at most ${shown(b.max, b, units)}: ${b.reason}`;
}

export function withinBound(value: number, b: Bound, units: UnitSystem): boolean {
  const v = toInternal(value, b.quantity, units);
  const aboveMin = b.minExclusive ? v > b.min : v >= b.min * (1 - 1e-12);
  return aboveMin && v <= b.max * (1 + 1e-12);
}

type Issue = { path: PropertyKey[]; message: string };

/** A bounds map with its nested maps as Map lookups, built once per map: specs are checked on every parse. */
type CompiledBounds = Map<string, BoundName | CompiledBounds>;

const compiledMaps = new WeakMap<BoundsMap, CompiledBounds>();

function compiled(map: BoundsMap): CompiledBounds {
  let c = compiledMaps.get(map);
  if (!c) {
    c = new Map(Object.keys(map).map((key) => {
      const sub = map[key]!;
      return [key, typeof sub === 'string' ? sub : compiled(sub)] as const;
    }));
    compiledMaps.set(map, c);
  }
  return c;
}

/** Walks `value` with the path so far on `path` (pushed and popped, copied only for an issue). */
function walk(value: unknown, map: BoundName | CompiledBounds, path: PropertyKey[], units: UnitSystem, out: Issue[]): void {
  if (value === null || value === undefined) return;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      path.push(i);
      walk(value[i], map, path, units, out);
      path.pop();
    }
    return;
  }
  if (typeof map === 'string') {
    const b: Bound = specBounds[map];
    if (typeof value === 'number' && !withinBound(value, b, units)) out.push({ path: path.slice(), message: outsideMessage(b, units) });
    return;
  }
  if (typeof value !== 'object') return;
  const object = value as Record<string, unknown>;
  const keys = Object.keys(object);
  for (let i = 0; i < keys.length; i++) {
    const sub = map.get(keys[i]!);
    if (sub === undefined) continue;
    path.push(keys[i]!);
    walk(object[keys[i]!], sub, path, units, out);
    path.pop();
  }
}

type WithinAll = (value: unknown) => boolean;

/**
 * Whether every number the map names is within its bound, written out per map and unit system (each field
 * read by name); undefined where the runtime compiles no code. Only a spec with a value out of range then
 * takes the walk that names the paths.
 */
function generatedWithin(map: BoundsMap, units: UnitSystem): WithinAll | undefined {
  const keys = Object.keys(map);
  const inner = keys.map((key) => {
    const sub = map[key]!;
    return typeof sub === 'string' ? undefined : withinAllFor(sub, units);
  });
  if (inner.some((f, i) => f === undefined && typeof map[keys[i]!] !== 'string')) return undefined;
  const lines = keys.map((key, i) => {
    // A list inside a list is left to the walk (it never passes the schema where a number is due).
    const test = typeof map[key] === 'string' ? `(typeof x === "number" ? within(x, B[${i}], units) : !Array.isArray(x))` : `S[${i}](x)`;
    return [
      `  v = object[${literal(key)}];`,
      '  if (v !== null && v !== undefined) {',
      `    if (Array.isArray(v)) { for (let i = 0; i < v.length; i++) { const x = v[i]; if (x !== null && x !== undefined && !${test}) return false; } }`,
      `    else { const x = v; if (!${test}) return false; }`,
      '  }',
    ].join('\n');
  });
  return generatedFunction<WithinAll>({
    within: withinBound, units, S: inner, B: keys.map((key) => (typeof map[key] === 'string' ? specBounds[map[key] as BoundName] : undefined)),
  }, [
    'return function withinAll(object) {',
    '  if (object === null || typeof object !== "object" || Array.isArray(object)) return true;',
    '  let v;',
    ...lines,
    '  return true;',
    '};',
  ].join('\n'));
}

const withinAlls = new WeakMap<BoundsMap, Map<UnitSystem, WithinAll | undefined>>();

function withinAllFor(map: BoundsMap, units: UnitSystem): WithinAll | undefined {
  let byUnits = withinAlls.get(map);
  if (!byUnits) {
    byUnits = new Map();
    withinAlls.set(map, byUnits);
  }
  if (!byUnits.has(units)) byUnits.set(units, generatedWithin(map, units));
  return byUnits.get(units);
}

/** Every number of `spec` outside its bound, with its path. */
export function boundsIssues(spec: { units: UnitSystem }, map: BoundsMap): Issue[] {
  const out: Issue[] = [];
  if (withinAllFor(map, spec.units)?.(spec)) return out;
  walk(spec, compiled(map), [], spec.units, out);
  return out;
}

/** The schema-side check: a superRefine that adds one issue per value out of bounds. */
export const checkBounds = (map: BoundsMap) => (spec: { units: UnitSystem }, ctx: z.RefinementCtx): void => {
  for (const issue of boundsIssues(spec, map)) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message, params: { code: 'out-of-range' } });
};

/**
 * Poisson's ratio ν = E/(2G) − 1 the shear and elastic moduli imply. Spring metals lie between about 0.26
 * and 0.36 (EN 13906-1 Table 3 pairs G and E so); outside the wide range below, one of the two moduli is
 * wrong (often a certificate value in the wrong unit), and the buckling and rate checks lose meaning.
 */
export const POISSON_RATIO = { min: 0.1, max: 0.49, reason: 'ν = E/(2G) − 1 of spring metals lies near 0.3 (EN 13906-1 Table 3)' } as const;
