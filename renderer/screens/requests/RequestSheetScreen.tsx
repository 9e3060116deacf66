import { useId, useState } from 'react';
import type { ApiResult, RequestImportResult, RequestMapping, RequestPreviewResult, RequestSheet } from '../../../core/api';
import type { ColumnField } from '../../../core/request-sheet';
import { useApi, usePlatform } from '../../api';
import { PlainInput, PlainSelect } from '../../components/Plain';
import { ScreenHeading } from '../../components/ScreenHeading';
import { useCommandBus } from '../../hooks/commands';
import { useShopData } from '../../hooks/shop-data';
import { useQuery } from '../../hooks/useQuery';
import { base64OfDataUrl, mappingWith, referenceOfFile } from '../../model/request-sheet';
import { CallOutcome } from '../data/BackupPanels';
import { useLongCall } from '../data/useLongCall';
import { EnquiryOutcome, RecentEnquiries } from './EnquiryOutcome';
import { PreviewTable, ProblemList } from './PreviewTable';

/** The estimator's corrections on top of the sheet: they go with every preview and with the import. */
interface Corrections {
  mapping?: RequestMapping;
  units?: 'metric' | 'inch';
  decimalMark?: '.' | ',';
  fixes: Record<string, string>;
  skip: number[];
}

const noCorrections: Corrections = { fixes: {}, skip: [] };

function SheetPicker({ onRead }: { onRead(sheet: RequestSheet): void }) {
  const api = useApi();
  const platform = usePlatform();
  const fileId = useId();
  const { call, run } = useLongCall<RequestSheet | null>();
  const pick = async (file: File | undefined) => {
    if (!file) return;
    const dataBase64 = base64OfDataUrl(await platform.readDataUrl(file));
    const sheet = await run(`Reading ${file.name}…`, () => api.readRequestSheet({ fileName: file.name, dataBase64 }));
    if (sheet) onRead(sheet);
  };
  const choose = async (open: () => Promise<ApiResult<RequestSheet | null>>) => {
    const sheet = await run('Reading the request sheet…', open);
    if (sheet) onRead(sheet);
  };
  const outcome = <CallOutcome call={call} done={(s) => (s ? `${s.name}: ${s.rows.length} rows read.` : 'No file chosen.')} />;
  const { openRequestSheet } = platform;
  if (openRequestSheet) {
    return (
      <div className="field">
        <button type="button" className="button" onClick={() => void choose(openRequestSheet)}>Choose a request sheet (CSV or XLSX)…</button>
        {outcome}
      </div>
    );
  }
  return (
    <div className="field">
      <label htmlFor={fileId} className="field__label">Request sheet (CSV or XLSX, one spring per row)</label>
      <input id={fileId} type="file" accept=".csv,.xlsx,.txt,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
        onChange={(e) => void pick(e.target.files?.[0])} />
      {outcome}
    </div>
  );
}

function Counts({ preview }: { preview: RequestPreviewResult }) {
  const { ready, error, skipped } = preview.counts;
  return (
    <p role="status" className={error > 0 ? 'error-text' : 'ok-text'}>
      {ready} row{ready === 1 ? '' : 's'} ready, {error} to fix, {skipped} skipped.
      {preview.savedMapping ? ' The mapping kept for this customer applies.' : ''}
    </p>
  );
}

