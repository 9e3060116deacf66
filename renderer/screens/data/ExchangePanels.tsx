import { useId, useState } from 'react';
import type { ImportResult, JobStatus } from '../../../core/api';
import { jobStatuses } from '../../../core/api';
import { useApi, usePlatform } from '../../api';
import type { StoreFiles } from '../../api/store-files';
import { PlainSelect } from '../../components/Plain';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { statusLabels } from '../../model/labels';
import { CallOutcome } from './BackupPanels';
import { useLongCall } from './useLongCall';
import { runningLabels } from './wording';

/** A browser downloads the export as it is written; the app's shell asks where and writes it there. Both may be cancelled. */
export function ExportPanel() {
  const { storeFiles } = usePlatform();
  const [format, setFormat] = useState<'json' | 'csv'>('json');
  const [status, setStatus] = useState('');
  const { call, run, cancel, running } = useLongCall<{ message: string }>();
  const go = () => run(runningLabels.exportJobs, (control) => storeFiles.exportJobs({ format, status: (status || undefined) as JobStatus | undefined }, control), true);
  return (
    <section className="panel" aria-labelledby="export-title">
      <h2 id="export-title" className="panel__title">Export jobs</h2>
      <div className="grid grid--2">
        <PlainSelect label="Format" value={format} onChange={(v) => setFormat(v === 'csv' ? 'csv' : 'json')} choices={[{ value: 'json', label: 'JSON (everything)' }, { value: 'csv', label: 'CSV (for a spreadsheet)' }]} />
        <PlainSelect label="Jobs" value={status} onChange={setStatus}
          choices={[{ value: '', label: 'every job' }, ...jobStatuses.map((s) => ({ value: s, label: `${statusLabels[s]} only` }))]} />
      </div>
      <button type="button" className="button button--primary" disabled={running} onClick={() => void go()}>{storeFiles.shellDialogs ? 'Export…' : 'Export'}</button>
      <CallOutcome call={call} done={(v) => v.message} cancel={cancel} />
    </section>
  );
}

const importedText = (v: ImportResult) =>
  `${v.imported.length} job${v.imported.length === 1 ? '' : 's'} imported${v.imported.length > 0 ? `: ${v.imported.slice(0, 8).map((j) => j.number).join(', ')}${v.imported.length > 8 ? '…' : ''}` : ''}.`;

/** What the import kept without (a link to a job it could not find), by the file's field. */
const importNotes = (v: ImportResult) => (v.problems ?? []).map((p) => `${p.path}: ${p.message}.`);

function RenumberChoice({ id, renumber, onChange }: { id: string; renumber: boolean; onChange(renumber: boolean): void }) {
  return (
    <div className="field field--check">
      <input type="checkbox" id={id} checked={renumber} onChange={(e) => onChange(e.target.checked)} />
      <label htmlFor={id} className="field__label">Give imported jobs new numbers from this shop’s sequence</label>
    </div>
  );
}

/** Jobs in from a JSON or CSV file, all or nothing: picked in the page (browser) or in the shell's open dialog (app). */
export function ImportPanel() {
  const { storeFiles } = usePlatform();
  return (
    <section className="panel" aria-labelledby="import-title">
      <h2 id="import-title" className="panel__title">Import jobs</h2>
      {storeFiles.importChosen ? <ShellImport importChosen={storeFiles.importChosen} /> : <PageImport />}
    </section>
  );
}

function useImported() {
  const shop = useShopData();
  const bus = useCommandBus();
  return () => {
    shop.refresh();
    bus.broadcast('data-changed');
  };
}

function ShellImport({ importChosen }: { importChosen: NonNullable<StoreFiles['importChosen']> }) {
  const imported = useImported();
  const id = useId();
  const [renumber, setRenumber] = useState(true);
  const { call, run, cancel, running } = useLongCall<{ message: string }>();
  const go = async () => {
    if (await run(runningLabels.importJobs, (control) => importChosen({ renumber }, control), true)) imported();
  };
  return (
    <>
      <RenumberChoice id={id} renumber={renumber} onChange={setRenumber} />
      <button type="button" className="button button--primary" disabled={running} onClick={() => void go()}>Import…</button>
      <CallOutcome call={call} cancel={cancel} done={(v) => v.message} />
    </>
  );
}

function PageImport() {
  const api = useApi();
  const platform = usePlatform();
  const imported = useImported();
  const fileId = useId();
  const [picked, setPicked] = useState<File | null>(null);
  const [renumber, setRenumber] = useState(true);
  const { call, run, cancel, running } = useLongCall<ImportResult>();
  const upload = platform.storeFiles.importJobs;
  const go = async () => {
    if (!picked) return;
    const label = `Importing ${picked.name}…`;
    const done = upload
      ? await run(label, (control) => upload(picked, { renumber }, control), true)
      : await run(label, async () => api.importJobs({
        text: await platform.readText(picked), format: picked.name.toLowerCase().endsWith('.csv') ? 'csv' : 'json', renumber,
      }));
    if (done) imported();
  };
  return (
    <>
      <div className="field">
        <label htmlFor={fileId} className="field__label">File to import (JSON or CSV)</label>
        <input id={fileId} type="file" accept=".json,.csv,application/json,text/csv" onChange={(e) => setPicked(e.target.files?.[0] ?? null)} />
      </div>
      <RenumberChoice id={`${fileId}-renumber`} renumber={renumber} onChange={setRenumber} />
      <button type="button" className="button button--primary" disabled={running || !picked} onClick={() => void go()}>Import</button>
      <CallOutcome call={call} cancel={cancel} done={importedText} notes={importNotes} />
    </>
  );
}
