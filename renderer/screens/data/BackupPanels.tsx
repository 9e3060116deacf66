import { useState } from 'react';
import type { BackupResult, RestoreResult } from '../../../core/api';
import { useApi } from '../../api';
import { Dialog } from '../../components/Dialog';
import { PlainInput } from '../../components/Plain';
import { Progress } from '../../components/Progress';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { useLongCall } from './useLongCall';
import type { CallState } from './useLongCall';

const today = () => new Date().toISOString().slice(0, 10);

export function CallOutcome<T>({ call, done }: { call: CallState<T>; done(value: T): string }) {
  if (call.state === 'running') return <Progress label={call.label} />;
  if (call.state === 'failed') return <p className="error-text" role="alert">{call.message}</p>;
  if (call.state === 'done') return <p className="ok-text" role="status">{done(call.value)}</p>;
  return null;
}

export function BackupPanel() {
  const api = useApi();
  const [file, setFile] = useState(`coilwright-backup-${today()}.db`);
  const { call, run, running } = useLongCall<BackupResult>();
  return (
    <section className="panel" aria-labelledby="backup-title">
      <h2 id="backup-title" className="panel__title">Back up the store</h2>
      <p className="muted">A consistent copy of every job, revision, quote and setting, taken while the store stays open.</p>
      <PlainInput label="Backup file" value={file} onChange={setFile} hint="A new file; an absolute path is safest" />
      <button type="button" className="button button--primary" disabled={running || file.trim() === ''}
        onClick={() => void run('Backing up…', () => api.backup({ file: file.trim() }))}>Back up now</button>
      <CallOutcome call={call} done={(v) => `Backup written: ${v.file} (${Math.ceil(v.bytes / 1024)} kB).`} />
    </section>
  );
}

export function RestorePanel() {
  const api = useApi();
  const shop = useShopData();
  const bus = useCommandBus();
  const [file, setFile] = useState('');
  const [confirm, setConfirm] = useState(false);
  const { call, run, running } = useLongCall<RestoreResult>();
  const restore = async () => {
    setConfirm(false);
    if (await run('Restoring…', () => api.restore({ file: file.trim() }))) {
      shop.refresh();
      bus.broadcast('data-changed');
    }
  };
  return (
    <section className="panel" aria-labelledby="restore-title">
      <h2 id="restore-title" className="panel__title">Restore a backup</h2>
      <p className="muted">Replaces every job and setting with the backup’s. The store as it is now is kept beside it.</p>
      <PlainInput label="Backup to restore" value={file} onChange={setFile} />
      <button type="button" className="button button--danger" disabled={running || file.trim() === ''} onClick={() => setConfirm(true)}>Restore…</button>
      <CallOutcome call={call} done={(v) => `Restored from ${v.restoredFrom}.${v.previousKeptAs ? ` The previous store is kept as ${v.previousKeptAs}.` : ''}`} />
      <Dialog title="Replace the store?" open={confirm} onClose={() => setConfirm(false)}
        actions={<>
          <button type="button" className="button" onClick={() => setConfirm(false)} autoFocus>Keep the store as it is</button>
          <button type="button" className="button button--danger" onClick={() => void restore()}>Restore {file.trim()}</button>
        </>}>
        <p>Every job, revision, quote and setting will be replaced by those in <code>{file.trim()}</code>. The current store is
          kept beside it, so restoring that file undoes this.</p>
      </Dialog>
    </section>
  );
}
