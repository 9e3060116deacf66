import { generatedFunction, literal } from './generated-code';

/**
 * Unit systems. Internally everything is mm, N, MPa, N/mm, N·mm, degrees, seconds, kg, kg/dm³ (= g/cm³)
 * and °C. A spec carries its own system; values convert on the way in and on the way out, nowhere else.
 */
export type UnitSystem = 'metric' | 'inch';

export type Quantity =
  | 'length' | 'force' | 'stress' | 'rate' | 'torque' | 'torqueRatePerTurn' | 'torqueRatePerDegree'
  | 'mass' | 'density' | 'temperature' | 'frequency' | 'angle' | 'count' | 'ratio' | 'percent'
  | 'energy' | 'time' | 'lengthLong' | 'massBulk' | 'minutes' | 'days' | 'money' | 'ordinal' | 'figure'
  | 'perHour' | 'stockLength' | 'stockMass';

// Exact definitions: 1 in = 25.4 mm; 1 lbf = 4.4482216152605 N; 1 lb = 0.45359237 kg (NIST SP 811, Appendix B).
export const MM_PER_IN = 25.4;
export const N_PER_LBF = 4.4482216152605;
export const KG_PER_LB = 0.45359237;
export const MPA_PER_PSI = N_PER_LBF / (MM_PER_IN * MM_PER_IN);
const CM3_PER_IN3 = (MM_PER_IN / 10) ** 3;

interface UnitDef { factor: number; offset?: number; symbol: string }

const metric: Record<Quantity, UnitDef> = {
  length: { factor: 1, symbol: 'mm' },
  lengthLong: { factor: 1000, symbol: 'm' },
  force: { factor: 1, symbol: 'N' },
  stress: { factor: 1, symbol: 'MPa' },
  rate: { factor: 1, symbol: 'N/mm' },
  torque: { factor: 1, symbol: 'N·mm' },
  torqueRatePerTurn: { factor: 1, symbol: 'N·mm/turn' },
  torqueRatePerDegree: { factor: 1, symbol: 'N·mm/°' },
  mass: { factor: 0.001, symbol: 'g' },
  massBulk: { factor: 1, symbol: 'kg' },
  density: { factor: 1, symbol: 'g/cm³' },
  temperature: { factor: 1, symbol: '°C' },
  frequency: { factor: 1, symbol: 'Hz' },
  angle: { factor: 1, symbol: '°' },
  count: { factor: 1, symbol: '' },
  ratio: { factor: 1, symbol: '' },
  percent: { factor: 1, symbol: '%' },
  energy: { factor: 1, symbol: 'N·mm' },
  time: { factor: 1, symbol: 's' },
  minutes: { factor: 1, symbol: 'min' },
  days: { factor: 1, symbol: 'd' },
  // Money is in the shop's currency, named beside it; a unit system does not change it.
  money: { factor: 1, symbol: '' },
  /** A number that names rather than measures: a grade, a sequence number, a format version. */
  ordinal: { factor: 1, symbol: '' },
  /** A figure's natural size in drawing units; only its aspect ratio is used. */
  figure: { factor: 1, symbol: '' },
  perHour: { factor: 1, symbol: '/h' },
  // Wire stock is bought by the metre and the kilogram in every unit system: these never convert.
  stockLength: { factor: 1, symbol: 'm' },
  stockMass: { factor: 1, symbol: 'kg' },
};

const inch: Record<Quantity, UnitDef> = {
  ...metric,
  length: { factor: MM_PER_IN, symbol: 'in' },
  lengthLong: { factor: MM_PER_IN * 12, symbol: 'ft' },
  force: { factor: N_PER_LBF, symbol: 'lbf' },
  stress: { factor: MPA_PER_PSI, symbol: 'psi' },
  rate: { factor: N_PER_LBF / MM_PER_IN, symbol: 'lbf/in' },
  torque: { factor: N_PER_LBF * MM_PER_IN, symbol: 'lbf·in' },
  torqueRatePerTurn: { factor: N_PER_LBF * MM_PER_IN, symbol: 'lbf·in/turn' },
  torqueRatePerDegree: { factor: N_PER_LBF * MM_PER_IN, symbol: 'lbf·in/°' },
  mass: { factor: KG_PER_LB, symbol: 'lb' },
  massBulk: { factor: KG_PER_LB, symbol: 'lb' },
  density: { factor: (KG_PER_LB * 1000) / CM3_PER_IN3, symbol: 'lb/in³' },
  // °F = °C · 9/5 + 32, so internal = (x − 32) · 5/9.
  temperature: { factor: 5 / 9, offset: -32, symbol: '°F' },
  energy: { factor: N_PER_LBF * MM_PER_IN, symbol: 'lbf·in' },
};

