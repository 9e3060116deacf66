import { useEffect, useRef, useState } from 'react';
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
 * (the desktop app only): how far it is, with Cancel where the action can be stopped. `andTheWindows`: also
 * the Data screen's own, once that screen (which shows them in its panels) has been left while one runs.
 */
export function MenuDataProgress({ andTheWindows }: { andTheWindows: boolean }) {
  const { storeFiles } = usePlatform();
  const shell = storeFiles.shell;
  const [event, setEvent] = useState<DataActionEvent | null>(null);
  const windowsShown = useRef(andTheWindows);
  windowsShown.current = andTheWindows;
  // The Data screen's own action that ends while the screen shows it has been told there: nothing left to show.
  useEffect(() => shell?.onEvent((e) => setEvent(e.from === 'window' && e.state === 'ended' && !windowsShown.current ? null : e)), [shell]);
  const shown = event && (event.from === 'menu' || andTheWindows) ? event : null;
  const call = shell && shown ? callOf(shown) : null;
  if (!shell || !shown || !call) return null;
  return (
    <div className="menu-data-progress" role="region" aria-label="Data action">
      <CallOutcome call={call} done={() => ''} cancel={() => { if (shown.action !== 'restore') shell.cancel(shown.action); }} />
      {call.state === 'failed' ? <button type="button" className="button" onClick={() => setEvent(null)}>Close</button> : null}
    </div>
  );
}
