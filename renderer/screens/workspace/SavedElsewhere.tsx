import type { JobEditor } from '../../hooks/useJobEditor';

/**
 * The job was saved on another desk after it was opened here: nothing of either save is lost. The notice
 * lists each field both saves changed, the saved value beside this desk's, and lets the estimator keep
 * theirs as the next revision or take the saved one.
 */
export function SavedElsewhere({ editor }: { editor: JobEditor }) {
  const e = editor.saveError;
  if (e?.code !== 'stale-revision' || !editor.job) return null;
  const differences = (e.details ?? []).filter((d) => d.code === 'changed-since');
  return (
    <div className="notice notice--warn" role="alert" data-testid="saved-elsewhere">
      <p><strong>Job {editor.job.number} was saved elsewhere while you were editing it.</strong> {e.message.split(': nothing was saved')[0]}.</p>
      {differences.length > 0 && (
        <ul>{differences.map((d) => <li key={d.path}><code>{d.path}</code>: {d.message}</li>)}</ul>
      )}
      <div className="button-row">
        <button type="button" className="button button--primary" onClick={() => void editor.resolveSavedElsewhere('mine')}>Save mine as the next revision</button>
        <button type="button" className="button" onClick={() => void editor.resolveSavedElsewhere('saved')}>Take the saved version</button>
      </div>
    </div>
  );
}