const systems: Record<UnitSystem, Record<Quantity, UnitDef>> = { metric, inch };

export function toInternal(value: number, quantity: Quantity, units: UnitSystem): number {
  const def = systems[units][quantity];
  return (value + (def.offset ?? 0)) * def.factor;
}

export function fromInternal(value: number, quantity: Quantity, units: UnitSystem): number {
  const def = systems[units][quantity];
  return value / def.factor - (def.offset ?? 0);
}

/** True when a value of this quantity reads the same in every unit system (counts, angles, percent). */
export function sameInBothSystems(quantity: Quantity): boolean {
  const a = metric[quantity];
  const b = inch[quantity];
  return a.factor === b.factor && (a.offset ?? 0) === (b.offset ?? 0) && a.symbol === b.symbol;
}

export function unitSymbol(quantity: Quantity, units: UnitSystem): string {
  return systems[units][quantity].symbol;
}

/**
 * What each number of a value measures, field by field; nested objects and lists follow the map. `OWN`
 * marks a number whose object names its quantity itself in a `quantity` field (operation settings,
 * inspection characteristics).
 */
export type QuantityMap = { [field: string]: Quantity | typeof OWN | QuantityMap };

export const OWN = 'own-quantity';

const quantities = new Set<string>(Object.keys(metric));
const isQuantity = (q: unknown): q is Quantity => typeof q === 'string' && quantities.has(q);

/** The quantity `m` declares for a number inside `parent`: its own, or its object's `quantity` field. */
function declared(m: Quantity | typeof OWN, parent: Record<string, unknown>): Quantity | undefined {
  if (m !== OWN) return m;
  return isQuantity(parent.quantity) ? parent.quantity : undefined;
}

/** Whether every quantity a map names reads the same in internal units (then converting is a no-op). */
function identityIn(map: QuantityMap, units: UnitSystem): boolean {
  return Object.values(map).every((m) => (typeof m === 'string'
    ? m === OWN ? false : systems[units][m].factor === 1 && (systems[units][m].offset ?? 0) === 0
    : identityIn(m, units)));
}

const identityMaps: Record<UnitSystem, WeakMap<QuantityMap, boolean>> = { metric: new WeakMap(), inch: new WeakMap() };

/** Cached per map: specs convert on every analysis, and a metric spec's map is all identities. */
function isIdentity(map: QuantityMap, units: UnitSystem): boolean {
  let known = identityMaps[units].get(map);
  if (known === undefined) {
    known = identityIn(map, units);
    identityMaps[units].set(map, known);
  }
  return known;
}

type Walker = (v: unknown, parent: Record<string, unknown>) => unknown;
type Direction = 'in' | 'out';

/** One number's conversion, with the same arithmetic as toInternal / fromInternal. */
function converter(def: UnitDef, direction: Direction): (x: number) => number {
  const factor = def.factor;
  const offset = def.offset ?? 0;
  return direction === 'in' ? (x) => (x + offset) * factor : (x) => x / factor - offset;
}

/** A number (or list of numbers) of one declared quantity, or of its object's own `quantity` field (OWN). */
function leafWalker(m: Quantity | typeof OWN, units: UnitSystem, direction: Direction): Walker {
  const fixed = m === OWN ? undefined : converter(systems[units][m], direction);
  const walk: Walker = (v, parent) => {
    if (v === null || v === undefined) return v;
    if (Array.isArray(v)) return v.map((item) => walk(item, parent));
    if (typeof v !== 'number') return v;
    if (fixed) return fixed(v);
    const q = declared(OWN, parent);
    return q === undefined ? v : converter(systems[units][q], direction)(v);
  };
  return walk;
}

/** One number's conversion written out (`x` the number, factor C[i] and offset D[i]), the same arithmetic as converter. */
const convertCode = (direction: Direction, i: number): string => (direction === 'in' ? `(x + D[${i}]) * C[${i}]` : `x / C[${i}] - D[${i}]`);

/** Factor and offset of each field of a map, for generated code (1 and 0 where a field is not a fixed quantity). */
function fixedConstants(map: QuantityMap, keys: string[], units: UnitSystem): { C: number[]; D: number[] } {
  const fixed = keys.map((key) => {
    const m = map[key]!;
    return typeof m === 'string' && m !== OWN ? systems[units][m] : { factor: 1, offset: 0 };
  });
  return { C: fixed.map((d) => d.factor), D: fixed.map((d) => d.offset ?? 0) };
}

/**
 * objectWalker's walk written out for one map: its own copy (so the copy is made for the few shapes this map
 * meets, not for every shape every map meets) and each fixed number converted by name. Same output.
 */
