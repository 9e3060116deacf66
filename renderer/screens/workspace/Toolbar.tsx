import type { JobEditor } from '../../hooks/useJobEditor';
import { shopDay } from '../../model/shop-days';

function saveStatus(e: JobEditor, problems: number): { text: string; tone: 'ok' | 'busy' | 'warn' | 'error' } {
  if (e.saving) return { text: 'Saving…', tone: 'busy' };
  if (e.saveError) return { text: `Not saved: ${e.saveError.message}`, tone: 'error' };
  if (e.dirty && !e.valid) {
    return { text: `Not saved yet: ${problems} field${problems === 1 ? '' : 's'} to complete or correct`, tone: 'warn' };
  }
  if (e.dirty && !e.complete) {
    return { text: `Other edits saved; ${problems} field${problems === 1 ? '' : 's'} to correct (the saved value stands meanwhile)`, tone: 'warn' };
  }
  if (e.dirty) return { text: 'Saving shortly…', tone: 'busy' };
  if (e.elsewhere) return { text: `Saved · revision ${e.job?.revision ?? ''} · ${e.elsewhere.by || 'someone'} is editing it at another desk`, tone: 'warn' };
  if (e.job?.working) return { text: `Saved · working on revision ${e.job.revision + 1} · ${e.job.updatedAt.slice(11, 16)} UTC`, tone: 'ok' };
  if (e.job) return { text: `Saved · revision ${e.job.revision} · ${e.job.updatedAt.slice(11, 16)} UTC`, tone: 'ok' };
  return { text: 'New job: it saves itself once the spring is complete', tone: 'warn' };
}

interface ToolbarProps {
  editor: JobEditor;
  problems: number;
  onSave(): void;
  onSimilar(): void;
  onCopy(): void;
  onArchive(archived: boolean): void;
}

export function Toolbar({ editor, problems, onSave, onSimilar, onCopy, onArchive }: ToolbarProps) {
  const status = saveStatus(editor, problems);
  const job = editor.job;
  const settled = job !== null && !editor.dirty && !editor.saving;
  return (
    <div className="toolbar">
      <div className="toolbar__title">
        <span className="toolbar__number">{job ? job.number : 'New job'}</span>
        <span className="toolbar__sub">{job ? [job.customer?.name, job.partNumber].filter(Boolean).join(' · ') || 'no customer yet' : 'not in the store yet'}
          {job?.archivedAt ? <span className="badge" title={`archived ${shopDay(job.archivedAt)}`}> archived</span> : null}</span>
      </div>
      <p className={`save-status save-status--${status.tone}`} role="status" aria-live="polite" data-save={status.tone}>{status.text}</p>
      <div className="toolbar__actions">
        <button type="button" className="button" onClick={() => void editor.undo()} disabled={!editor.canUndo} aria-keyshortcuts="Control+Z">Undo</button>
        <button type="button" className="button" onClick={() => void editor.redo()} disabled={!editor.canRedo} aria-keyshortcuts="Control+Shift+Z">Redo</button>
        <button type="button" className="button" onClick={onSimilar} disabled={!editor.evaluation.spec} aria-keyshortcuts="Alt+S">Find similar</button>
        <button type="button" className="button" onClick={onCopy} disabled={!settled}
          title="A new job with the next number, this spec and the order fields; the two jobs stay linked">New job from this one</button>
        {job ? (
          <button type="button" className="button" onClick={() => onArchive(job.archivedAt === null)} disabled={!settled}>
            {job.archivedAt === null ? 'Archive' : 'Back to the list'}
          </button>
        ) : null}
        <button type="button" className="button button--primary" onClick={onSave} aria-keyshortcuts="Control+S">Save now</button>
      </div>
    </div>
  );
}
