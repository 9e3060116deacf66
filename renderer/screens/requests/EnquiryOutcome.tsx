import { useState } from 'react';
import type { Enquiry, EnquiryJobs, RequestImportResult } from '../../../core/api';
import { kindLabel } from '../../../core/vocabulary';
import { useApi } from '../../api';
import { useNavigation } from '../../hooks/navigation';
import { useQuery } from '../../hooks/useQuery';
import { QuoteSelected } from '../jobs/QuoteSelected';
import { shopDay } from '../../model/shop-days';

/** An enquiry's jobs as the store lists them now, in sheet order, each one click from its workspace. */
export function EnquiryJobsTable({ enquiry }: { enquiry: Enquiry }) {
  const api = useApi();
  const nav = useNavigation();
  const jobs = useQuery<EnquiryJobs>(`enquiry-${enquiry.id}`, () => api.enquiryJobs({ id: enquiry.id }));
  if (jobs.error) return <p className="error-text" role="alert">{jobs.error.message}</p>;
  if (!jobs.value) return null;
  // The enquiry's jobs not yet ordered, in sheet order: one quotation, a line each.
  const open = new Set(jobs.value.jobs.filter((j) => j.status === 'draft' || j.status === 'quoted').map((j) => j.id));
  return (
    <div className="table-wrap">
      <div className="toolbar">
        <QuoteSelected selected={open} label={`Quote enquiry ${enquiry.reference}`} onDone={jobs.reload} />
      </div>
      <table className="table table--compact" aria-label={`Jobs of enquiry ${enquiry.reference}`}>
        <thead><tr><th>Sheet row</th><th>Job</th><th>Part</th><th>Drawing</th><th>Kind</th><th>Status</th></tr></thead>
        <tbody>
          {jobs.value.jobs.map((j) => (
            <tr key={j.id}>
              <td>{j.sheetRow}</td>
              <td><button type="button" className="link" onClick={() => nav.openJob(j.id)} aria-label={`Open job ${j.number}`}>{j.number}</button></td>
              <td>{j.partNumber}</td>
              <td>{j.drawingNumber}</td>
              <td>{kindLabel(j.shape.kind)}</td>
              <td><span className={`status status--${j.status}`}>{j.status}</span></td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** What the import did, and the enquiry's jobs. */
export function EnquiryOutcome({ result }: { result: RequestImportResult }) {
  const { enquiry } = result;
  return (
    <section className="panel" aria-labelledby="enquiry-title">
      <h2 id="enquiry-title" className="panel__title">Enquiry {enquiry.reference} from {enquiry.customer.name}</h2>
      <p className="ok-text" role="status">
        {result.jobs.length} draft job{result.jobs.length === 1 ? '' : 's'} imported from {enquiry.source}, ready to be quoted together.
        {result.mappingSaved ? ' The column mapping is kept for this customer.' : ''}
      </p>
      {result.skipped.length > 0 ? (
        <div>
          <p>Not imported:</p>
          <ul>{result.skipped.map((s) => <li key={s.row}>Row {s.row}: {s.reason}</li>)}</ul>
        </div>
      ) : <p className="muted">No row was left out.</p>}
      <EnquiryJobsTable enquiry={enquiry} />
    </section>
  );
}

/** The enquiries received so far, newest first; each opens to its jobs. */
export function RecentEnquiries({ refreshKey }: { refreshKey: number }) {
  const api = useApi();
  const [open, setOpen] = useState<number | null>(null);
  const list = useQuery<Enquiry[]>(`enquiries-${refreshKey}`, () => api.listEnquiries({ limit: 20 }));
  if (!list.value || list.value.length === 0) return null;
  return (
    <section className="panel" aria-labelledby="enquiries-title">
      <h2 id="enquiries-title" className="panel__title">Recent enquiries</h2>
      <div className="table-wrap">
        <table className="table table--compact">
          <thead><tr><th>Reference</th><th>Customer</th><th>Received</th><th>From</th><th className="num">Jobs</th><th /></tr></thead>
          <tbody>
            {list.value.map((e) => (
              <tr key={e.id} className={open === e.id ? 'is-selected' : undefined}>
                <td>{e.reference}</td><td>{e.customer.name}</td><td>{shopDay(e.receivedAt)}</td><td>{e.source}</td>
                <td className="num">{e.jobCount}</td>
                <td><button type="button" className="button button--small" aria-expanded={open === e.id}
                  onClick={() => setOpen(open === e.id ? null : e.id)}>{open === e.id ? 'Hide jobs' : `Jobs of ${e.reference}`}</button></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {open !== null ? <EnquiryJobsTable enquiry={list.value.find((e) => e.id === open)!} /> : null}
    </section>
  );
}
