import { ScreenHeading } from '../../components/ScreenHeading';
import { usePlatform } from '../../api';
import { BackupPanel, RestorePanel } from './BackupPanels';
import { ExportPanel, ImportPanel } from './ExchangePanels';

/** Backups of the whole store, and jobs in and out as JSON or CSV. */
export function DataScreen() {
  const platform = usePlatform();
  return (
    <section className="screen" aria-labelledby="data-title">
      <div className="screen__head"><ScreenHeading id="data-title">Data &amp; backups</ScreenHeading></div>
      <p className="muted">
        {platform.desktop
          ? 'The File menu offers the same with file dialogs. Paths here are on this computer.'
          : 'Paths are on the computer that runs the Coilwright service (for this window, the same computer).'}
      </p>
      <div className="data-grid">
        <BackupPanel />
        <RestorePanel />
        <ExportPanel />
        <ImportPanel />
      </div>
    </section>
  );
}
