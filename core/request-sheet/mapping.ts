/** A request-sheet mapping: which header is which field, the sheet's unit system and decimal mark. */
import { z } from 'zod';
import { unitSystemSchema } from '../spec/common';
import type { UnitSystem } from '../units';
import type { DecimalMark } from '../typed-number';
import { cellRef } from './cells';
import type { RequestField } from './fields';
import { normaliseHeader, requestFieldTable, requestFields } from './fields';
import type { ColumnField } from './guess';
import { guessColumns } from './guess';
import { headerUnit, unitsOfHeaders } from './header-units';

export const columnFieldSchema = z.enum([...requestFields, 'ignore']);

export const requestMappingSchema = z.object({
  columns: z.array(z.object({ header: z.string().max(200), field: columnFieldSchema }).strict()).max(200),
  units: unitSystemSchema,
  decimalMark: z.enum(['.', ',']),
}).strict();
export type RequestMapping = z.infer<typeof requestMappingSchema>;

/** Where a column's field came from: the estimator's mapping, the customer's saved one, or the headers. */
export type ColumnOrigin = 'given' | 'saved' | 'guessed';

export interface MappedColumn {
  index: number;
  letter: string;
  header: string;
  field: ColumnField;
  origin: ColumnOrigin;
  /** The unit the header names for its numbers ("OD (in)" → "in"); null when it names none the field takes. */
  unit: string | null;
}

export interface ColumnMap {
  columns: MappedColumn[];
  units: UnitSystem;
  decimalMark: DecimalMark;
}

const fieldOfHeader = (mapping: RequestMapping | undefined, header: string): ColumnField | undefined => {
  const key = normaliseHeader(header);
  const raw = header.trim();
  return mapping?.columns.find((c) => c.header.trim() === raw)?.field
    ?? mapping?.columns.find((c) => key !== '' && normaliseHeader(c.header) === key)?.field;
};

/**
 * Each header's field: from the mapping given, then the customer's saved mapping, then a guess. A field
 * claimed by two columns keeps the first; the later column is ignored and the mapping says so.
 */
export function mapColumns(
  headers: readonly string[], headerRow: number,
  given: RequestMapping | undefined, saved: RequestMapping | undefined,
  fallback: { units: UnitSystem; decimalMark: DecimalMark },
): ColumnMap {
  const guessed = guessColumns(headers);
  const columns = headers.map((header, index): MappedColumn => {
    const fromGiven = fieldOfHeader(given, header);
    const fromSaved = fromGiven === undefined ? fieldOfHeader(saved, header) : undefined;
    const field = fromGiven ?? fromSaved ?? guessed[index] ?? 'ignore';
    const origin: ColumnOrigin = fromGiven !== undefined ? 'given' : fromSaved !== undefined ? 'saved' : 'guessed';
    return { index, letter: cellRef(index, headerRow).replace(/\d+$/, ''), header, field, origin, unit: headerUnit(header, field) };
  });
  const source = given ?? saved;
  const units = source?.units ?? unitsOfHeaders(headers) ?? fallback.units;
  return { columns, units, decimalMark: source?.decimalMark ?? fallback.decimalMark };
}

/** Mapping problems: a field held by two columns. Paths are the header cells. */
export function mappingErrors(map: ColumnMap, headerRow: number): { code: string; message: string; path: string }[] {
  const seen = new Map<RequestField, MappedColumn>();
  const errors: { code: string; message: string; path: string }[] = [];
  for (const column of map.columns) {
    if (column.field === 'ignore') continue;
    const first = seen.get(column.field);
    if (first) {
      errors.push({ code: 'field-mapped-twice', path: cellRef(column.index, headerRow),
        message: `${requestFieldTable[column.field].label} is already column ${first.letter}; map column ${column.letter} to another field or ignore it` });
    } else seen.set(column.field, column);
  }
  return errors;
}

/** The mapping to keep for the customer: every header with its field. */
export const mappingToSave = (map: ColumnMap): RequestMapping => ({
  columns: map.columns.filter((c) => c.header.trim() !== '').map((c) => ({ header: c.header, field: c.field })),
  units: map.units,
  decimalMark: map.decimalMark,
});