/** A customer's request sheet in: the columns mapped, every cell checked, the rows imported as one enquiry. */
export function RequestSheetScreen() {
  const api = useApi();
  const shop = useShopData();
  const bus = useCommandBus();
  const [sheet, setSheet] = useState<RequestSheet | null>(null);
  const [opened, setOpened] = useState(0);
  const [customer, setCustomer] = useState('');
  const [reference, setReference] = useState('');
  const [c, setCorrections] = useState<Corrections>(noCorrections);
  const [imported, setImported] = useState<RequestImportResult | null>(null);
  const { call, run, running } = useLongCall<RequestImportResult>();
  const input = sheet ? { sheet, customer: customer.trim() || undefined, ...c } : null;
  const preview = useQuery<RequestPreviewResult>(input ? JSON.stringify({ ...input, sheet: opened }) : null,
    () => api.previewRequestSheet(input!), 150);
  const p = preview.value;

  const read = (s: RequestSheet) => {
    setSheet(s);
    setOpened((n) => n + 1);
    setCorrections(noCorrections);
    setImported(null);
    setReference((r) => r || referenceOfFile(s.name.replace(/ \(.*\)$/, '')));
  };
  const remap = (index: number, field: ColumnField) => p && setCorrections({ ...c, mapping: mappingWith(p, index, field) });
  const fix = (ref: string, text: string) => setCorrections({ ...c, fixes: { ...c.fixes, [ref]: text } });
  const skip = (row: number, on: boolean) => setCorrections({ ...c, skip: on ? [...c.skip, row] : c.skip.filter((r) => r !== row) });
  const go = async () => {
    if (!sheet) return;
    const r = await run('Importing…', () => api.importRequestSheet({ sheet, customer, reference, ...c }));
    if (r) {
      setImported(r);
      shop.refresh();
      bus.broadcast('data-changed');
    }
  };
  const blocked = imported !== null || !p || p.counts.error > 0 || p.mappingErrors.length > 0 || p.counts.ready === 0 || customer.trim() === '' || reference.trim() === '';

  return (
    <section className="screen request-screen" aria-labelledby="request-title">
      <div className="screen__head"><ScreenHeading id="request-title">Import a request sheet</ScreenHeading></div>
      <section className="panel" aria-labelledby="source-title">
        <h2 id="source-title" className="panel__title">Sheet and customer</h2>
        <SheetPicker onRead={read} />
        <div className="grid grid--4">
          <PlainInput label="Customer" value={customer} onChange={setCustomer} hint="Their column mapping is kept and used next time."
            suggestions={shop.customers.map((cu) => cu.name)} />
          <PlainInput label="Enquiry reference" value={reference} onChange={setReference} hint="The customer's own reference." />
          <PlainSelect label="Units of the sheet" value={p?.mapping.units ?? c.units ?? 'metric'}
            onChange={(v) => setCorrections({ ...c, units: v === 'inch' ? 'inch' : 'metric' })}
            choices={[{ value: 'metric', label: 'Metric (mm, N)' }, { value: 'inch', label: 'Inch (in, lbf)' }]} />
          <PlainSelect label="Decimal mark" value={p?.mapping.decimalMark ?? c.decimalMark ?? '.'}
            onChange={(v) => setCorrections({ ...c, decimalMark: v === ',' ? ',' : '.' })}
            choices={[{ value: '.', label: 'Point: 1.6' }, { value: ',', label: 'Comma: 1,6' }]} />
        </div>
      </section>
      {preview.error ? <p className="error-text" role="alert">{preview.error.path ? `${preview.error.path}: ` : ''}{preview.error.message}</p> : null}
      {p && sheet ? (
        <>
          <section className="panel" aria-labelledby="preview-title">
            <h2 id="preview-title" className="panel__title">Preview</h2>
            <p className="muted">Headers are on row {p.headerRow}. Correct the field of any column the proposal got wrong; marked cells do not read.</p>
            <Counts preview={p} />
            {p.mappingErrors.map((e) => <p key={e.path} className="error-text" role="alert">{e.path}: {e.message}</p>)}
            <PreviewTable preview={p} onMap={remap} />
          </section>
          <ProblemList preview={p} onFix={fix} onSkip={skip} />
          <div className="request-actions">
            <button type="button" className="button button--primary" disabled={blocked || running} onClick={() => void go()}>
              Import {p.counts.ready} job{p.counts.ready === 1 ? '' : 's'} as one enquiry
            </button>
            {blocked && !running ? <span className="muted">{imported ? 'Imported: pick the next sheet to import another.' : customer.trim() === '' ? 'Name the customer first.' : p.counts.error > 0 ? 'Fix or skip the rows marked first.' : ''}</span> : null}
            <CallOutcome call={call} done={(v) => `Enquiry ${v.enquiry.reference}: ${v.jobs.length} jobs imported.`} />
          </div>
        </>
      ) : null}
      {imported ? <EnquiryOutcome result={imported} /> : null}
      <RecentEnquiries refreshKey={imported?.enquiry.id ?? 0} />
      <p className="muted">Imported springs are drafts: the results support, and do not replace, review by a qualified engineer, the customer's approval and local codes.</p>
    </section>
  );
}
