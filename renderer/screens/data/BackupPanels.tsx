import { useId, useState } from 'react';
import { usePlatform } from '../../api';
import { Dialog } from '../../components/Dialog';
import { Progress } from '../../components/Progress';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { useLongCall } from './useLongCall';
import type { CallState } from './useLongCall';
import { runningLabels } from './wording';

/**
 * How a long call stands: its progress while it runs, then its outcome; `notes` are what a call that succeeded
 * still asks the user to put right (an import's links it could not keep), shown apart from the success.
 */
export function CallOutcome<T>({ call, done, notes, cancel }: {
  call: CallState<T>; done(value: T): string; notes?: (value: T) => string[]; cancel?: () => void;
}) {
  if (call.state === 'running') {
    return (
      <div className="long-call">
        <Progress label={call.label} {...(call.total > 0 ? { value: call.done, max: call.total, detail: `${Math.floor((100 * call.done) / call.total)} %` } : {})} />
        {call.cancellable && cancel ? <button type="button" className="button" onClick={cancel}>Cancel</button> : null}
      </div>
    );
  }
  if (call.state === 'failed') return <p className="error-text" role="alert">{call.message}</p>;
  if (call.state !== 'done') return null;
  const toPutRight = notes?.(call.value) ?? [];
  return (
    <>
      <p className="ok-text" role="status">{done(call.value)}</p>
      {toPutRight.length > 0 ? (
        <ul className="plain-list notice notice--warn" aria-label="To put right">{toPutRight.map((n) => <li key={n}>{n}</li>)}</ul>
      ) : null}
    </>
  );
}

export function BackupPanel() {
  const { storeFiles } = usePlatform();
  const { call, run, cancel, running } = useLongCall<{ message: string }>();
  return (
    <section className="panel" aria-labelledby="backup-title">
      <h2 id="backup-title" className="panel__title">Back up the store</h2>
      <p className="muted">A consistent copy of every job, revision, quote and setting, taken while the store stays open.
        {storeFiles.shellDialogs ? ' You choose where to keep it.' : ' Your browser downloads it.'}</p>
      <button type="button" className="button button--primary" disabled={running}
        onClick={() => void run(runningLabels.backup, (control) => storeFiles.backup(control), true)}>{storeFiles.shellDialogs ? 'Back up…' : 'Download a backup'}</button>
      <CallOutcome call={call} done={(v) => v.message} cancel={cancel} />
    </section>
  );
}

export function RestorePanel() {
  const { storeFiles } = usePlatform();
  const shop = useShopData();
  const bus = useCommandBus();
  const fileId = useId();
  const [picked, setPicked] = useState<File | null>(null);
  const [confirm, setConfirm] = useState(false);
  const { call, run, running } = useLongCall<{ message: string }>();
  const restore = async () => {
    setConfirm(false);
    if (await run(runningLabels.restore, () => storeFiles.restore(picked))) {
      shop.refresh();
      bus.broadcast('data-changed');
    }
  };
  return (
    <section className="panel" aria-labelledby="restore-title">
      <h2 id="restore-title" className="panel__title">Restore a backup</h2>
      <p className="muted">Replaces every job and setting with the backup’s. The store as it is now is kept beside it.</p>
      {storeFiles.shellDialogs ? (
        <button type="button" className="button button--danger" disabled={running} onClick={() => void restore()}>Restore…</button>
      ) : (
        <>
          <div className="field">
            <label htmlFor={fileId} className="field__label">Backup to restore</label>
            <input id={fileId} type="file" accept=".db,application/vnd.sqlite3" onChange={(e) => setPicked(e.target.files?.[0] ?? null)} />
          </div>
          <button type="button" className="button button--danger" disabled={running || !picked} onClick={() => setConfirm(true)}>Restore…</button>
        </>
      )}
      <CallOutcome call={call} done={(v) => v.message} />
      <Dialog title="Replace the store?" open={confirm} onClose={() => setConfirm(false)}
        actions={<>
          <button type="button" className="button" onClick={() => setConfirm(false)} autoFocus>Keep the store as it is</button>
          <button type="button" className="button button--danger" onClick={() => void restore()}>Restore {picked?.name}</button>
        </>}>
        <p>Every job, revision, quote and setting will be replaced by those in <code>{picked?.name}</code>. The current store is
          kept beside it, so restoring that file undoes this.</p>
      </Dialog>
    </section>
  );
}
