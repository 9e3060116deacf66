import type { SimilarJob } from '../../../core/api';
import { formatQuantity } from '../../../core/format';
import { useApi } from '../../api';
import { Dialog } from '../../components/Dialog';
import { useQuery } from '../../hooks/useQuery';
import { useNavigation } from '../../hooks/navigation';
import { dimensionLabels, statusLabels } from '../../model/labels';
import { money } from '../../model/shown';
import { useCopyJob } from './useCopyJob';
import { shopDay } from '../../model/shop-days';

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

const matchTone: Record<SimilarJob['match']['words'], string> = {
  'same spring': 'same', 'very close': 'near', close: 'near', 'loosely similar': 'mid', far: 'far',
};

function Match({ hit }: { hit: SimilarJob }) {
  return (
    <>
      <span className={`match match--${matchTone[hit.match.words]}`}>{hit.match.words}</span>
      {hit.match.biggest ? <><br /><span className="muted">most different: {hit.match.biggest}</span></> : null}
    </>
  );
}

function LastQuoted({ hit }: { hit: SimilarJob }) {
  const q = hit.lastQuoted;
  if (!q) return <span className="muted">never quoted</span>;
  return (
    <>
      <b>{money(q.unitPrice, q.currency)}</b> each at {q.quantity.toLocaleString('en-US')} pcs
      <br /><span className="muted">{q.quoteNumber}, {shopDay(q.issuedAt)}</span>
    </>
  );
}

interface SimilarProps {
  open: boolean;
  onClose(): void;
  /** The spec to compare with (a stored job's or the one being edited); null asks nothing. */
  spec: unknown;
  excludeJobId?: number;
  /** The quantity asked about: each hit's last price is read at its break nearest this. */
  quantity?: number | null;
  subject: string;
}

/** Past jobs nearest to a spring: how near in words, status and date, the last price quoted, and a copy button. */
export function SimilarJobsDialog({ open, onClose, spec, excludeJobId, quantity, subject }: SimilarProps) {
  const api = useApi();
  const nav = useNavigation();
  const copier = useCopyJob();
  const key = open && spec ? JSON.stringify([spec, excludeJobId, quantity]) : null;
  const q = useQuery(key, () => api.similarJobs({ spec, excludeJobId, limit: 10, ...(quantity ? { quantity } : {}) }));
  return (
    <Dialog title={`Jobs like ${subject}`} open={open} onClose={onClose} wide>
      <p className="hint">Nearest first. Differences are the past job against this one: “OD +3 %” means its outside diameter is 3 % larger.
        The price is the past job&apos;s last quote at the break nearest {quantity ? `${quantity.toLocaleString('en-US')} pcs` : 'its own order quantity'}.</p>
      {q.state === 'loading' ? <p role="status">Looking for similar springs…</p> : null}
      {q.state === 'error' ? <p className="error-text" role="alert">{q.error.message}</p> : null}
      {copier.error ? <p className="error-text" role="alert">{copier.error.message}</p> : null}
      {q.state === 'ok' && q.value.length === 0 ? <p role="status">No similar job in the store yet.</p> : null}
      {q.value && q.value.length > 0 ? (
        <table className="table similar">
          <thead><tr><th scope="col">Job</th><th scope="col">Customer / part</th><th scope="col">Match</th><th scope="col">Last quoted</th>
            <th scope="col">Spring</th><th scope="col">Differences</th></tr></thead>
          <tbody>
            {q.value.map((hit) => (
              <tr key={hit.id}>
                <td className="nowrap">
                  <button type="button" className="link" onClick={() => { onClose(); nav.openJob(hit.id); }}>{hit.number}</button>
                  <br /><span className={`status status--${hit.job.status}`}>{statusLabels[hit.job.status]}</span>
                  {hit.job.archivedAt ? <span className="muted"> · archived</span> : null}
                  <br /><span className="muted">{shopDay(hit.job.updatedAt)}</span>
                  <br /><button type="button" className="button button--small similar__copy" disabled={copier.busy} aria-label={`New job from ${hit.number}`}
                    onClick={() => void copier.copy(hit.id).then((done) => { if (done) onClose(); })}>New job from this one</button>
                </td>
                <td>{hit.job.customer?.name ?? '—'}<br /><span className="muted">{hit.job.partNumber || 'no part number'}</span></td>
                <td><Match hit={hit} /></td>
                <td className="nowrap"><LastQuoted hit={hit} /></td>
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
