import { useState } from 'react';
import type { ApiResult, Job, PrintedPdf } from '../../../../core/api';
import { usePlatform } from '../../../api';
import { Caution } from '../../../components/Caution';
import { PlainInput } from '../../../components/Plain';
import { Progress } from '../../../components/Progress';
import { usePrinter } from '../../../hooks/printing';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { parseNumber } from '../../../model/numbers';
import type { FieldError } from '../../../../core/result';
import { IssuedQuotes } from './IssuedQuotes';
import { IssueDecision } from './IssueDecision';
import { QuotationLines } from './QuotationLines';

/** Quote and traveller for the saved job, and the quotes already issued with their dates. */
export function DocumentsPane({ editor }: { editor: JobEditor }) {
  const job = editor.job;
  if (!job) return <div className="pane"><p className="notice">Documents are for saved jobs: complete the spec and it saves itself.</p></div>;
  return <JobDocuments job={job} pending={editor.dirty || editor.saving} />;
}

interface Outcome {
  tone: 'ok' | 'error';
  text: string;
  findings: string[];
}

function JobDocuments({ job, pending }: { job: Job; pending: boolean }) {
  const platform = usePlatform();
  const printer = usePrinter();
  const [busy, setBusy] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [quantityText, setQuantityText] = useState('');
  const [issued, setIssued] = useState(0);
  const [problems, setProblems] = useState<FieldError[] | null>(null);
  const [chosen, setChosen] = useState<Set<number>>(() => new Set());
  const lines = [job.id, ...[...chosen].sort((a, b) => a - b)];
  const issueLabel = lines.length === 1 ? 'Issue and print quote (PDF)' : `Issue and print quote of ${lines.length} lines (PDF)`;
  const parsed = parseNumber(quantityText);
  const quantity = parsed.ok && parsed.value !== undefined && Number.isInteger(parsed.value) && parsed.value > 0 ? parsed.value : undefined;
  const quantityBad = quantityText.trim() !== '' && quantity === undefined;

  const run = async (label: string, call: () => Promise<ApiResult<PrintedPdf>>) => {
    setBusy(label);
    setOutcome(null);
    const r = await call();
    setBusy(null);
    if (!r.ok && r.error.code === 'issue-needs-decision') {
      setProblems(r.error.details ?? []);
      return;
    }
    if (!r.ok) {
      setOutcome({ tone: 'error', text: r.error.message, findings: [] });
      return;
    }
    setOutcome({ tone: 'ok', text: `${r.value.fileName} is ready (${r.value.reference}).`, findings: r.value.findings });
    platform.showPdf(r.value);
    setIssued((n) => n + 1);
  };
  const blocked = pending ? 'Wait for the last change to save: documents print the saved job.' : null;
  const off = !!blocked || busy !== null;
  return (
    <div className="pane">
      <div className="doc-actions">
        <section className="panel" aria-labelledby="traveller-title">
          <h3 id="traveller-title" className="panel__title">Shop traveller</h3>
          <PlainInput label="Pieces to make" value={quantityText} onChange={setQuantityText} numeric
            placeholder={job.orderQuantity ? String(job.orderQuantity) : ''}
            hint={quantityBad ? 'a whole number of pieces' : job.orderQuantity ? `Empty: the order quantity, ${job.orderQuantity}` : 'The job has no order quantity: give one'} />
          <button type="button" className="button button--primary" disabled={off || quantityBad}
            onClick={() => void run('Printing the traveller', () => printer.print('traveller', job.id, quantity))}>Print traveller (PDF)</button>
        </section>
        <section className="panel" aria-labelledby="quote-title">
          <h3 id="quote-title" className="panel__title">Quotation</h3>
          <p className="muted">Printing issues a new numbered quote: today’s prices for revision {job.revision} are kept with it and never change.
            Each job ticked below is a further line, priced on its own.</p>
          <QuotationLines job={job} chosen={chosen} onChange={setChosen} disabled={off} refresh={issued} />
          <button type="button" className="button button--primary" disabled={off}
            onClick={() => void run('Issuing and printing the quote', () => printer.quotation(lines))}>{issueLabel}</button>
        </section>
      </div>
      {blocked ? <p className="muted">{blocked}</p> : null}
      {busy ? <Progress label={busy} /> : null}
      {outcome ? (
        <div role={outcome.tone === 'ok' ? 'status' : 'alert'} className={outcome.tone === 'ok' ? 'ok-text' : 'error-text'}>
          <p>{outcome.text}</p>
          {outcome.findings.length > 0 ? (
            <><p className="muted">Printed with the open findings:</p><ul>{outcome.findings.map((f) => <li key={f}>{f}</li>)}</ul></>
          ) : null}
        </div>
      ) : null}
      <Caution title="Printed documents carry the cautions" tone="notice">
        Quotes and travellers print the stored-energy caution and the note that the figures support, and do not replace,
        the engineer’s review, the customer’s approval and the local codes. The traveller adds the floor cautions of its
        routing (set removal, grinding, ovens, plating and bake) and the review findings still open.
      </Caution>
      <IssueDecision problems={problems} onCancel={() => setProblems(null)} onIssue={(reason) => {
        setProblems(null);
        void run('Issuing and printing the quote', () => printer.quotation(lines, reason));
      }} />
      <IssuedQuotes job={job} refresh={issued} disabled={off} onReprint={(number) => void run(`Reprinting ${number}`, () => printer.reprint(number))} />
    </div>
  );
}
