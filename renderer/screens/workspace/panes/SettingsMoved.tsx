import { useState } from 'react';
import type { JobCostReview } from '../../../../core/api';
import { nothingMoved } from '../../../../core/costing/changes';
import { useApi } from '../../../api';
import { useQuery } from '../../../hooks/useQuery';
import { money } from '../../../model/shown';

const signed = (v: number, c: string) => `${v >= 0 ? '+' : '−'}${money(Math.abs(v), c)}`;
const when = (iso: string | null) => (iso ? iso.slice(0, 16).replace('T', ' ') : 'the last save');

/**
 * A saved job whose price a settings change has moved: each machine move and each line, by how much, until
 * the estimator accepts the new figures.
 */
export function SettingsMoved({ jobId, revision, currency }: { jobId: number; revision: number; currency: string }) {
  const api = useApi();
  const [accepted, setAccepted] = useState<JobCostReview | null>(null);
  const review = useQuery(`moved-${jobId}-${revision}`, () => api.jobCostChanges({ jobId }), 0);
  const shown = accepted ?? review.value;
  if (!shown || nothingMoved(shown.changes)) return null;
  const c = shown.changes;
  const accept = async () => {
    const r = await api.acceptJobCost({ jobId });
    if (r.ok) setAccepted(r.value);
  };
  return (
    <section className="notice notice--warn settings-moved" role="alert" aria-labelledby="moved-title">
      <h3 id="moved-title">Shop settings have changed this job’s price since {shown.acceptedAt ? `you accepted it (${when(shown.acceptedAt)})` : 'it was saved'}</h3>
      {c.machines.length > 0 ? (
        <ul className="moved-machines">
          {c.machines.map((m) => <li key={`${m.quantity}-${m.key}`}>{m.title} at {m.quantity} pcs: {m.from ?? 'no machine'} → {m.to ?? 'no machine'}</li>)}
        </ul>
      ) : null}
      <table className="table moved-lines">
        <thead><tr><th scope="col" className="num">Qty</th><th scope="col">Line</th><th scope="col" className="num">Was</th><th scope="col" className="num">Now</th><th scope="col" className="num">Change</th></tr></thead>
        <tbody>
          {c.lines.map((l) => (
            <tr key={`${l.quantity}-${l.key}`} data-line={l.key}>
              <td className="num">{l.quantity}</td><td>{l.item}</td><td className="num">{money(l.before, currency)}</td>
              <td className="num">{money(l.after, currency)}</td><td className="num">{signed(l.difference, currency)}</td>
            </tr>
          ))}
          {c.prices.map((p) => (
            <tr key={`total-${p.quantity}`} className="moved-total">
              <td className="num">{p.quantity}</td><th scope="row">Total</th><td className="num">{money(p.totalBefore, currency)}</td>
              <td className="num">{money(p.totalAfter, currency)}</td><td className="num">{signed(p.difference, currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <button type="button" className="button" onClick={() => void accept()}>Accept the new figures</button>
    </section>
  );
}
