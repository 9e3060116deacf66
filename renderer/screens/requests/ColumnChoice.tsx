import type { RequestPreview } from '../../../core/api';
import type { ColumnField } from '../../../core/request-sheet';
import { requestFieldTable, requestFields } from '../../../core/request-sheet';

const originWords = { given: 'corrected', saved: 'kept for this customer', guessed: 'from the header' } as const;

const choices: { value: ColumnField; label: string }[] = [
  { value: 'ignore', label: '— not imported —' },
  ...requestFields.map((f) => ({ value: f, label: requestFieldTable[f].label })),
];

type MappedColumn = RequestPreview['mapping']['columns'][number];

/** The field one column is read as: proposed from its header or the customer's kept mapping, corrected here. */
export function ColumnChoice({ column, onMap }: { column: MappedColumn; onMap(index: number, field: ColumnField): void }) {
  return (
    <div className="request-choice">
      <select className="input" aria-label={`Field of column ${column.letter}`} value={column.field}
        onChange={(e) => onMap(column.index, e.target.value as ColumnField)}>
        {choices.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
      <span className={`request-origin request-origin--${column.origin}`}>{originWords[column.origin]}{column.unit ? `; bare numbers in ${column.unit}` : ''}</span>
    </div>
  );
}
