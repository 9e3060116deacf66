import type { Job, QuoteSummary } from '../../../../core/api';
import { useApi } from '../../../api';
import { useQuery } from '../../../hooks/useQuery';
import { shopDay } from '../../../model/shop-days';

/** What else a quotation carried besides this job: "line 2 of 3, with J-26-0004 (KPS-0905), …", or "only this job". */
function linesText(q: QuoteSummary, jobId: number): string {
  if (q.lines.length <= 1) return 'only this job';
  const own = q.lines.find((l) => l.jobId === jobId);
  const others = q.lines.filter((l) => l.jobId !== jobId).map((l) => `${l.jobNumber}${l.partNumber ? ` (${l.partNumber})` : ''}`);
  return `line ${own?.line ?? '?'} of ${q.lines.length}, with ${others.join(', ')}`;
}

/** Every quotation the job is a line of, newest first, each reprinted from its own snapshot. */
export function IssuedQuotes({ job, refresh, disabled, onReprint }: { job: Job; refresh: number; disabled: boolean; onReprint(number: string): void }) {
  const api = useApi();
  const quotes = useQuery(`quotes-${job.id}-${job.revision}-${refresh}`, () => api.listQuotes({ jobId: job.id }));
  return (
    <section className="panel" aria-labelledby="quotes-title">
      <h3 id="quotes-title" className="panel__title">Issued quotes</h3>
      {quotes.value && quotes.value.length === 0 ? <p className="muted">No quote issued for this job yet.</p> : null}
      {quotes.value && quotes.value.length > 0 ? (
        <table className="table">
          <thead><tr><th scope="col">Quote</th><th scope="col">Issued</th><th scope="col">Valid until</th><th scope="col" className="num">Job revision</th><th scope="col">Lines</th><th scope="col">Currency</th><th scope="col"><span className="sr-only">Actions</span></th></tr></thead>
          <tbody>
            {quotes.value.map((q) => (
              <tr key={q.id}>
                <td>{q.number}</td><td>{shopDay(q.issuedAt)}</td><td>{q.validUntil}</td><td className="num">{q.lines.find((l) => l.jobId === job.id)?.jobRevision ?? q.jobRevision}</td>
                <td data-quote-lines={q.number}>{linesText(q, job.id)}</td><td>{q.currency}</td>
                <td><button type="button" className="button button--small" disabled={disabled} onClick={() => onReprint(q.number)}>Reprint {q.number}</button></td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {quotes.error ? <p className="error-text" role="alert">{quotes.error.message}</p> : null}
    </section>
  );
}
