import { useMemo, useRef, useState } from 'react';
import type { FirstOffRecord, Job } from '../../../../core/api';
import type { ManufacturingPlan } from '../../../../core/process/plan';
import type { Characteristic } from '../../../../core/process/inspection-plan';
import { unitSymbol } from '../../../../core/units';
import { useApi } from '../../../api';
import { TextAreaField, TextField } from '../../../components/form/inputs';
import { FormScope } from '../../../components/form/scope';
import type { FormHandle } from '../../../components/form/scope';
import { useQuery } from '../../../hooks/useQuery';
import type { JobEditor } from '../../../hooks/useJobEditor';
import type { FormError } from '../../../model/errors';
import { friendlyError } from '../../../model/errors';
import type { FirstOffDraft } from '../../../model/first-off-draft';
import { draftValue, emptyFirstOffDraft, firstOffInputOf, firstOffPaths, withDraftValue } from '../../../model/first-off-draft';
import { shown } from '../../../model/shown';
import { MeasuredRow } from './MeasuredRow';
import type { MeasuredLine } from './MeasuredRow';
import { shopToday } from '../../../model/shop-days';


/** First-off results of the saved job: a form laid out as the traveller's inspection block, and the records so far. */
export function FirstOffPane({ editor }: { editor: JobEditor }) {
  const job = editor.job;
  if (!job) return <div className="pane"><p className="notice">Save the job first: first-off records belong to a stored job.</p></div>;
  if (job.spec.kind !== 'compression') {
    return <div className="pane"><p className="notice">First-off records of set removal are kept for compression springs.</p></div>;
  }
  return <FirstOffBody job={job} dirty={editor.dirty} />;
}

function limitsText(c: Characteristic | undefined, units: Job['spec']['units']): string {
  if (!c) return '—';
  const q = (v: number) => shown(v, c.quantity, units);
  if (c.lower !== null && c.upper !== null) return `${q(c.lower)} to ${q(c.upper)}`;
  if (c.upper !== null) return `max ${q(c.upper)}`;
  if (c.lower !== null) return `min ${q(c.lower)}`;
  return 'reference';
}

/** The lines of the form, each with the traveller's nominal, limits and gauge beside the measured value. */
function measuredLines(job: Job, plan: ManufacturingPlan | null, testLengths: readonly number[]): MeasuredLine[] {
  const u = job.spec.units;
  const mm = unitSymbol('length', u);
  const chars = plan?.inspection.characteristics ?? [];
  const free = chars.find((c) => c.name.startsWith('Free length'));
  const od = chars.find((c) => c.name.startsWith('Outside diameter'));
  const forces = chars.filter((c) => c.atLength !== null && c.quantity === 'force');
  const nominal = (c: Characteristic | undefined) => (c ? shown(c.nominal, c.quantity, u) : '—');
  return [
    { path: 'coiledFreeLength', label: 'Coiled free length used', unit: mm, gauge: 'height gauge, as coiled',
      nominal: plan?.coiledFreeLength != null ? shown(plan.coiledFreeLength, 'length', u) : '—', limits: 'coiler setting' },
    { path: 'freeLengthAfterSet', label: 'Free length after set removal', unit: mm, gauge: free?.gauge ?? 'height gauge',
      nominal: nominal(free), limits: limitsText(free, u) },
    ...testLengths.map((length, i) => ({
      path: `forces[${i}]`, label: `Force at L${i + 1} = ${shown(length, 'length', u)}`, unit: unitSymbol('force', u),
      gauge: forces[i]?.gauge ?? 'load tester', nominal: nominal(forces[i]), limits: limitsText(forces[i], u),
    })),
    { path: 'outerDiameter', label: 'Outside diameter', unit: mm, gauge: od?.gauge ?? 'calliper', nominal: nominal(od), limits: limitsText(od, u) },
  ];
}

