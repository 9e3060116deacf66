import type { Job } from '../../../../core/api';
import { useApi } from '../../../api';
import { useQuery } from '../../../hooks/useQuery';

/** The most jobs of one customer offered as further lines: a quotation holds a long enquiry, not a whole account. */
const OFFERED = 60;

/**
 * Other open jobs (draft or quoted) of the job's customer, to quote on the same quotation as further lines.
 * The job itself is line 1; the ticked jobs follow in the order they were created.
 */
export function QuotationLines({ job, chosen, onChange, disabled, refresh }: {
  job: Job; chosen: ReadonlySet<number>; onChange(next: Set<number>): void; disabled: boolean;
  /** Changes after each issue: the jobs just quoted show their new status. */
  refresh: number;
}) {
  const api = useApi();
  const customer = job.customer;
  const others = useQuery(customer ? `quotation-lines-${customer.id}-${job.id}-${job.revision}-${refresh}` : null,
    () => api.listJobs({ customerId: customer!.id, status: ['draft', 'quoted'], sort: 'number', direction: 'asc', limit: OFFERED }));
  if (!customer) return <p className="muted">A job with a customer can be quoted together with the customer’s other jobs.</p>;
  const jobs = (others.value?.jobs ?? []).filter((j) => j.id !== job.id);
  const toggle = (id: number, on: boolean) => {
    const next = new Set(chosen);
    if (on) next.add(id);
    else next.delete(id);
    onChange(next);
  };
  return (
    <fieldset className="quotation-lines" disabled={disabled}>
      <legend>Also on this quotation: other open jobs of {customer.name}</legend>
      {others.state === 'ok' && jobs.length === 0 ? <p className="muted">No other draft or quoted job for this customer.</p> : null}
      {jobs.length > 0 ? (
        <ul className="plain-list">
          {jobs.map((j) => (
            <li key={j.id}>
              <label title={j.problem ? j.problem.message : undefined}>
                <input type="checkbox" checked={chosen.has(j.id)} disabled={!!j.problem} onChange={(e) => toggle(j.id, e.target.checked)} />
                {' '}{j.number} · {j.partNumber || 'no part number'}{j.drawingNumber ? ` · ${j.drawingNumber} rev. ${j.drawingRevision}` : ''} · {j.status}
              </label>
            </li>
          ))}
        </ul>
      ) : null}
      {others.error ? <p className="error-text" role="alert">{others.error.message}</p> : null}
    </fieldset>
  );
}
