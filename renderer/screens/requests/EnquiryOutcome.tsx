import type { EnquiryJobs, RequestImportResult } from '../../../core/api';
import { kindLabel } from '../../../core/vocabulary';
import { useApi } from '../../api';
import { useNavigation } from '../../hooks/navigation';
import { useQuery } from '../../hooks/useQuery';

/** What the import did, and the enquiry's jobs as the store now lists them, each one click from its workspace. */
export function EnquiryOutcome({ result }: { result: RequestImportResult }) {
  const api = useApi();
  const nav = useNavigation();
  const { enquiry } = result;
  const jobs = useQuery<EnquiryJobs>(`enquiry-${enquiry.id}`, () => api.enquiryJobs({ id: enquiry.id }));
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
      {jobs.error ? <p className="error-text" role="alert">{jobs.error.message}</p> : null}
      {jobs.value ? (
        <div className="table-wrap">
          <table className="table table--compact" aria-label={`Jobs of enquiry ${enquiry.reference}`}>
            <thead><tr><th>Sheet row</th><th>Job</th><th>Part</th><th>Kind</th><th>Status</th></tr></thead>
            <tbody>
              {jobs.value.jobs.map((j) => (
                <tr key={j.id}>
                  <td>{j.sheetRow}</td>
                  <td><button type="button" className="link" onClick={() => nav.openJob(j.id)} aria-label={`Open job ${j.number}`}>{j.number}</button></td>
                  <td>{j.partNumber}</td>
                  <td>{kindLabel(j.shape.kind)}</td>
                  <td><span className={`status status--${j.status}`}>{j.status}</span></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
