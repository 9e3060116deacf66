import { useId, useState } from 'react';
import type { ExportResult, ImportResult, JobStatus } from '../../../core/api';
import { jobStatuses } from '../../../core/api';
import { useApi, usePlatform } from '../../api';
import { PlainSelect } from '../../components/Plain';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { statusLabels } from '../../model/labels';
import { CallOutcome } from './BackupPanels';
import { useLongCall } from './useLongCall';

/** What an export did; jobs whose stored spec no longer reads went out as stored, and are named. */
function exportedText(v: ExportResult): string {
  const done = `${v.count} job${v.count === 1 ? '' : 's'} exported${v.file ? ` to ${v.file}` : ''}.`;
  const problems = v.problems ?? [];
  return problems.length === 0 ? done : `${done} Exported as stored, to be put right: ${problems.map((p) => p.message).join('; ')}.`;
}

export function ExportPanel() {
  const api = useApi();
  const platform = usePlatform();
  const [format, setFormat] = useState<'json' | 'csv'>('json');
  const [status, setStatus] = useState('');
  const { call, run, running } = useLongCall<ExportResult>();
  const streamed = useLongCall<{ message: string }>();
  const download = platform.storeFiles.exportJobs;
  const go = async () => {
    const input = { format, status: (status || undefined) as JobStatus | undefined };
    if (download) {
      await streamed.run('Exporting…', (control) => download(input, control), true);
      return;
    }
    const r = await run('Exporting…', () => api.exportJobs(input));
    if (r?.text !== undefined) {
      platform.saveFile({ fileName: `coilwright-jobs.${format}`, mimeType: format === 'csv' ? 'text/csv' : 'application/json', text: r.text });
    }
  };
  return (
    <section className="panel" aria-labelledby="export-title">
      <h2 id="export-title" className="panel__title">Export jobs</h2>
      <div className="grid grid--2">
        <PlainSelect label="Format" value={format} onChange={(v) => setFormat(v === 'csv' ? 'csv' : 'json')} choices={[{ value: 'json', label: 'JSON (everything)' }, { value: 'csv', label: 'CSV (for a spreadsheet)' }]} />
        <PlainSelect label="Jobs" value={status} onChange={setStatus}
          choices={[{ value: '', label: 'every job' }, ...jobStatuses.map((s) => ({ value: s, label: `${statusLabels[s]} only` }))]} />
      </div>
      <button type="button" className="button button--primary" disabled={running || streamed.running} onClick={() => void go()}>Export</button>
      <CallOutcome call={call} done={exportedText} />
      <CallOutcome call={streamed.call} done={(v) => v.message} cancel={streamed.cancel} />
    </section>
  );
}

export function ImportPanel() {
  const api = useApi();
  const platform = usePlatform();
  const shop = useShopData();
  const bus = useCommandBus();
  const fileId = useId();
  const [picked, setPicked] = useState<File | null>(null);
  const [renumber, setRenumber] = useState(true);
  const { call, run, cancel, running } = useLongCall<ImportResult>();
  const upload = platform.storeFiles.importJobs;
  const go = async () => {
    if (!picked) return;
    const label = `Importing ${picked.name}…`;
    const imported = upload
      ? await run(label, (control) => upload(picked, { renumber }, control), true)
      : await run(label, async () => api.importJobs({
        text: await platform.readText(picked), format: picked.name.toLowerCase().endsWith('.csv') ? 'csv' : 'json', renumber,
      }));
    if (imported) {
      shop.refresh();
      bus.broadcast('data-changed');
    }
  };
  return (
    <section className="panel" aria-labelledby="import-title">
      <h2 id="import-title" className="panel__title">Import jobs</h2>
      <div className="field">
        <label htmlFor={fileId} className="field__label">File to import (JSON or CSV)</label>
        <input id={fileId} type="file" accept=".json,.csv,application/json,text/csv" onChange={(e) => setPicked(e.target.files?.[0] ?? null)} />
      </div>
      <div className="field field--check">
        <input type="checkbox" id={`${fileId}-renumber`} checked={renumber} onChange={(e) => setRenumber(e.target.checked)} />
        <label htmlFor={`${fileId}-renumber`} className="field__label">Give imported jobs new numbers from this shop’s sequence</label>
      </div>
      <button type="button" className="button button--primary" disabled={running || !picked} onClick={() => void go()}>Import</button>
      <CallOutcome call={call} cancel={cancel} done={(v) => `${v.imported.length} job${v.imported.length === 1 ? '' : 's'} imported${v.imported.length > 0 ? `: ${v.imported.slice(0, 8).map((j) => j.number).join(', ')}${v.imported.length > 8 ? '…' : ''}` : ''}.`} />
    </section>
  );
}
