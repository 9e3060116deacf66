import { useId } from 'react';
import { jobDateFields } from '../../../core/api';
import { PlainSelect } from '../../components/Plain';
import type { DateRange } from '../../model/date-ranges';
import { dateRangeProblem, isRangeSet, noDateRange, quickRanges } from '../../model/date-ranges';
import { jobDateLabels } from '../../model/labels';
import { shopToday } from '../../model/shop-days';

function DateInput({ label, value, onChange, errorId }: { label: string; value: string; onChange(v: string): void; errorId?: string | undefined }) {
  const id = useId();
  return (
    <div className="field field--plain">
      <label htmlFor={id} className="field__label">{label}</label>
      <input id={id} type="date" className="input" value={value} onChange={(e) => onChange(e.target.value)}
        aria-invalid={errorId ? true : undefined} aria-describedby={errorId} />
    </div>
  );
}

/** The list's date range: which date, from and to (both days included), a clear control and quick ranges. */
export function DateRangeFilter({ range, onRange }: { range: DateRange; onRange(r: DateRange): void }) {
  const problem = dateRangeProblem(range);
  const errorId = useId();
  return (
    <fieldset className="filterbar__dates">
      <legend className="sr-only">Date range</legend>
      <PlainSelect label="Date" value={range.field} onChange={(field) => onRange({ ...range, field })}
        choices={jobDateFields.map((f) => ({ value: f, label: jobDateLabels[f] }))} />
      <DateInput label="From" value={range.from} onChange={(from) => onRange({ ...range, from })} errorId={problem ? errorId : undefined} />
      <DateInput label="To" value={range.to} onChange={(to) => onRange({ ...range, to })} />
      <button type="button" className="button" disabled={!isRangeSet(range)} onClick={() => onRange({ ...noDateRange, field: range.field })}>Clear dates</button>
      <div className="filterbar__quick" role="group" aria-label="Quick date ranges">
        {quickRanges.map((q) => (
          <button key={q.label} type="button" className="button button--small button--quiet" onClick={() => onRange(q.range(shopToday()))}>{q.label}</button>
        ))}
      </div>
      {/* Under From, which it names; a line of its own so the controls beside it do not move. */}
      {problem ? <p className="field__error filterbar__date-error" id={errorId} role="alert">{problem}</p> : null}
    </fieldset>
  );
}