function generatedWalker(map: QuantityMap, inner: Walker[], units: UnitSystem, direction: Direction): Walker | undefined {
  const keys = Object.keys(map);
  const lines = keys.map((key, i) => {
    const k = literal(key);
    const m = map[key]!;
    const value = typeof m === 'string' && m !== OWN ? `typeof x === "number" ? ${convertCode(direction, i)} : W[${i}](x, object)` : `W[${i}](x, object)`;
    return `  x = object[${k}];\n  if (x !== undefined) out[${k}] = ${value};`;
  });
  return generatedFunction<Walker>({ W: inner, ...fixedConstants(map, keys, units) }, [
    'return function walk(object, parent) {',
    '  if (object === null || object === undefined) return object;',
    '  if (Array.isArray(object)) return object.map((item) => walk(item, parent));',
    '  if (typeof object !== "object") return object;',
    '  const out = { ...object };',
    '  let x;',
    ...lines,
    '  return out;',
    '};',
  ].join('\n'));
}

/** An object (or list of objects) the map describes: a copy with the declared fields converted. */
function objectWalker(map: QuantityMap, units: UnitSystem, direction: Direction): Walker {
  const fields = Object.keys(map).map((key) => {
    const m = map[key]!;
    return [key, typeof m === 'string' ? leafWalker(m, units, direction) : objectWalker(m, units, direction)] as const;
  });
  const generated = generatedWalker(map, fields.map(([, inner]) => inner), units, direction);
  if (generated) return generated;
  const walk: Walker = (v, parent) => {
    if (v === null || v === undefined) return v;
    if (Array.isArray(v)) return v.map((item) => walk(item, parent));
    if (typeof v !== 'object') return v;
    const object = v as Record<string, unknown>;
    // A copy keeps the object's shape; only the fields the map declares are replaced.
    const out: Record<string, unknown> = { ...object };
    for (let i = 0; i < fields.length; i++) {
      const [key, inner] = fields[i]!;
      const value = object[key];
      if (value !== undefined) out[key] = inner(value, object);
    }
    return out;
  };
  return walk;
}

/** What is made once per map, unit system and direction (specs and reports convert on every analysis). */
type ByWay<T> = Record<UnitSystem, Partial<Record<Direction, T>>>;

function madeOnce<T>(
  cache: WeakMap<QuantityMap, ByWay<T>>, map: QuantityMap, units: UnitSystem, direction: Direction,
  make: (map: QuantityMap, units: UnitSystem, direction: Direction) => T,
): T {
  let byWay = cache.get(map);
  if (!byWay) {
    byWay = { metric: {}, inch: {} };
    cache.set(map, byWay);
  }
  const ways = byWay[units];
  if (!(direction in ways)) ways[direction] = make(map, units, direction);
  return ways[direction] as T;
}

const walkers = new WeakMap<QuantityMap, ByWay<Walker>>();

const walkerFor = (map: QuantityMap, units: UnitSystem, direction: Direction): Walker =>
  madeOnce(walkers, map, units, direction, objectWalker);

export function convertFields<T>(value: T, map: QuantityMap, units: UnitSystem, direction: Direction): T {
  if (isIdentity(map, units)) return value;
  return walkerFor(map, units, direction)(value, {}) as T;
}

type Placer = (object: Record<string, unknown>) => void;

/** Converts the numbers of one declared field where they are: a number, or a list (of lists) of numbers. */
function placeNumbers(list: unknown[], convert: (x: number) => number): void {
  for (let i = 0; i < list.length; i++) {
    const item = list[i];
    if (typeof item === 'number') list[i] = convert(item);
    else if (Array.isArray(item)) placeNumbers(item, convert);
  }
}

/** Runs `place` on an object, or on every object of a list (of lists). */
function placeEach(value: unknown, place: Placer): void {
  if (Array.isArray(value)) for (const item of value) placeEach(item, place);
  else if (typeof value === 'object' && value !== null) place(value as Record<string, unknown>);
}

interface PlaceField { key: string; inner: Placer | undefined; fixed: ((x: number) => number) | undefined; def: UnitDef | undefined }

/** Whether converting this quantity leaves every number exactly as it was (x / 1 − 0 is x, even −0; x + 0 is not). */
const unchangedBy = (m: Quantity | typeof OWN, units: UnitSystem, direction: Direction): boolean =>
  m !== OWN && direction === 'out' && systems[units][m].factor === 1 && (systems[units][m].offset ?? 0) === 0;

/**
 * The in-place twin of objectWalker: same fields, same arithmetic, no copies. Fields whose conversion
 * changes nothing are left out (a metric report converts only its mass), and so are nested maps left empty.
 */
