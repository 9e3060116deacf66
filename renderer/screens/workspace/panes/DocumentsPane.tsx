import { useState } from 'react';
import type { ApiResult, Job, PrintedPdf } from '../../../../core/api';
import { usePlatform } from '../../../api';
import { Caution } from '../../../components/Caution';
import { PlainInput } from '../../../components/Plain';
import { Progress } from '../../../components/Progress';
import { usePrinter } from '../../../hooks/printing';
import { useShopData } from '../../../hooks/shop-data';
import type { QuoteTermsInput } from '../../../../core/documents/quote-terms';
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

/** The quote's own terms as typed; empty fields are left to the customer and the shop. */
interface QuoteTermsDraft {
  enquiryReference?: string;
  paymentTerms?: string;
  deliveryTerms?: string;
  packaging?: string;
  certificates?: string;
  estimator?: string;
}

function quoteTerms(d: QuoteTermsDraft): QuoteTermsInput {
  const out: QuoteTermsInput = {};
  for (const key of ['enquiryReference', 'paymentTerms', 'deliveryTerms', 'packaging', 'estimator'] as const) {
    const v = d[key]?.trim();
    if (v) out[key] = v;
  }
  const certificates = (d.certificates ?? '').split(';').map((c) => c.trim()).filter((c) => c !== '');
  if (certificates.length > 0) out.certificates = certificates;
  return out;
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
  const [customerOrder, setCustomerOrder] = useState('');
  const [terms, setTerms] = useState<QuoteTermsDraft>({});
  const shop = useShopData();
  const shopTerms = shop.settings?.quoteTerms;
  const customerTerms = shop.customers.find((c) => c.id === job.customer?.id)?.paymentTerms;
  const quoteExtras = { terms: quoteTerms(terms) };
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
          <PlainInput label="Customer order no." value={customerOrder} onChange={setCustomerOrder} hint="Printed in the job block" />
          <PlainInput label="Pieces to make" value={quantityText} onChange={setQuantityText} numeric
            placeholder={job.orderQuantity ? String(job.orderQuantity) : ''}
            hint={quantityBad ? 'a whole number of pieces' : job.orderQuantity ? `Empty: the order quantity, ${job.orderQuantity}` : 'The job has no order quantity: give one'} />
          <button type="button" className="button button--primary" disabled={off || quantityBad}
            onClick={() => void run('Printing the traveller', () => printer.print('traveller', job.id, quantity, undefined, { customerOrder }))}>Print traveller (PDF)</button>
        </section>
        <section className="panel" aria-labelledby="quote-title">
          <h3 id="quote-title" className="panel__title">Quotation</h3>
          <p className="muted">Printing issues a new numbered quote: today’s prices for revision {job.revision} are kept with it and never change.
            Each job ticked below is a further line, priced on its own.</p>
          <QuotationLines job={job} chosen={chosen} onChange={setChosen} disabled={off} refresh={issued} />
          <PlainInput label="Customer's enquiry reference" value={terms.enquiryReference ?? ''} onChange={(v) => setTerms({ ...terms, enquiryReference: v })} />
          <details className="quote-terms">
            <summary>Terms on this quote</summary>
            <PlainInput label="Payment terms" value={terms.paymentTerms ?? ''} placeholder={customerTerms || shopTerms?.paymentTerms}
              onChange={(v) => setTerms({ ...terms, paymentTerms: v })} hint={customerTerms ? 'Empty: the customer’s terms' : 'Empty: the shop’s terms'} />
            <PlainInput label="Delivery terms" value={terms.deliveryTerms ?? ''} placeholder={shopTerms?.deliveryTerms} onChange={(v) => setTerms({ ...terms, deliveryTerms: v })} />
            <PlainInput label="Packaging" value={terms.packaging ?? ''} placeholder={shopTerms?.packaging} onChange={(v) => setTerms({ ...terms, packaging: v })} />
            <PlainInput label="Certificates (separate with ;)" value={terms.certificates ?? ''} placeholder={shopTerms?.certificates.join('; ')}
              onChange={(v) => setTerms({ ...terms, certificates: v })} />
            <PlainInput label="Estimator" value={terms.estimator ?? ''} placeholder={shopTerms?.estimator} onChange={(v) => setTerms({ ...terms, estimator: v })} />
          </details>
          <button type="button" className="button button--primary" disabled={off}
            onClick={() => void run('Issuing and printing the quote', () => printer.quotation(lines, undefined, quoteExtras))}>{issueLabel}</button>
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
        void run('Issuing and printing the quote', () => printer.quotation(lines, reason, quoteExtras));
      }} />
      <IssuedQuotes job={job} refresh={issued} disabled={off} onReprint={(number) => void run(`Reprinting ${number}`, () => printer.reprint(number))} />
    </div>
  );
}
