/** Spec and job errors of a row, put on the cell of the sheet their field came from. */
import type { FieldError } from '../result';
import { cellRef, rowRef } from './cells';
import type { RequestField } from './fields';
import { requestFieldTable } from './fields';
import type { MappedColumn } from './mapping';

interface ErrorPlace {
  row: number;
  columns: readonly MappedColumn[];
  /** The spec as the row gave it: a field absent from it is missing, whatever words the schema used. */
  given?: Readonly<Record<string, unknown>>;
}

/** The sheet's field a spec or job path came from ("loads[0].force" → the load column). */
function fieldsOfPath(path: string): RequestField[] {
  const head = path.replace(/^spec\./, '');
  if (/^loads\[\d+\]\.force/.test(head)) return ['load', 'loadAtLength'];
  if (/^loads/.test(head)) return ['loadLength', 'loadAtLength'];
  if (/^(bodyCoils|totalCoils|activeCoils)/.test(head)) return ['totalCoils', 'activeCoils'];
  if (/^(quantities|orderQuantity)/.test(head)) return ['quantity'];
  if (/^ends/.test(head)) return ['ends'];
  const key = head.split(/[.[]/)[0] as RequestField;
  return key in requestFieldTable ? [key] : [];
}

function refOfPath(path: string, options: ErrorPlace): string {
  const fields = fieldsOfPath(path);
  const column = options.columns.find((c) => fields.includes(c.field as RequestField));
  return column ? cellRef(column.index, options.row) : rowRef(options.row, options.columns.length);
}

const MISSING_WORDS: Record<string, string> = {
  material: 'a wire grade', wireDiameter: 'the wire diameter', freeLength: 'the free length', ends: 'the ends',
  bodyCoils: 'the coils', kind: 'the kind',
};

/** Spec rules whose words name spec fields, said in the sheet's terms. */
const SHEET_WORDS: Record<string, string> = {
  'diameter-count': 'give one coil diameter per row: the OD, the ID or the mean diameter',
  'coil-count': 'give the total coils or the active coils, not both and not neither',
};

/** Schema errors rewritten for a sheet: the cell, and "no value" said as the customer's sheet would need it. */
export function sheetError(e: FieldError, options: ErrorPlace): FieldError {
  const head = e.path.replace(/^spec\./, '');
  const ref = refOfPath(e.path, options);
  const fields = fieldsOfPath(e.path);
  const mapped = options.columns.some((c) => fields.includes(c.field as RequestField));
  const key = head.split(/[.[]/)[0]!;
  const missing = options.given !== undefined && options.given[key] === undefined ? MISSING_WORDS[key] : undefined;
  if (missing && !mapped) return { code: 'column-missing', path: ref, message: `no column holds ${missing}: map one, or enter it in the job after the import` };
  if (missing) return { code: 'value-missing', path: ref, message: `${missing} is empty` };
  const label = fields[0] ? `${requestFieldTable[fields[0]].label}: ` : '';
  return { ...e, path: ref, message: `${label}${SHEET_WORDS[e.code] ?? e.message}` };
}