function placer(map: QuantityMap, units: UnitSystem, direction: Direction): Placer | undefined {
  const fields: PlaceField[] = [];
  for (const key of Object.keys(map)) {
    const m = map[key]!;
    if (typeof m !== 'string') {
      const inner = placer(m, units, direction);
      if (inner) fields.push({ key, inner, fixed: undefined, def: undefined });
    } else if (!unchangedBy(m, units, direction)) {
      const def = m === OWN ? undefined : systems[units][m];
      fields.push({ key, inner: undefined, fixed: def ? converter(def, direction) : undefined, def });
    }
  }
  if (fields.length === 0) return undefined;
  const generated = generatedPlacer(fields, direction);
  if (generated) return generated;
  return (object) => {
    for (let i = 0; i < fields.length; i++) {
      const f = fields[i]!;
      const value = object[f.key];
      if (value === null || value === undefined) continue;
      if (f.inner) {
        placeEach(value, f.inner);
        continue;
      }
      const q = f.fixed ? undefined : declared(OWN, object);
      const convert = f.fixed ?? (q === undefined ? undefined : converter(systems[units][q], direction));
      if (!convert) continue;
      if (typeof value === 'number') object[f.key] = convert(value);
      else if (Array.isArray(value)) placeNumbers(value, convert);
    }
  };
}

/** placer's function written out for its fields (only fixed quantities and nested maps; OWN keeps the walk). */
function generatedPlacer(fields: PlaceField[], direction: Direction): Placer | undefined {
  if (fields.some((f) => !f.inner && !f.fixed)) return undefined;
  const defs = fields.map((f) => (f.fixed ? f.def! : { factor: 1, offset: 0 }));
  const lines = fields.map((f, i) => {
    const k = literal(f.key);
    return f.inner
      ? `  x = object[${k}];\n  if (x !== null && x !== undefined) placeEach(x, P[${i}]);`
      : `  x = object[${k}];\n  if (typeof x === "number") object[${k}] = ${convertCode(direction, i)};\n  else if (Array.isArray(x)) placeNumbers(x, V[${i}]);`;
  });
  return generatedFunction<Placer>({
    P: fields.map((f) => f.inner), V: fields.map((f) => f.fixed), C: defs.map((d) => d.factor), D: defs.map((d) => d.offset ?? 0),
    placeEach, placeNumbers,
  }, ['return function place(object) {', '  let x;', ...lines, '};'].join('\n'));
}

const placers = new WeakMap<QuantityMap, ByWay<Placer | undefined>>();

const placerFor = (map: QuantityMap, units: UnitSystem, direction: Direction): Placer | undefined =>
  madeOnce(placers, map, units, direction, placer);

/**
 * convertFields for a value the caller has just built and nobody else holds (a fresh report on its way
 * out): the declared fields are converted where they are instead of in a copy. Copying a report of some
 * fifty fields and its nested objects costs more than its whole analysis; the numbers are the same.
 * The value must not reach one object twice through declared fields (it would convert twice).
 */
export function convertOwnFields<T>(value: T, map: QuantityMap, units: UnitSystem, direction: Direction): T {
  const place = isIdentity(map, units) ? undefined : placerFor(map, units, direction);
  if (place) placeEach(value, place);
  return value;
}

/**
 * Every number in `value` the map declares no quantity for, by path ("loads[0].stress"): a number without
 * a quantity cannot be converted or labelled, so a model must have none.
 */
export function undeclaredNumbers(value: unknown, map: QuantityMap | Quantity | typeof OWN, path = '', parent: Record<string, unknown> = {}): string[] {
  if (typeof value === 'number') return typeof map === 'string' && declared(map, parent) !== undefined ? [] : [path || '(value)'];
  if (Array.isArray(value)) return value.flatMap((item, i) => undeclaredNumbers(item, map, `${path}[${i}]`, parent));
  if (value === null || typeof value !== 'object') return [];
  const object = value as Record<string, unknown>;
  const fields = typeof map === 'string' ? {} : map;
  return Object.entries(object).flatMap(([key, inner]) =>
    undeclaredNumbers(inner, fields[key] ?? {}, path === '' ? key : `${path}.${key}`, object));
}

/** The quantity a map declares at a dotted path ("materialOverrides.density"; list items share their map). */
export function quantityAt(map: QuantityMap, path: string): Quantity | undefined {
  let at: Quantity | typeof OWN | QuantityMap | undefined = map;
  for (const key of path.split('.')) {
    if (at === undefined || typeof at === 'string') return undefined;
    at = at[key];
  }
  return isQuantity(at) ? at : undefined;
}
