import { useState } from 'react';
import type { PreviewRow, RequestPreview } from '../../../core/api';
import type { ColumnField } from '../../../core/request-sheet';
import { ColumnChoice } from './ColumnChoice';
import { parseCellRef } from '../../../core/request-sheet';
import { errorsByCell, refOf } from '../../model/request-sheet';

const statusWords = { ready: 'ready', error: 'to fix', skipped: 'skipped' } as const;

function PreviewCell({ row, column, text, marked, understood }: { row: number; column: number; text: string; marked: string[] | undefined; understood: string | undefined }) {
  const ref = refOf(column, row);
  if (!marked) return understood ? <td className="request-cell--read" title={understood}>{text}</td> : <td>{text}</td>;
  return (
    <td className="request-cell--error" title={marked.join('\n')} data-ref={ref}>
      {text === '' ? <span className="muted">(empty)</span> : text} <span className="request-cell__ref">{ref}</span>
    </td>
  );
}

/** The sheet's rows as they will be imported, each column's field chosen above it; cells that do not read are marked with their reference. */
export function PreviewTable({ preview, onMap }: { preview: RequestPreview; onMap(index: number, field: ColumnField): void }) {
  const marked = errorsByCell(preview);
  const width = preview.mapping.columns.length;
  return (
    <div className="table-wrap request-preview">
      <table className="table table--compact">
        <thead>
          <tr><th>Row</th><th>State</th>{preview.mapping.columns.map((c) => <th key={c.index}>{c.letter} · {c.header}</th>)}</tr>
          <tr className="request-mapping">
            <th colSpan={2} className="muted">Imported as</th>
            {preview.mapping.columns.map((c) => <th key={c.index}><ColumnChoice column={c} onMap={onMap} /></th>)}
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((r) => (
            <tr key={r.row} className={`request-row--${r.status}`}>
              <th scope="row">{r.row}</th>
              <td><span className={`status request-status--${r.status}`}>{statusWords[r.status]}</span></td>
              {Array.from({ length: width }, (_, i) => (
                <PreviewCell key={i} row={r.row} column={i} text={r.cells[i] ?? ''}
                  marked={r.status === 'error' ? marked.get(refOf(i, r.row))?.map((e) => e.message) : undefined}
                  understood={r.understood.find((u) => u.path === refOf(i, r.row))?.message} />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function FixField({ cell, current, onFix }: { cell: string; current: string; onFix(ref: string, text: string): void }) {
  const [text, setText] = useState(current);
  return (
    <form className="request-fix" onSubmit={(e) => { e.preventDefault(); onFix(cell, text); }}>
      <label className="field__label" htmlFor={`fix-${cell}`}>New value for {cell}</label>
      <input id={`fix-${cell}`} className="input" value={text} onChange={(e) => setText(e.target.value)} autoComplete="off" spellCheck={false} />
      <button type="submit" className="button">Use</button>
    </form>
  );
}

function RowProblems({ row, onFix, onSkip }: { row: PreviewRow; onFix(ref: string, text: string): void; onSkip(row: number, skip: boolean): void }) {
  return (
    <li className="request-problem">
      <div className="request-problem__head">
        <strong>Row {row.row}</strong>
        <label className="field--check">
          <input type="checkbox" checked={row.status === 'skipped'} onChange={(e) => onSkip(row.row, e.target.checked)} /> Skip row {row.row}
        </label>
      </div>
      {row.errors.map((e) => {
        const at = parseCellRef(e.path);
        const single = at !== null;
        const column = at?.column ?? -1;
        return (
          <div key={`${e.path}-${e.code}`} className="request-problem__error">
            <p className="error-text"><span className="request-cell__ref">{e.path}</span> {e.message}</p>
            {single && row.status === 'error' ? <FixField cell={e.path} current={row.cells[column] ?? ''} onFix={onFix} /> : null}
          </div>
        );
      })}
    </li>
  );
}

/** Every row that does not read (or was skipped with errors): fix its cells, or skip it. */
export function ProblemList({ preview, onFix, onSkip }: { preview: RequestPreview; onFix(ref: string, text: string): void; onSkip(row: number, skip: boolean): void }) {
  const rows = preview.rows.filter((r) => r.status === 'error' || (r.status === 'skipped'));
  if (rows.length === 0) return null;
  return (
    <section className="panel" aria-labelledby="problems-title">
      <h2 id="problems-title" className="panel__title">Rows to fix or skip</h2>
      <ul className="request-problems">
        {rows.map((r) => <RowProblems key={r.row} row={r} onFix={onFix} onSkip={onSkip} />)}
      </ul>
    </section>
  );
}