function FirstOffBody({ job, dirty }: { job: Job; dirty: boolean }) {
  const api = useApi();
  const spec = job.spec;
  const testLengths = useMemo(() => (spec.kind === 'compression' ? spec.loads.map((l) => l.length) : []), [spec]);
  const plan = useQuery(JSON.stringify([job.id, job.revision]), () => api.manufacturingPlan({ spec, orderQuantity: job.orderQuantity ?? 100 }));
  const records = useQuery(`records-${job.id}`, () => api.listFirstOff({ jobId: job.id }));
  const [draft, setDraft] = useState<FirstOffDraft>(() => emptyFirstOffDraft(testLengths.length, shopToday()));
  const [errors, setErrors] = useState<FormError[]>([]);
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const form = useRef<FormHandle | null>(null);
  const fields = useMemo(() => firstOffPaths(testLengths.length), [testLengths.length]);
  const lines = measuredLines(job, plan.value, testLengths);
  const set = (path: string, value: string) => {
    setStatus(null);
    setDraft((d) => withDraftValue(d, path, value));
  };
  const submit = async () => {
    const { input, errors: local } = firstOffInputOf(draft, job.id, spec.units, testLengths);
    form.current?.revealAll();
    if (!input) return setErrors(local);
    setBusy(true);
    const result = await api.recordFirstOff(input);
    setBusy(false);
    if (!result.ok) {
      setErrors((result.error.details ?? [result.error]).map((e) => friendlyError(e)));
      return;
    }
    setErrors([]);
    setDraft(emptyFirstOffDraft(testLengths.length, draft.measuredOn, draft.measuredBy));
    setStatus(`First-off recorded for job ${job.number}: set ${shown(result.value.set, 'length', spec.units)}.`);
    records.reload();
  };
  return (
    <div className="pane first-off">
      <FormScope scope="first-off" errors={errors} fields={fields} handle={(h) => { form.current = h; }}>
        {(unplaced) => (
          <form className="panel" aria-labelledby="first-off-title" noValidate onSubmit={(e) => { e.preventDefault(); void submit(); }}>
            <h3 id="first-off-title" className="panel__title">First-off inspection, job {job.number}</h3>
            <p className="muted">Values in {spec.units === 'metric' ? 'millimetres and newtons' : 'inches and pounds-force'}, the job's units.
              Recorded against revision {job.revision}{dirty ? ' (the saved spec; unsaved edits are not part of it)' : ''}.</p>
            {unplaced.length > 0 ? <div className="form-errors" role="alert">{unplaced.map((e, i) => <p key={i}>{e.message}</p>)}</div> : null}
            <table className="table first-off__table">
              <thead><tr><th scope="col">Characteristic</th><th scope="col" className="num">Nominal</th><th scope="col">Limits</th><th scope="col">Gauge</th><th scope="col">Measured</th></tr></thead>
              <tbody>
                {lines.map((line) => (
                  <MeasuredRow key={line.path} line={line} value={draftValue(draft, line.path)} onChange={(v) => set(line.path, v)} />
                ))}
              </tbody>
            </table>
            <div className="grid grid--3">
              <TextField path="measuredOn" label="Date measured" type="date" value={draft.measuredOn} onChange={(v) => set('measuredOn', v)} />
              <TextField path="measuredBy" label="Measured by" value={draft.measuredBy} onChange={(v) => set('measuredBy', v)} />
            </div>
            <TextAreaField path="notes" label="Notes (coiler, wire lot, pieces measured)" value={draft.notes} rows={2} onChange={(v) => set('notes', v)} />
            <div className="pane__controls">
              <button type="submit" className="button button--primary" disabled={busy}>Record first-off</button>
              {status ? <span role="status" className="ok-text">{status}</span> : null}
            </div>
          </form>
        )}
      </FormScope>
      <RecordList records={records.value ?? []} units={spec.units} />
    </div>
  );
}

function RecordList({ records, units }: { records: FirstOffRecord[]; units: Job['spec']['units'] }) {
  const len = (v: number) => shown(v, 'length', units);
  return (
    <section className="panel" aria-labelledby="first-off-records-title">
      <h3 id="first-off-records-title" className="panel__title">First-off records</h3>
      {records.length === 0 ? <p className="muted">None yet.</p> : (
        <table className="table">
          <thead><tr><th scope="col">Date</th><th scope="col">Measured by</th><th scope="col" className="num">Rev</th><th scope="col" className="num">Coiled</th>
            <th scope="col" className="num">After set removal</th><th scope="col" className="num">Set</th><th scope="col" className="num">OD</th><th scope="col">Forces</th><th scope="col">Notes</th></tr></thead>
          <tbody>
            {records.map((r) => (
              <tr key={r.id}>
                <td className="nowrap">{r.measuredOn}</td><td>{r.measuredBy}</td><td className="num">{r.jobRevision}</td>
                <td className="num">{len(r.coiledFreeLength)}</td><td className="num">{len(r.freeLengthAfterSet)}</td><td className="num">{len(r.set)}</td>
                <td className="num">{len(r.outerDiameter)}</td>
                <td>{r.forces.map((f) => `${shown(f.force, 'force', units)} at ${len(f.length)}`).join('; ') || '—'}</td>
                <td>{r.notes}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
