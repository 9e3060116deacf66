import type { z } from 'zod';
import { generatedFunction, literal } from '../generated-code';

/**
 * A zod schema compiled once into a plain function for the input it certainly accepts. The function
 * returns what the schema's safeParse would give as `data` (the same values, defaults and key order), or
 * REFUSED whenever it is not certain: any issue, and anything the compiler does not know (then the schema
 * itself answers, with its errors). Parsing each spec through the schema's general machinery costs more
 * than analysing it; the schema stays the one definition of what a spec is.
 */
export const REFUSED: unique symbol = Symbol('refused');

type Accept = (value: unknown) => unknown;

/** What the compiler reads of zod's own definitions (zod 4). */
interface Def {
  type: string;
  checks?: { _zod: { def: CheckDef; check(payload: { value: unknown; issues: unknown[] }): unknown } }[];
  shape?: Record<string, Schema>;
  catchall?: Schema;
  innerType?: Schema;
  element?: Schema;
  items?: Schema[];
  rest?: Schema | null;
  options?: Schema[];
  discriminator?: string;
  values?: unknown[];
  entries?: Record<string, unknown>;
  defaultValue?: unknown;
  coerce?: boolean;
}
interface CheckDef { check: string; value?: number; inclusive?: boolean; minimum?: number; maximum?: number; format?: string }
interface Schema { _zod: { def: Def } }

const never: Accept = () => REFUSED;

/** A field the input does not have (apart from one it gives as undefined). */
const ABSENT: unique symbol = Symbol('absent');

/** The numbers the value must be, or undefined when a check is one the compiler does not know. */
type Test = (v: never) => boolean;

function checkTest(check: NonNullable<Def['checks']>[number]): Test | undefined {
  const c = check._zod.def;
  switch (c.check) {
    case 'greater_than': return c.inclusive ? (v: number) => v >= c.value! : (v: number) => v > c.value!;
    case 'less_than': return c.inclusive ? (v: number) => v <= c.value! : (v: number) => v < c.value!;
    case 'number_format': return c.format === 'safeint' ? (v: number) => Number.isSafeInteger(v) : undefined;
    case 'min_length': return (v: { length: number }) => v.length >= c.minimum!;
    case 'max_length': return (v: { length: number }) => v.length <= c.maximum!;
    case 'custom': return (v: unknown) => {
      const payload = { value: v, issues: [] as unknown[] };
      const done = check._zod.check(payload);
      return !(done instanceof Promise) && payload.issues.length === 0;
    };
    default: return undefined;
  }
}

