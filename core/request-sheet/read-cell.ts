/** Reads one cell of a request sheet into its field's value, or an error naming the cell. */
import type { FieldError } from '../result';
import type { DecimalMark, FieldMeasure } from '../typed-number';
import { readTypedList, readTypedNumber } from '../typed-number';
import type { UnitSystem } from '../units';
import type { RequestField } from './fields';
import { withHeaderUnit } from './header-units';
import { requestFieldTable } from './fields';

export interface CellContext {
  ref: string;
  field: RequestField;
  units: UnitSystem;
  decimalMark: DecimalMark;
  /** The unit the column's header names, for numbers written bare. */
  unit?: string | null;
}

export type CellReading<T> = { ok: true; value: T; understood: string | null } | { ok: false; error: FieldError };

const labelled = (ctx: CellContext, message: string): string => `${requestFieldTable[ctx.field].label}: ${message}`;

export const cellError = (ctx: CellContext, code: string, message: string): { ok: false; error: FieldError } =>
  ({ ok: false, error: { code, path: ctx.ref, message: labelled(ctx, message) } });

/** What typed-number says it understood, unless it only repeats the text ("read "20 N" as 20 N"). */
function news(understood: string | null): string | null {
  const m = understood === null ? null : /^read "(.*)" as (.*)$/.exec(understood);
  return m && m[1] === m[2] ? null : understood;
}

/** A number in the field's measure, in the sheet's unit system; a blank cell is `undefined`. */
export function readNumberCell(text: string, ctx: CellContext, measure?: FieldMeasure): CellReading<number | undefined> {
  const read = readTypedNumber(measure ? withHeaderUnit(text, ctx.unit) : text, { decimalMark: ctx.decimalMark, units: ctx.units, ...(measure ? { measure } : {}) });
  if (!read.ok) return cellError(ctx, read.code, read.message);
  if (read.value !== undefined && !(read.value > 0)) return cellError(ctx, 'not-positive', `"${text.trim()}" must be above zero`);
  return { ok: true, value: read.value, understood: news(read.understood) };
}

/** Order quantities: one or several breaks ("500", "100 / 500 / 1 000"), whole pieces. */
export function readQuantityCell(text: string, ctx: CellContext): CellReading<number[]> {
  const read = readTypedList(text, { decimalMark: ctx.decimalMark, measure: 'pieces' });
  if (!read.ok) return cellError(ctx, read.code, read.message);
  const bad = read.value.find((q) => !Number.isInteger(q) || q <= 0);
  if (bad !== undefined) return cellError(ctx, 'not-whole-pieces', `${bad} is not a whole number of pieces`);
  const told = read.understood.map(news).filter((u) => u !== null);
  return { ok: true, value: read.value, understood: told.length > 0 ? told.join('; ') : null };
}

/** "50 N @ 30 mm", "50 @ 30" or "50 at 30": the force first, then the length it is asked at. */
export function readLoadAtLengthCell(text: string, ctx: CellContext): CellReading<{ force: number; length: number } | undefined> {
  if (text.trim() === '') return { ok: true, value: undefined, understood: null };
  const parts = text.split(/\s*@\s*|\s+at\s+/i);
  if (parts.length !== 2) return cellError(ctx, 'not-load-at-length', `"${text.trim()}" is not a load at a length; write it as 50 N @ 30 mm`);
  const force = readNumberCell(parts[0]!, ctx, 'force');
  if (!force.ok) return force;
  const length = readNumberCell(parts[1]!, ctx, 'length');
  if (!length.ok) return length;
  if (force.value === undefined || length.value === undefined) {
    return cellError(ctx, 'not-load-at-length', `"${text.trim()}" needs both the load and the length; write it as 50 N @ 30 mm`);
  }
  const understood = [force.understood, length.understood].filter((u) => u !== null).join('; ');
  return { ok: true, value: { force: force.value, length: length.value }, understood: understood === '' ? null : understood };
}
