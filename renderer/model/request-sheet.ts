/** What the request-sheet screen works out from a preview: marked cells, the mapping after a correction. */
import type { RequestMapping, RequestPreview } from '../../core/api';
import type { ColumnField } from '../../core/request-sheet';
import { cellRef } from '../../core/request-sheet';
import type { FieldError } from '../../core/result';

/** The base64 part of a data URL ("data:…;base64,AAAA" → "AAAA"). */
export const base64OfDataUrl = (url: string): string => url.slice(url.indexOf(',') + 1);

/** Errors by the cell they name; an error naming a whole row ("A7:H7") marks the row's first cell. */
export function errorsByCell(preview: RequestPreview): Map<string, FieldError[]> {
  const byCell = new Map<string, FieldError[]>();
  for (const row of preview.rows) {
    for (const e of row.errors) {
      const ref = e.path.includes(':') ? e.path.split(':')[0]! : e.path;
      byCell.set(ref, [...(byCell.get(ref) ?? []), e]);
    }
  }
  return byCell;
}

/** The mapping as the preview used it, with one column's field changed by the estimator. */
export function mappingWith(preview: RequestPreview, index: number, field: ColumnField): RequestMapping {
  return {
    columns: preview.mapping.columns.map((c) => ({ header: c.header, field: c.index === index ? field : c.field })),
    units: preview.mapping.units,
    decimalMark: preview.mapping.decimalMark,
  };
}

export const refOf = (column: number, row: number): string => cellRef(column, row);

/** The file name without its extension: the reference proposed for the enquiry. */
export const referenceOfFile = (name: string): string => name.replace(/\.[^.]+$/, '');
