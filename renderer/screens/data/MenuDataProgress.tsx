import { useEffect, useState } from 'react';
import type { DataActionEvent } from '../../../core/api/method-names';
import { usePlatform } from '../../api';
import { CallOutcome } from './BackupPanels';
import type { CallState } from './useLongCall';
import { runningLabels } from './wording';

/** A File-menu action as the Data screen's bar shows its own: running, or cancelled (main's dialog tells the rest). */
function callOf(event: DataActionEvent): CallState<never> | null {
  if (event.state === 'running') {
    return { state: 'running', label: runningLabels[event.action], done: event.done, total: event.total, cancellable: event.cancellable };
  }
  return event.outcome === 'cancelled' ? { state: 'failed', message: event.message, path: '' } : null;
}

/**
 * The bar of a backup, restore, import or export started from the File menu, on whatever screen is open
 * (the desktop app only): how far it is, with Cancel where the action can be stopped.
 */
export function MenuDataProgress() {
  const { storeFiles } = usePlatform();
  const shell = storeFiles.shell;
  const [event, setEvent] = useState<DataActionEvent | null>(null);
  useEffect(() => shell?.onEvent((e) => {
    if (e.from === 'menu') setEvent(e);
  }), [shell]);
  const call = shell && event ? callOf(event) : null;
  if (!shell || !event || !call) return null;
  return (
    <div className="menu-data-progress" role="region" aria-label="File menu action">
      <CallOutcome call={call} done={() => ''} cancel={() => { if (event.action !== 'restore') shell.cancel(event.action); }} />
      {call.state === 'failed' ? <button type="button" className="button" onClick={() => setEvent(null)}>Close</button> : null}
    </div>
  );
}
