import type { Spec } from '../../../../core/spec';
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

/** Every saved revision, newest first; any of them can come back (as a new revision: nothing is overwritten). */
export function HistoryPane({ editor }: { editor: JobEditor }) {
  const job = editor.job;
  if (!job) return <div className="pane"><p className="notice">A new job has no history until it saves.</p></div>;
  const timeline = timelineOf(editor.revisions);
  const current = timeline.states[timeline.position];
  const revisions = [...editor.revisions].sort((a, b) => b.revision - a.revision);
  return (
    <div className="pane">
      <Lineage job={job} />
      <p className="muted">Undo (Ctrl+Z) steps back one saved revision and Redo steps forward; both work after a restart,
        because they are kept as revisions too. Restoring never deletes a revision.</p>
      <table className="table history">
        <thead><tr><th scope="col" className="num">Rev</th><th scope="col">Saved (UTC)</th><th scope="col">What</th><th scope="col">Spring</th><th scope="col">Status</th><th scope="col"><span className="sr-only">Actions</span></th></tr></thead>
        <tbody>
          {revisions.map((r) => {
            const isHead = r.revision === job.revision;
            return (
              <tr key={r.revision} className={isHead ? 'is-selected' : undefined}>
                <td className="num">{r.revision}</td>
                <td className="nowrap">{r.savedAt.slice(0, 16).replace('T', ' ')}</td>
                <td>{r.reason}{r.revision === current && !isHead ? ' (the state now)' : ''}</td>
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
