import type { SimilarJob } from '../../../core/api';
import { formatQuantity } from '../../../core/format';
import { useApi } from '../../api';
import { Dialog } from '../../components/Dialog';
import { useQuery } from '../../hooks/useQuery';
import { useNavigation } from '../../hooks/navigation';
import { dimensionLabels } from '../../model/labels';

const shownDimensions = ['wireDiameter', 'outerDiameter', 'freeLength', 'activeCoils', 'rate'] as const;

/** How far a difference is from "same", for its colour: within 5 %, within 15 %, beyond. */
function closeness(text: string): 'same' | 'near' | 'mid' | 'far' {
  if (text === 'same') return 'same';
  const pct = Math.abs(Number(text.replace(/[^\d.]/g, '')));
  return pct <= 5 ? 'near' : pct <= 15 ? 'mid' : 'far';
}

export function Differences({ hit }: { hit: SimilarJob }) {
  const material = hit.differences.material;
  return (
    <ul className="diffs" aria-label={`Differences: ${hit.summary}`}>
      {shownDimensions.map((k) => {
        const text = hit.differences[k];
        return <li key={k} className={`diff diff--${closeness(text)}`}><b>{dimensionLabels[k]}</b> {text}</li>;
      })}
      <li className={`diff diff--${material === 'same' ? 'same' : material === 'same family' ? 'mid' : 'far'}`}>
        <b>material</b> {material === 'same' ? 'same' : `${material} (${hit.job.shape.material})`}
      </li>
    </ul>
  );
}

interface SimilarProps {
  open: boolean;
  onClose(): void;
  /** The spec to compare with (a stored job's or the one being edited); null asks nothing. */
  spec: unknown;
  excludeJobId?: number;
  subject: string;
}

/** Past jobs nearest to a spring, each with its per-dimension differences. */
export function SimilarJobsDialog({ open, onClose, spec, excludeJobId, subject }: SimilarProps) {
  const api = useApi();
  const nav = useNavigation();
  const key = open && spec ? JSON.stringify([spec, excludeJobId]) : null;
  const q = useQuery(key, () => api.similarJobs({ spec, excludeJobId, limit: 10 }));
  return (
    <Dialog title={`Jobs like ${subject}`} open={open} onClose={onClose} wide>
      <p className="hint">Nearest first. Differences are the past job against this one: “OD +3 %” means its outside diameter is 3 % larger.</p>
      {q.state === 'loading' ? <p role="status">Looking for similar springs…</p> : null}
      {q.state === 'error' ? <p className="error-text" role="alert">{q.error.message}</p> : null}
      {q.state === 'ok' && q.value.length === 0 ? <p role="status">No similar job in the store yet.</p> : null}
      {q.value && q.value.length > 0 ? (
        <table className="table similar">
          <thead><tr><th scope="col">Job</th><th scope="col">Customer / part</th><th scope="col">Match</th><th scope="col">Spring</th><th scope="col">Differences</th></tr></thead>
          <tbody>
            {q.value.map((hit) => (
              <tr key={hit.id}>
                <td className="nowrap">
                  <button type="button" className="link" onClick={() => { onClose(); nav.openJob(hit.id); }}>
                    {hit.number}
                  </button>
                </td>
                <td>{hit.job.customer?.name ?? '—'}<br /><span className="muted">{hit.job.partNumber || 'no part number'}</span></td>
                <td className="num">{Math.round(hit.score * 100)} %</td>
                <td className="muted nowrap">
                  d {formatQuantity(hit.job.shape.wireDiameter, 'length', hit.job.shape.units)}<br />
                  OD {formatQuantity(hit.job.shape.outerDiameter, 'length', hit.job.shape.units)}
                </td>
                <td><Differences hit={hit} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </Dialog>
  );
}
