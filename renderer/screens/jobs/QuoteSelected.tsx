import { useState } from 'react';
import type { ApiResult, PrintedPdf } from '../../../core/api';
import type { FieldError } from '../../../core/result';
import { usePlatform } from '../../api';
import { usePrinter } from '../../hooks/printing';
import { IssueDecision } from '../workspace/panes/IssueDecision';

/**
 * One quotation for the selected jobs of one customer, a line each in the order they were ticked. Open
 * problems on any line ask for the estimator's reason; jobs of different customers are refused by name.
 */
export function QuoteSelected({ selected, onDone, label = 'Quote selected' }: { selected: ReadonlySet<number>; onDone(): void; label?: string }) {
  const printer = usePrinter();
  const platform = usePlatform();
  const [busy, setBusy] = useState(false);
  const [problems, setProblems] = useState<FieldError[] | null>(null);
  const [outcome, setOutcome] = useState<{ ok: boolean; text: string } | null>(null);
  const ids = [...selected];

  const issue = async (accept?: string) => {
    setBusy(true);
    setOutcome(null);
    const r: ApiResult<PrintedPdf> = await printer.quotation(ids, accept);
    setBusy(false);
    if (!r.ok && r.error.code === 'issue-needs-decision') {
      setProblems(r.error.details ?? []);
      return;
    }
    if (!r.ok) {
      setOutcome({ ok: false, text: r.error.message });
      return;
    }
    setOutcome({ ok: true, text: `${r.value.fileName} is ready (${r.value.reference}, ${ids.length} line${ids.length === 1 ? '' : 's'}).` });
    platform.showPdf(r.value);
    onDone();
  };
  return (
    <>
      <button type="button" className="button" disabled={selected.size === 0 || busy} onClick={() => void issue()}
        title={selected.size === 0 ? 'Select jobs of one customer in the list first' : 'One quotation, a line for each selected job'}>
        {label}{selected.size > 0 ? ` (${selected.size})` : ''}
      </button>
      {outcome ? <span className={outcome.ok ? 'ok-text' : 'error-text'} role={outcome.ok ? 'status' : 'alert'}>{outcome.text}</span> : null}
      <IssueDecision problems={problems} onCancel={() => setProblems(null)} onIssue={(reason) => {
        setProblems(null);
        void issue(reason);
      }} />
    </>
  );
}
