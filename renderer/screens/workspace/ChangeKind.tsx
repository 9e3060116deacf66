import type { JobEditor } from '../../hooks/useJobEditor';

const ASKS = new Set(['change-kind-needed', 'drawing-revision-needed']);

/**
 * A quoted, ordered or in-production job went to the customer or the floor as it stood: an edit is either a
 * new drawing revision (a quoted job goes back to draft for a new quote) or a correction of the same drawing.
 * A done job is not edited in place.
 */
export function ChangeKind({ editor }: { editor: JobEditor }) {
  const e = editor.saveError;
  if (e?.code === 'job-done') {
    return <div className="notice notice--warn" role="alert"><p><strong>This job is done.</strong> It is not edited in place: undo the change, and copy the job to a new one for a repeat or a change.</p></div>;
  }
  if (!e || !ASKS.has(e.code) || !editor.job) return null;
  return (
    <div className="notice notice--warn change-kind" role="alert">
      <p><strong>Job {editor.job.number} is {editor.job.status}.</strong> Is this change a new drawing revision, or a correction of the same drawing?</p>
      {e.code === 'drawing-revision-needed' ? <p className="error-text">A new drawing revision needs its new revision letter in the Drawing revision field.</p> : null}
      <div className="button-row">
        <button type="button" className="button" onClick={() => void editor.setChange('drawing-revision')}>New drawing revision</button>
        <button type="button" className="button" onClick={() => void editor.setChange('correction')}>Correction</button>
        <button type="button" className="button button--quiet" onClick={editor.revert}>Undo the change</button>
      </div>
    </div>
  );
}
