import type { z } from 'zod';
import { lengthDecimals, significant } from '../format';
import { kindEntryOf } from '../kinds/registry';
import { springKinds } from './index';
import type { SpringKind } from './index';
import type { Quantity, QuantityMap, UnitSystem } from '../units';
import { quantityAt, unitSymbol } from '../units';

/**
 * The spec's fields as spreadsheet columns, one per field, named by the field's path as the app names it
 * ("freeLength", "duty.between[1]", "legs[0].length"). The columns are the union of the three kinds' fields,
 * from their schemas. A list is one cell, its items separated by "; ": a list of values (quantities, free
 * parameters) as it is, a list of objects (loads) one column per field of its items ("loads.length" holds
 * every load's length, in order).
 */
export interface SpecColumn {
  path: string;
  /** The quantity the field measures, from the kind's quantity map; undefined for words and flags. */
  quantity: Quantity | undefined;
  /** A list of plain values in one cell ("100; 500; 1000"). */
  list: boolean;
  /** The path split into its keys and list indices, once. */
  keys: readonly string[];
  /** For a field of a list's items: the list's keys and the field's keys within an item. */
  items?: { list: readonly string[]; field: readonly string[] };
}

const keysOf = (path: string): string[] => path.split(/\.|\[(\d+)\]/).filter((k) => k !== undefined && k !== '');

type Schema = z.ZodType & { _zod: { def: Record<string, unknown> } };

const unwrap = (s: Schema): Schema => {
  const def = s._zod.def as { type: string; innerType?: Schema; in?: Schema };
  if (def.innerType && ['optional', 'nullable', 'default', 'prefault', 'readonly', 'catch'].includes(def.type)) return unwrap(def.innerType);
  if (def.type === 'pipe' && def.in) return unwrap(def.in);
  return s;
};

/** The dotted paths of one schema's leaves, with list indices; `mapPath` is the path without indices. */
interface Leaf { path: string; mapPath: string; list: boolean; items?: { list: string; field: string } }

function leaves(schema: Schema, path: string, mapPath: string, out: Leaf[]): void {
  const s = unwrap(schema);
  const def = s._zod.def as { type: string; shape?: Record<string, Schema>; element?: Schema; items?: Schema[]; options?: Schema[] };
  const join = (a: string, b: string) => (a === '' ? b : `${a}.${b}`);
  if (def.type === 'object' && def.shape) {
    for (const [key, inner] of Object.entries(def.shape)) leaves(inner, join(path, key), join(mapPath, key), out);
  } else if (def.type === 'union' && def.options) {
    for (const option of def.options) leaves(option, path, mapPath, out);
  } else if (def.type === 'tuple' && def.items) {
    def.items.forEach((item, i) => leaves(item, `${path}[${i}]`, mapPath, out));
  } else if (def.type === 'array' && def.element) {
    const element = unwrap(def.element);
    if ((element._zod.def as { type: string }).type === 'object') {
      const fields: Leaf[] = [];
      leaves(element, '', '', fields);
      for (const f of fields) out.push({ path: join(path, f.path), mapPath: join(mapPath, f.mapPath), list: false, items: { list: path, field: f.path } });
    } else out.push({ path, mapPath, list: true });
  } else out.push({ path, mapPath, list: false });
}

function columnsOfKind(kind: SpringKind): SpecColumn[] {
  const schema = kindEntryOf(kind).schema as unknown as Schema;
  const found: Leaf[] = [];
  leaves(schema, '', '', found);
  const map: QuantityMap = kindEntryOf(kind).specQuantities;
  return found.filter((f) => !['kind', 'units', 'version', 'material'].includes(f.path))
    .map((f) => ({
      path: f.path, quantity: quantityAt(map, f.mapPath), list: f.list, keys: keysOf(f.path),
      ...(f.items ? { items: { list: keysOf(f.items.list), field: keysOf(f.items.field) } } : {}),
    }));
}

/** The union of every kind's spec columns, in the order they first appear. */
export const specColumns: readonly SpecColumn[] = (() => {
  const seen = new Map<string, SpecColumn>();
  for (const kind of springKinds) {
    for (const column of columnsOfKind(kind)) if (!seen.has(column.path)) seen.set(column.path, column);
  }
  return [...seen.values()];
})();

