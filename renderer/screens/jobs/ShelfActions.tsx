import { useState } from 'react';
import type { JobSummary } from '../../../core/api';
import { useApi } from '../../api';

type Notice = { kind: 'deleted' | 'archived' | 'restored' | 'error'; text: string; jobId?: number };

/** Archive, put back, delete a draft and undo the deletion, each followed by a notice on the list. */
export function useShelfActions(reload: () => void) {
  const api = useApi();
  const [notice, setNotice] = useState<Notice | null>(null);
  const archive = async (j: JobSummary, archived: boolean) => {
    const r = await api.archiveJob({ id: j.id, archived });
    setNotice(r.ok ? { kind: 'archived', text: archived ? `Job ${j.number} archived: search still finds it.` : `Job ${j.number} is back in the list.` }
      : { kind: 'error', text: r.error.message });
    reload();
  };
  const remove = async (j: JobSummary) => {
    const r = await api.deleteJob({ id: j.id });
    setNotice(r.ok ? { kind: 'deleted', text: `Draft ${j.number} deleted.`, jobId: j.id } : { kind: 'error', text: r.error.message });
    reload();
  };
  const undo = async (jobId: number) => {
    const r = await api.undoDeleteJob({ id: jobId });
    setNotice(r.ok ? { kind: 'restored', text: `Job ${r.value.number} is back, with its history.` } : { kind: 'error', text: r.error.message });
    reload();
  };
  return { notice, archive, remove, undo, dismiss: () => setNotice(null) };
}

export function ShelfNotice({ shelf }: { shelf: ReturnType<typeof useShelfActions> }) {
  const n = shelf.notice;
  if (!n) return null;
  const jobId = n.jobId;
  return (
    <div className={`notice-bar ${n.kind === 'error' ? 'notice-bar--error' : ''}`} role={n.kind === 'error' ? 'alert' : 'status'}>
      <span>{n.text}</span>
      {n.kind === 'deleted' && jobId !== undefined ? (
        <button type="button" className="button button--small" onClick={() => void shelf.undo(jobId)}>Undo</button>
      ) : null}
      <button type="button" className="button button--quiet button--small" onClick={shelf.dismiss} aria-label="Dismiss">×</button>
    </div>
  );
}
