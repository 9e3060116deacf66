/**
 * Units written in a header, "OD (in)" or "Load [N]": a plain number under that header is in that unit,
 * whatever system the job is in, and the headers together suggest the sheet's unit system.
 */
import type { FieldMeasure } from '../typed-number';
import { readTypedNumber } from '../typed-number';
import type { UnitSystem } from '../units';
import type { RequestField } from './fields';
import { requestFieldTable } from './fields';
import type { ColumnField } from './guess';

const BRACKETED = /[([]\s*([^)\]]+?)\s*[)\]]/;

/** Units the typed-number reader knows, by system (a subset: the ones sheet headers use). */
const SYSTEM_OF_UNIT: Record<string, UnitSystem> = {
  mm: 'metric', cm: 'metric', m: 'metric', n: 'metric', kn: 'metric', 'n/mm': 'metric', mpa: 'metric',
  in: 'inch', inch: 'inch', inches: 'inch', '"': 'inch', lbf: 'inch', lb: 'inch', lbs: 'inch', 'lbf/in': 'inch', 'lb/in': 'inch', psi: 'inch', ksi: 'inch',
};

const measureOf = (field: ColumnField): FieldMeasure | undefined => {
  if (field === 'ignore') return undefined;
  const measure = requestFieldTable[field as RequestField].measure;
  return measure === 'count' || measure === 'pieces' ? undefined : measure;
};

/** The header's unit when it is one the field's measure takes ("mm" for a length); null otherwise. */
export function headerUnit(header: string, field: ColumnField): string | null {
  const unit = BRACKETED.exec(header)?.[1]?.trim();
  const measure = measureOf(field);
  if (!unit || measure === undefined) return null;
  return readTypedNumber(`1 ${unit}`, { decimalMark: '.', measure, units: 'metric' }).ok ? unit : null;
}

/** The system most header units belong to; null when the headers name none (or as many of each). */
export function unitsOfHeaders(headers: readonly string[]): UnitSystem | null {
  let metric = 0;
  let inch = 0;
  for (const header of headers) {
    const system = SYSTEM_OF_UNIT[BRACKETED.exec(header)?.[1]?.trim().toLowerCase() ?? ''];
    if (system === 'metric') metric++;
    if (system === 'inch') inch++;
  }
  return metric === inch ? null : metric > inch ? 'metric' : 'inch';
}

/** A bare number under a header with a unit is read in that unit; text with its own unit keeps it. */
export function withHeaderUnit(text: string, unit: string | null | undefined): string {
  const trimmed = text.trim();
  if (!unit || trimmed === '' || !/^[-+\d\s.,/\u00a0\u2009\u202f]+$/.test(trimmed)) return text;
  return `${trimmed} ${unit}`;
}
