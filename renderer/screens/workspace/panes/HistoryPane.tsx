import type { Job } from '../../../../core/api';
import type { Spec } from '../../../../core/spec';
import type { Change, SavedState } from '../../../model/revision-diff';
import { revisionChanges } from '../../../model/revision-diff';
import { unitSymbol } from '../../../../core/units';
import { numberText } from '../../../model/numbers';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { timelineOf } from '../../../model/timeline';
import { statusLabels } from '../../../model/labels';
import { kindLabel } from '../../../../core/vocabulary';
import { Lineage } from './Lineage';

/** One line for a revision's spring; a stored spec holds its values in its own units. */
function springText(s: Spec): string {
  const mm = unitSymbol('length', s.units);
  const coil = s.outerDiameter ?? s.innerDiameter ?? s.meanDiameter;
  const which = s.outerDiameter !== undefined ? 'OD' : s.innerDiameter !== undefined ? 'ID' : 'D';
  return `${kindLabel(s.kind)}: d ${numberText(s.wireDiameter)} ${mm}, ${which} ${numberText(coil)} ${mm}, ${s.material}`;
}

function Changes({ changes }: { changes: Change[] }) {
  if (changes.length === 0) return <span className="muted">no change to the part</span>;
  return (
    <ul className="history__changes">
      {changes.map((c, i) => <li key={i}>{c.field}: {c.before} → {c.after}</li>)}
    </ul>
  );
}

/** What the job holds now, as a revision would keep it. */
const currentState = (job: Job): SavedState => ({
  spec: job.spec,
  fields: {
    customerId: job.customer?.id ?? null, customerName: job.customer?.name ?? null, partNumber: job.partNumber,
    drawingNumber: job.drawingNumber, drawingRevision: job.drawingRevision, status: job.status, notes: job.notes,
    dueDate: job.dueDate, orderQuantity: job.orderQuantity, leadTimeDays: job.leadTimeDays, judgement: job.judgement,
  },
});

/** Every saved revision, newest first; any of them can come back (as a new revision: nothing is overwritten). */
export function HistoryPane({ editor }: { editor: JobEditor }) {
  const job = editor.job;
  if (!job) return <div className="pane"><p className="notice">A new job has no history until it saves.</p></div>;
  const timeline = timelineOf(editor.revisions);
  const current = timeline.states[timeline.position];
  const revisions = [...editor.revisions].sort((a, b) => b.revision - a.revision);
  const previous = (n: number) => revisions.find((r) => r.revision < n);
  const head = revisions.find((r) => r.revision === job.revision);
  return (
    <div className="pane">
      <Lineage job={job} />
      <p className="muted">Undo (Ctrl+Z outside a text field) steps back one saved revision and Redo steps forward; both work after a restart,
        because they are kept as revisions too. Restoring never deletes a revision.</p>
      <table className="table history">
        <thead><tr><th scope="col" className="num">Rev</th><th scope="col">Saved (UTC)</th><th scope="col">What</th><th scope="col">Changes</th><th scope="col">Spring</th><th scope="col">Status</th><th scope="col"><span className="sr-only">Actions</span></th></tr></thead>
        <tbody>
          {job.working ? (
            <tr className="history__working">
              <td className="num">—</td>
              <td className="nowrap">{job.working.savedAt.slice(0, 16).replace('T', ' ')}</td>
              <td>working, not kept yet ({job.working.saves} autosave{job.working.saves === 1 ? '' : 's'} since {job.working.openedAt.slice(11, 16)}{editor.elsewhere ? `, by ${editor.elsewhere.by || 'someone'} at another desk` : ''}); kept as one revision on save or when the job is left</td>
              <td>{head ? <Changes changes={revisionChanges(head, currentState(job))} /> : null}</td>
              <td className="nowrap">{springText(job.spec)}</td>
              <td>{statusLabels[job.status]}</td>
              <td />
            </tr>
          ) : null}
          {revisions.map((r) => {
            const isHead = r.revision === job.revision && !job.working;
            const before = previous(r.revision);
            return (
              <tr key={r.revision} className={isHead ? 'is-selected' : undefined}>
                <td className="num">{r.revision}</td>
                <td className="nowrap">{r.savedAt.slice(0, 16).replace('T', ' ')}</td>
                <td>{r.reason}{r.revision === current && !isHead ? ' (the state now)' : ''}</td>
                <td>{before ? <Changes changes={revisionChanges(before, r)} /> : <span className="muted">first revision</span>}</td>
                <td className="nowrap">{r.spec ? springText(r.spec) : <span className="error-text">{r.problem?.message}</span>}</td>
                <td>{statusLabels[r.fields.status]}</td>
                <td>
                  {isHead ? <span className="muted">current</span> : r.spec ? (
                    <button type="button" className="button button--small" onClick={() => void editor.restore(r.revision)}>Restore revision {r.revision}</button>
                  ) : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
