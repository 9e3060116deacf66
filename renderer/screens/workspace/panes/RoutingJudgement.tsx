import { useState } from 'react';
import type { ApiError } from '../../../../core/api';
import type { ManufacturingPlan } from '../../../../core/process/plan';
import type { JobJudgement, RoutingOverride } from '../../../../core/quoting/judgement';
import { PlainInput } from '../../../components/Plain';
import { useShopData } from '../../../hooks/shop-data';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { parseNumber } from '../../../model/numbers';

const numberOf = (text: string): number | undefined => {
  const p = parseNumber(text);
  return p.ok && p.value !== undefined ? p.value : undefined;
};

function describe(o: RoutingOverride): string {
  const parts = [
    o.remove ? 'removed' : '', o.machine ? `machine ${o.machine}` : '', o.setupMinutes !== undefined ? `setup ${o.setupMinutes} min` : '',
    o.piecesPerHour !== undefined ? `run ${o.piecesPerHour} pcs/h` : '', o.scrapPercent !== undefined ? `scrap ${o.scrapPercent} %` : '',
  ].filter(Boolean);
  return `${o.operation}: ${parts.join(', ')} (${o.reason})`;
}

/**
 * The estimator's routing for this job: pin a machine, set-up, run rate or scrap of an operation, take one
 * out, or add one from the shop's list; each with a reason, kept with the job.
 */
export function RoutingJudgement({ editor, plan }: { editor: JobEditor; plan: ManufacturingPlan }) {
  const { settings } = useShopData();
  const j: JobJudgement = editor.job!.judgement;
  const ops = plan.operations.filter((o) => o.offers.length > 0 && o.kind !== 'extra');
  const [key, setKey] = useState(ops[0]?.key ?? '');
  const [machine, setMachine] = useState('');
  const [setup, setSetup] = useState('');
  const [rate, setRate] = useState('');
  const [scrap, setScrap] = useState('');
  const [remove, setRemove] = useState(false);
  const [reason, setReason] = useState('');
  const [extra, setExtra] = useState(settings?.extraOperations[0]?.id ?? '');
  const [error, setError] = useState<ApiError | null>(null);
  const op = ops.find((o) => o.key === key);
  const save = async (next: JobJudgement) => setError(await editor.saveJudgement(next));
  const why = reason.trim();
  const apply = () => {
    const o: RoutingOverride = {
      operation: key, reason: why,
      ...(machine ? { machine } : {}), ...(remove ? { remove: true as const } : {}),
      ...(numberOf(setup) !== undefined ? { setupMinutes: numberOf(setup)! } : {}),
      ...(numberOf(rate) !== undefined ? { piecesPerHour: numberOf(rate)! } : {}),
      ...(numberOf(scrap) !== undefined ? { scrapPercent: numberOf(scrap)! } : {}),
    };
    void save({ ...j, routing: [...j.routing.filter((r) => r.operation !== key), o] });
  };
  return (
    <section className="panel routing-judgement" aria-labelledby="routing-judgement-title">
      <h3 id="routing-judgement-title" className="panel__title">Machines and operations for this job</h3>
      <ul className="judgement-list">
        {j.routing.map((o) => (
          <li key={o.operation} data-routing-override={o.operation}>{describe(o)}{' '}
            <button type="button" className="button button--small" onClick={() => void save({ ...j, routing: j.routing.filter((x) => x !== o) })}>Back to the shop’s plan</button></li>
        ))}
        {j.added.map((a, i) => (
          <li key={`${a.operation}-${i}`}>added {a.operation} ({a.reason}){' '}
            <button type="button" className="button button--small" onClick={() => void save({ ...j, added: j.added.filter((x) => x !== a) })}>Remove</button></li>
        ))}
      </ul>
      <div className="judgement-form">
        <PlainInput label="Reason" value={reason} onChange={setReason} hint="kept with the override" />
        <label className="field"><span className="field__label">Operation</span>
          <select className="input" aria-label="Operation" value={key} onChange={(e) => { setKey(e.target.value); setMachine(''); }}>
            {ops.map((o) => <option key={o.key} value={o.key}>{o.sequence} {o.title}</option>)}
          </select>
        </label>
        <label className="field"><span className="field__label">Machine</span>
          <select className="input" aria-label="Machine" value={machine} onChange={(e) => setMachine(e.target.value)}>
            <option value="">lowest lot cost (shop)</option>
            {op?.offers.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </label>
        <PlainInput label="Setup (min)" value={setup} onChange={setSetup} numeric placeholder={op ? String(op.setupMinutes) : ''} />
        <PlainInput label="Run rate (pcs/h)" value={rate} onChange={setRate} numeric placeholder={op?.piecesPerHour ? String(op.piecesPerHour) : ''} />
        <PlainInput label="Scrap (%)" value={scrap} onChange={setScrap} numeric placeholder={op ? String(Number((op.scrapFraction * 100).toFixed(2))) : ''} />
        <div className="field field--check">
          <input type="checkbox" id="routing-remove" checked={remove} onChange={(e) => setRemove(e.target.checked)} />
          <label htmlFor="routing-remove" className="field__label">Take this operation out</label>
        </div>
        <button type="button" className="button" disabled={why.length < 3 || !op} onClick={apply}>Set for this job</button>
        {settings && settings.extraOperations.length > 0 ? (
          <>
            <label className="field"><span className="field__label">Extra operation</span>
              <select className="input" aria-label="Extra operation" value={extra} onChange={(e) => setExtra(e.target.value)}>
                {settings.extraOperations.map((x) => <option key={x.id} value={x.id}>{x.name}</option>)}
              </select>
            </label>
            <button type="button" className="button" disabled={why.length < 3 || !extra}
              onClick={() => void save({ ...j, added: [...j.added, { operation: extra, reason: why }] })}>Add operation</button>
          </>
        ) : null}
      </div>
      {error ? <p className="error-text" role="alert">{error.message}</p> : null}
    </section>
  );
}