/** The schema's own checks after its value is accepted; undefined when one is unknown. */
function withChecks(schema: Schema, accept: Accept): Accept | undefined {
  const checks = schema._zod.def.checks ?? [];
  if (checks.length === 0) return accept;
  const tests: Test[] = [];
  for (const check of checks) {
    const test = checkTest(check);
    if (!test) return undefined;
    tests.push(test);
  }
  return (value) => {
    const out = accept(value);
    if (out === REFUSED) return REFUSED;
    for (let i = 0; i < tests.length; i++) if (!tests[i]!(out as never)) return REFUSED;
    return out;
  };
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

type Field = { key: string; kind: 'required' | 'optional' | 'default'; accept: Accept; schema: Schema };

/**
 * A strict object: the shape's fields in the shape's order, absent optional fields left out, defaults filled.
 * The input's own keys are read once (a lookup per shape key would mostly miss, and misses are slow).
 */
function objectOf(def: Def): Accept {
  const keys = Object.keys(def.shape!);
  if (def.catchall?._zod.def.type !== 'never' || keys.some((key) => key in Object.prototype)) return never;
  const fields: Field[] = keys.map((key) => {
    const schema = def.shape![key]!;
    const type = schema._zod.def.type;
    if (type === 'optional' && !schema._zod.def.checks?.length) return { key, kind: 'optional', accept: compile(schema._zod.def.innerType!), schema };
    if (type === 'default' && !schema._zod.def.checks?.length) return { key, kind: 'default', accept: compile(schema._zod.def.innerType!), schema };
    return { key, kind: 'required', accept: compile(schema), schema };
  });
  const generated = generatedObject(fields);
  if (generated) return generated;
  const slots = new Map(fields.map((f, i) => [f.key, i]));
  return (value) => {
    if (!isObject(value) || Object.getPrototypeOf(value) !== Object.prototype) return REFUSED;
    const given: unknown[] = new Array(fields.length).fill(ABSENT);
    for (const key in value) {
      const i = slots.get(key);
      if (i === undefined) return REFUSED;
      given[i] = value[key];
    }
    const out: Record<string, unknown> = {};
    for (let i = 0; i < fields.length; i++) {
      const f = fields[i]!;
      const v = given[i];
      if (v === ABSENT) {
        if (f.kind === 'required') return REFUSED;
        if (f.kind === 'default') out[f.key] = f.schema._zod.def.defaultValue;
        continue;
      }
      if (v === undefined && f.kind !== 'required') {
        out[f.key] = f.kind === 'default' ? f.schema._zod.def.defaultValue : undefined;
        continue;
      }
      const accepted = f.accept(v);
      if (accepted === REFUSED) return REFUSED;
      out[f.key] = accepted;
    }
    return out;
  };
}

/** The test of a plain number schema written out (`v` the value), or undefined when it has other checks. */
function numberTest(schema: Schema, bounds: number[]): string | undefined {
  const def = schema._zod.def;
  if (def.type !== 'number' || def.coerce) return undefined;
  const tests = ['typeof v === "number"', 'Number.isFinite(v)'];
  for (const check of def.checks ?? []) {
    const c = check._zod.def;
    const at = `B[${bounds.push(c.value!) - 1}]`;
    if (c.check === 'greater_than') tests.push(c.inclusive ? `v >= ${at}` : `v > ${at}`);
    else if (c.check === 'less_than') tests.push(c.inclusive ? `v <= ${at}` : `v < ${at}`);
    else if (c.check === 'number_format' && c.format === 'safeint') tests.push('Number.isSafeInteger(v)');
    else return undefined;
  }
  return tests.join(' && ');
}

/**
 * objectOf's function written out for its shape: each field read and written by name (a generic walk reads and
 * writes through computed keys, which costs more than the checks themselves). Same rules, same output.
 */
function generatedObject(fields: Field[]): Accept | undefined {
  const bounds: number[] = [];
  const lines = fields.map((f, i) => {
    const key = literal(f.key);
    const inner = f.kind === 'required' ? f.schema : f.schema._zod.def.innerType!;
    const test = numberTest(inner, bounds);
    const accept = test ? `if (!(${test})) return R;\n    out[${key}] = v;` : `a = A[${i}](v);\n    if (a === R) return R;\n    out[${key}] = a;`;
    const absent = f.kind === 'required' ? 'return R;'
      : f.kind === 'default' ? `out[${key}] = F[${i}].schema._zod.def.defaultValue;`
        : `if (${key} in value) out[${key}] = undefined;`;
    return `  v = value[${key}];\n  if (v === undefined) { ${absent} } else {\n    ${accept}\n  }`;
  });
  const body = [
    'return function accept(value) {',
    '  if (typeof value !== "object" || value === null || Array.isArray(value) || Object.getPrototypeOf(value) !== Object.prototype) return R;',
    '  for (const key in value) if (!K.has(key)) return R;',
    '  const out = {};',
    '  let v, a;',
    ...lines,
    '  return out;',
    '};',
  ].join('\n');
  return generatedFunction<Accept>({
    R: REFUSED, K: new Set(fields.map((f) => f.key)), A: fields.map((f) => f.accept), F: fields, B: bounds,
  }, body);
}

/**
 * The accepted list, made by copying the input (`slice`) and writing each accepted item over its copy. An array
 * literal here would be one allocation site for the lists of every schema: once some parsed lists are kept (a
 * page of jobs), V8 allocates all of them in the old generation, the items of each short-lived list then outlive
 * the young collections, and `calculate` ran at 4× its floor instead of 2.6× (npm run bench -- engine). Arrays a
 * builtin makes carry no allocation site.
 */
function acceptedItems(value: unknown[], itemAt: (i: number) => Accept): unknown[] | typeof REFUSED {
  const out = value.slice();
  for (let i = 0; i < out.length; i++) {
    const v = itemAt(i)(value[i]);
    if (v === REFUSED) return REFUSED;
    out[i] = v;
  }
  return out;
}

function arrayOf(def: Def): Accept {
  const element = compile(def.element!);
  const each = (): Accept => element;
  return (value) => (Array.isArray(value) ? acceptedItems(value, each) : REFUSED);
}

function tupleOf(def: Def): Accept {
  if (def.rest) return never;
  const items = def.items!.map((item) => (item._zod.def.type === 'optional' ? never : compile(item)));
  const at = (i: number): Accept => items[i]!;
  return (value) => (Array.isArray(value) && value.length === items.length ? acceptedItems(value, at) : REFUSED);
}

/** A discriminated union picks its option by the discriminator; a plain union only of literals. */
function unionOf(def: Def): Accept {
  if (def.discriminator !== undefined) {
    const disc = def.discriminator;
    const byValue = new Map<unknown, Accept>();
    for (const option of def.options!) {
      const literal = option._zod.def.shape?.[disc]?._zod.def;
      if (literal?.type !== 'literal' || option._zod.def.type !== 'object') return never;
      const accept = compile(option);
      for (const v of literal.values!) byValue.set(v, accept);
    }
    return (value) => (isObject(value) ? byValue.get(value[disc])?.(value) ?? REFUSED : REFUSED);
  }
  if (def.options!.every((o) => o._zod.def.type === 'literal' && !o._zod.def.checks?.length)) {
    const values = new Set(def.options!.flatMap((o) => o._zod.def.values!));
    return (value) => (values.has(value) ? value : REFUSED);
  }
  // Zod takes the first option that accepts: the same only when each option is compiled whole.
  const options = def.options!.map(compile);
  if (options.some((o) => incomplete.has(o))) return never;
  return (value) => {
    for (let i = 0; i < options.length; i++) {
      const v = options[i]!(value);
      if (v !== REFUSED) return v;
    }
    return REFUSED;
  };
}

function base(def: Def): Accept {
  if (def.coerce) return never;
  switch (def.type) {
    case 'number': return (v) => (typeof v === 'number' && Number.isFinite(v) ? v : REFUSED);
    case 'string': return (v) => (typeof v === 'string' ? v : REFUSED);
    case 'boolean': return (v) => (typeof v === 'boolean' ? v : REFUSED);
    case 'literal': {
      const values = new Set(def.values);
      return (v) => (values.has(v) ? v : REFUSED);
    }
    case 'enum': {
      const values = new Set(Object.values(def.entries!));
      return (v) => (values.has(v) ? v : REFUSED);
    }
    case 'object': return objectOf(def);
    case 'array': return arrayOf(def);
    case 'tuple': return tupleOf(def);
    case 'union': return unionOf(def);
    case 'optional': {
      const inner = compile(def.innerType!);
      return (v) => (v === undefined ? undefined : inner(v));
    }
    case 'default': {
      const inner = compile(def.innerType!);
      return (v) => (v === undefined ? def.defaultValue : inner(v));
    }
    default: return never;
  }
}

const compiled = new WeakMap<Schema, Accept>();

/** Acceptors that refuse some input zod accepts (they hold a part the compiler does not know). */
const incomplete = new WeakSet<Accept>([never]);

/** Whether the acceptor being built has met an incomplete part. */
let metIncomplete = false;

function compile(schema: Schema): Accept {
  let accept = compiled.get(schema);
  if (!accept) {
    const outer = metIncomplete;
    metIncomplete = false;
    const own = base(schema._zod.def);
    accept = withChecks(schema, own) ?? never;
    if (metIncomplete || own === never) incomplete.add(accept);
    metIncomplete = outer;
    compiled.set(schema, accept);
  }
  if (incomplete.has(accept)) metIncomplete = true;
  return accept;
}

/** The schema as a function: its parsed data for input it certainly accepts, else REFUSED (ask the schema). */
export function compileSchema<S extends z.ZodType>(schema: S): (value: unknown) => z.output<S> | typeof REFUSED {
  return compile(schema as unknown as Schema) as (value: unknown) => z.output<S> | typeof REFUSED;
}