/** The header of a spec column: its path and the unit in each system ("freeLength (mm | in)"). */
export function specColumnHeader(column: SpecColumn): string {
  if (column.quantity === undefined) return column.path;
  const [metric, inch] = (['metric', 'inch'] as const).map((u) => unitSymbol(column.quantity!, u));
  if (metric === '' && inch === '') return column.path;
  return metric === inch ? `${column.path} (${metric})` : `${column.path} (${metric} | ${inch})`;
}

/** A number in the job's own units as the trade reads it: lengths to 0.01 mm / 0.001 in, counts as typed, others to 3 digits. */
export function tradeNumber(value: number, quantity: Quantity | undefined, units: UnitSystem): string {
  if (quantity === 'length') return value.toFixed(lengthDecimals[units]);
  if (quantity === undefined || quantity === 'count' || quantity === 'ordinal') return String(value);
  return significant(value);
}

function valueAt(spec: unknown, keys: readonly string[]): unknown {
  let at: unknown = spec;
  for (let i = 0; i < keys.length; i++) {
    if (at === null || typeof at !== 'object') return undefined;
    at = (at as Record<string, unknown>)[keys[i]!];
  }
  return at;
}

/** One field of every item of a list, or undefined when the spec has no such list. */
function itemValues(spec: unknown, items: NonNullable<SpecColumn['items']>): unknown[] | undefined {
  const list = valueAt(spec, items.list);
  if (!Array.isArray(list) || list.length === 0) return undefined;
  return list.map((item) => valueAt(item, items.field) ?? '');
}

/** The cells of a spec (as stored, in its own units) under the spec columns. */
export function specCells(spec: unknown, units: UnitSystem): unknown[] {
  return specColumns.map((column) => {
    const v = column.items ? itemValues(spec, column.items) : valueAt(spec, column.keys);
    if (typeof v === 'number') return tradeNumber(v, column.quantity, units);
    if (Array.isArray(v)) return v.map((item) => (typeof item === 'number' ? tradeNumber(item, column.quantity, units) : String(item))).join('; ');
    if (v === undefined || v === null) return '';
    return typeof v === 'object' ? JSON.stringify(v) : v;
  });
}

/** "spec.loads[0].length (mm | in)" or "loads[0].length": the field path a column header names. */
export const pathOfHeader = (header: string): string => header.trim().replace(/^spec\./, '').replace(/\s*\(.*\)$/, '');

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** A cell as the value it stands for: numbers and true/false as such, other text as it is. */
function cellValue(text: string): unknown {
  const t = text.trim();
  if (NUMBER.test(t)) return Number(t);
  if (t === 'true' || t === 'false') return t === 'true';
  return text;
}

function setAt(target: Record<string, unknown>, path: string, value: unknown): void {
  const keys = keysOf(path);
  let at: Record<string, unknown> = target;
  keys.forEach((key, i) => {
    if (i === keys.length - 1) {
      at[key] = value;
      return;
    }
    const nextIsIndex = /^\d+$/.test(keys[i + 1]!);
    at[key] ??= nextIsIndex ? [] : {};
    at = at[key] as Record<string, unknown>;
  });
}

const byPath = new Map(specColumns.map((c) => [c.path, c]));

/**
 * A spec from a row of cells under field-path headers (the headers of the CSV job list are accepted,
 * units in brackets and all). Blank cells are left out; list fields split at ";", and a field of a
 * list's items ("loads.length") gives each item its value in order. The spec's schema then
 * names anything that does not read, by the same path.
 */
export function specOfCells(headers: readonly string[], cells: readonly string[]): Record<string, unknown> {
  const spec: Record<string, unknown> = {};
  headers.forEach((header, i) => {
    const text = cells[i] ?? '';
    if (text.trim() === '') return;
    const path = pathOfHeader(header);
    const column = byPath.get(path);
    const parts = () => text.split(';').map((part) => part.trim());
    if (column?.items) {
      parts().forEach((part, i) => {
        if (part !== '') setAt(spec, `${column.items!.list.join('.')}[${i}].${column.items!.field.join('.')}`, cellValue(part));
      });
    } else setAt(spec, path, column?.list ? parts().map(cellValue) : cellValue(text));
  });
  return spec;
}
