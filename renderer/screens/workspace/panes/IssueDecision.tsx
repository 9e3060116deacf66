import { useState } from 'react';
import type { FieldError } from '../../../../core/result';
import { Dialog } from '../../../components/Dialog';

/** Shortest reason the service takes: a few words that a later reader can act on. */
const MIN_REASON = 3;

/** A gap in the price names the shop setting it lacks (`settings.…`, or `jobIds[1].settings.…` on a line of several). */
const PRICE_PATH = /(^|\.)settings\./;

/**
 * The quote has open errors or an incomplete price: each problem is named, and issuing needs the estimator's
 * reason, which the issued quote keeps. Cancel leaves nothing issued.
 */
export function IssueDecision({ problems, onIssue, onCancel }: { problems: FieldError[] | null; onIssue(reason: string): void; onCancel(): void }) {
  const [reason, setReason] = useState('');
  const ready = reason.trim().length >= MIN_REASON;
  return (
    <Dialog
      title="Issue this quote with its problems?" open={problems !== null} onClose={onCancel}
      actions={<>
        <button type="button" className="button button--primary" disabled={!ready} onClick={() => onIssue(reason.trim())}>Accept and issue</button>
        <button type="button" className="button" onClick={onCancel} autoFocus>Cancel</button>
      </>}
    >
      <p>The quote would go out with these problems{(problems ?? []).some((p) => p.path.startsWith('jobIds')) ? ' (each named with its job)' : ''}:</p>
      <ul className="issue-problems">
        {(problems ?? []).map((p) => (
          <li key={`${p.code}-${p.path}`} data-code={p.code}>
            <strong>{PRICE_PATH.test(p.path) ? 'Price incomplete' : 'Open error'}:</strong> {p.message}
          </li>
        ))}
      </ul>
      <p className="muted">Accepted design problems are printed on the quote in plain words for the customer. The reason stays
        with the issued quote.</p>
      <div className="field">
        <label className="field__label" htmlFor="issue-reason">Reason for accepting them</label>
        <textarea id="issue-reason" className="input" rows={3} value={reason} onChange={(e) => setReason(e.target.value)} />
        {!ready ? <p className="field__hint">say in a few words why, e.g. “customer fits a stop at the working length”</p> : null}
      </div>
    </Dialog>
  );
}
