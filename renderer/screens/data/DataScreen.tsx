import { ScreenHeading } from '../../components/ScreenHeading';
import { usePlatform } from '../../api';
import { BackupPanel, RestorePanel } from './BackupPanels';
import { ExportPanel, ImportPanel } from './ExchangePanels';
import { StorePanel } from './StorePanel';

/** The store open, backups of the whole store, and jobs in and out as JSON or CSV. */
export function DataScreen() {
  const platform = usePlatform();
  return (
    <section className="screen" aria-labelledby="data-title">
      <div className="screen__head"><ScreenHeading id="data-title">Data &amp; backups</ScreenHeading></div>
      <p className="muted">
        {platform.desktop
          ? 'Files are chosen in the system’s own dialogs, as from the File menu.'
          : 'Files come from and go to your browser: backups and exports download, restores and imports upload.'}
      </p>
      <div className="data-grid">
        <StorePanel />
        <BackupPanel />
        <RestorePanel />
        <ExportPanel />
        <ImportPanel />
      </div>
    </section>
  );
}
