import type { Job } from '../../../../core/api';
import { useNavigation } from '../../../hooks/navigation';
import { shopDay } from '../../../model/shop-days';

/** Where the job came from and the jobs made from it, each a link. */
export function Lineage({ job }: { job: Job }) {
  const nav = useNavigation();
  const { copiedFrom, copiedTo } = job.lineage;
  if (!copiedFrom && copiedTo.length === 0) return null;
  const link = (l: { id: number; number: string }) => (
    <button type="button" className="link" onClick={() => nav.openJob(l.id)} aria-label={`Open job ${l.number}`}>{l.number}</button>
  );
  return (
    <ul className="lineage" aria-label="Copies">
      {copiedFrom ? <li>Made from job {link(copiedFrom)} on {shopDay(copiedFrom.at)}.</li> : null}
      {copiedTo.map((l) => <li key={l.id}>Copied to job {link(l)} on {shopDay(l.at)}.</li>)}
    </ul>
  );
}
