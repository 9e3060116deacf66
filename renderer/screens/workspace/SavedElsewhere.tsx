import type { JobEditor } from '../../hooks/useJobEditor';

/** The two refusals that mean another desk got there first; both are resolved the same way. */
const headings: Record<string, (job: string) => string> = {
  'stale-revision': (job) => `Job ${job} was saved elsewhere while you were editing it.`,
  'edited-elsewhere': (job) => `Job ${job} is being edited at another desk.`,
};

const clock = (iso: string): string => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;

/**
 * The job was saved on another desk after it was opened here, or another desk holds its working copy: nothing
 * of either is lost. The notice lists each field where the two versions differ, the saved value beside this
 * desk's, and lets the estimator keep theirs as the next revision or take the saved one. While nothing was
 * refused yet, a job open at another desk says who is editing it there.
 */
export function SavedElsewhere({ editor }: { editor: JobEditor }) {
  const e = editor.saveError;
  const heading = e ? headings[e.code] : undefined;
  if (!editor.job) return null;
  if (!e || !heading) return <EditingElsewhere editor={editor} />;
  const differences = (e.details ?? []).filter((d) => d.code === 'changed-since');
  return (
    <div className="notice notice--warn" role="alert" data-testid="saved-elsewhere" data-code={e.code}>
      <p><strong>{heading(editor.job.number)}</strong> {e.message.split(': nothing was saved')[0]}.</p>
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

/** Who else has a working copy of this job open, before anything typed here is refused. */
function EditingElsewhere({ editor }: { editor: JobEditor }) {
  const w = editor.elsewhere;
  if (!w) return null;
  return (
    <p className="notice notice--warn" role="status" data-testid="editing-elsewhere">
      <strong>{w.by || 'Someone (name not recorded)'} is editing this job at another desk</strong> (working copy since {clock(w.openedAt)},
      last autosaved {clock(w.savedAt)}). What you type here is not saved over theirs: you will be asked to keep yours as the
      next revision or take theirs.
    </p>
  );
}
