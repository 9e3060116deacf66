import type { RevisionFields } from '../../core/api';
import { lengthDecimals, significant } from '../../core/format';
import { kindEntryOf } from '../../core/kinds/registry';
import type { Spec } from '../../core/spec';
import { kindLabel, sentenceCase } from '../../core/vocabulary';
import type { Quantity, UnitSystem } from '../../core/units';
import { fromInternal, quantityAt, sameInBothSystems, toInternal, unitSymbol } from '../../core/units';
import { fieldName, statusLabels } from './labels';
import { decimalMark } from './numbers';

/** One difference between two saved states: the field by its label, the value before and after, in the job's units. */
export interface Change {
  field: string;
  before: string;
  after: string;
}

/** What a revision held: its order fields and spec (null when the stored spec no longer reads). */
export interface SavedState {
  fields: RevisionFields;
  spec: Spec | null;
}

type Flat = Map<string, unknown>;

function flatten(value: unknown, path: string, out: Flat): Flat {
  // A list of plain values (quantity breaks, free parameters) reads as one value.
  if (Array.isArray(value) && value.every((v) => v === null || typeof v !== 'object')) out.set(path, value.map((v) => (typeof v === 'number' ? mark(String(v)) : v)).join('; '));
  else if (Array.isArray(value)) value.forEach((v, i) => flatten(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) flatten(v, path === '' ? k : `${path}.${k}`, out);
  } else if (value !== undefined) out.set(path, value);
  return out;
}

/** A spec number as the trade reads it (0.01 mm / 0.001 in for lengths, three significant digits else), in `units`. */
function shownNumber(value: number, quantity: Quantity | undefined, from: UnitSystem, units: UnitSystem): string {
  if (quantity === undefined || sameInBothSystems(quantity)) return mark(significantOrWhole(value));
  const shown = from === units ? value : fromInternal(toInternal(value, quantity, from), quantity, units);
  const text = quantity === 'length' ? shown.toFixed(lengthDecimals[units]) : significantOrWhole(shown);
  const symbol = unitSymbol(quantity, units);
  return symbol === '' ? mark(text) : `${mark(text)} ${symbol}`;
}

const significantOrWhole = (v: number): string => (Number.isInteger(v) ? String(v) : significant(v));
const mark = (text: string): string => (decimalMark() === ',' ? text.replace('.', ',') : text);

function shownSpecValue(spec: Spec, path: string, value: unknown, units: UnitSystem): string {
  if (value === undefined) return '—';
  if (path === 'kind') return kindLabel(value as Spec['kind']);
  if (typeof value === 'number') {
    const quantity = quantityAt(kindEntryOf(spec.kind).specQuantities, path.replace(/\[\d+\]/g, ''));
    return shownNumber(value, quantity, spec.units, units);
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value);
}

const SKIPPED = new Set(['version']);

/** The spec's differences, field by field, with every number in the units of `after` (the job's units then). */
export function specChanges(before: Spec | null, after: Spec | null): Change[] {
  if (!before || !after) return [];
  const a = flatten(before, '', new Map());
  const b = flatten(after, '', new Map());
  const paths = [...new Set([...a.keys(), ...b.keys()])].filter((p) => !SKIPPED.has(p));
  const changes: Change[] = [];
  for (const path of paths) {
    const was = a.get(path);
    const now = b.get(path);
    if (was === now) continue;
    const beforeText = shownSpecValue(before, path, was, after.units);
    const afterText = shownSpecValue(after, path, now, after.units);
    // A unit change alone moves every number; the values read the same in the job's units.
    if (beforeText === afterText) continue;
    changes.push({ field: sentenceCase(fieldName(path)), before: beforeText, after: afterText });
  }
  return changes;
}

const orderFieldLabels: Partial<Record<keyof RevisionFields, string>> = {
  customerName: 'Customer', partNumber: 'Part number', drawingNumber: 'Drawing number', drawingRevision: 'Drawing revision',
  status: 'Status', notes: 'Job notes', dueDate: 'Due date', orderQuantity: 'Order quantity', leadTimeDays: 'Lead time',
};

function shownField(key: keyof RevisionFields, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (key === 'status') return statusLabels[value as RevisionFields['status']];
  if (key === 'orderQuantity') return `${value} pcs`;
  if (key === 'leadTimeDays') return `${value} days`;
  return String(value);
}

/** Every difference between two saved states of a job: order fields first, then the spec. */
export function revisionChanges(before: SavedState, after: SavedState): Change[] {
  const fields: Change[] = [];
  for (const key of Object.keys(orderFieldLabels) as (keyof RevisionFields)[]) {
    const was = shownField(key, before.fields[key]);
    const now = shownField(key, after.fields[key]);
    if (was !== now) fields.push({ field: orderFieldLabels[key]!, before: was, after: now });
  }
  return [...fields, ...specChanges(before.spec, after.spec)];
}
