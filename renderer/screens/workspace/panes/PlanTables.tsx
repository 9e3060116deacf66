import type { ManufacturingPlan } from '../../../../core/process/plan';
import type { Operation } from '../../../../core/process/types';
import { shown } from '../../../model/shown';
import { OVERRIDE_LABELS, overrideText } from '../../../../core/documents/traveller-sections';

/** Where the operation runs and why: the chosen machine's lot cost, the runner-up and what choosing it saves. */
function WorkCentreCell({ op }: { op: Operation }) {
  if (op.outside) return <span className="tag">outside</span>;
  if (!op.workCentre) return op.offers.length === 0 && (op.kind === 'pack' || op.kind === 'load-test' || op.kind === 'inspect')
    ? <span className="muted">by hand</span> : <span className="error-text">no work centre fits (Shop settings → Machines)</span>;
  const c = op.choice;
  const cost = (v: number) => v.toFixed(2);
  return (
    <span className="work-centre" data-op={op.key}>
      <span className="muted">{op.workCentre.name}</span>
      {c?.basis === 'pinned' ? <span className="tag">pinned</span> : null}
      {c && c.lotCost !== null ? <span className="muted"> · lot {cost(c.lotCost)}</span> : null}
      {c?.basis === 'no run model' ? <span className="error-text"> · no run rate on file</span> : null}
      {c?.runnerUp ? (
        <span className="muted runner-up"> · runner-up {c.runnerUp.name} at {cost(c.runnerUp.lotCost)}
          {c.difference !== null ? ` (${c.difference >= 0 ? `${cost(c.difference)} dearer` : `${cost(-c.difference)} cheaper`})` : ''}</span>
      ) : null}
    </span>
  );
}

export function Operations({ plan }: { plan: ManufacturingPlan }) {
  const u = plan.units;
  return (
    <section className="panel" aria-labelledby="routing-title">
      <h3 id="routing-title" className="panel__title">Routing</h3>
      <table className="table routing">
        <thead>
          <tr><th scope="col">Op</th><th scope="col">Operation and work centre</th><th scope="col">Settings</th><th scope="col" className="num">Setup</th><th scope="col" className="num">Run</th><th scope="col" className="num">Scrap</th></tr>
        </thead>
        <tbody>
          {plan.operations.map((op) => (
            <tr key={op.sequence}>
              <td className="num">{op.sequence}</td>
              <td>
                <strong>{op.title}</strong><br />
                <WorkCentreCell op={op} />
                {op.overrides.map((o) => (
                  <p key={o.field} className="op-override" data-override={`${op.key}:${o.field}`}>
                    <span className="tag">set for this job</span> {OVERRIDE_LABELS[o.field]}: {overrideText(o)}
                  </p>
                ))}
                {op.addedBecause ? <p className="op-override"><span className="tag">added</span> {op.addedBecause}</p> : null}
                {op.notes.map((n) => <p key={n} className="op-note">{n}</p>)}
              </td>
              <td>
                <ul className="settings-list">
                  {op.settings.map((s) => <li key={s.label}><span className="muted">{s.label}:</span> {shown(s.value, s.quantity, u)}</li>)}
                </ul>
              </td>
              <td className="num">{op.setupMinutes} min</td>
              <td className="num">{op.piecesPerHour !== null ? `${Math.round(op.piecesPerHour)} /h` : op.batch ? `${op.batch.batches} × ${op.batch.cycleMinutes} min` : '—'}</td>
              <td className="num">{(op.scrapFraction * 100).toFixed(1)} %</td>
            </tr>
          ))}
        </tbody>
      </table>
      {plan.removed.length > 0 ? (
        <ul className="removed-ops">
          {plan.removed.map((r) => <li key={r.key}><span className="tag">removed for this job</span> {r.title}: {r.reason}</li>)}
        </ul>
      ) : null}
    </section>
  );
}

export function Inspection({ plan }: { plan: ManufacturingPlan }) {
  const i = plan.inspection;
  const u = plan.units;
  const limit = (v: number | null, q: Parameters<typeof shown>[1]) => (v === null ? '—' : shown(v, q, u));
  return (
    <section className="panel" aria-labelledby="inspection-title">
      <h3 id="inspection-title" className="panel__title">Inspection</h3>
      <p>
        Lot {i.lotSize} pcs, AQL {i.aql}: {i.hundredPercent ? 'every piece' : `sample ${i.sampleSize} (code ${i.code ?? '—'}), accept ${i.accept}, reject ${i.reject}`}.
        <span className="muted"> {i.samplingSource}</span>
      </p>
      <table className="table">
        <thead><tr><th scope="col">Characteristic</th><th scope="col" className="num">Nominal</th><th scope="col" className="num">Lower</th><th scope="col" className="num">Upper</th><th scope="col">Gauge</th><th scope="col">Limits from</th></tr></thead>
        <tbody>
          {i.characteristics.map((c) => (
            <tr key={c.name}>
              <td>{c.name}{c.everyPiece ? <span className="tag">every piece</span> : null}</td>
              <td className="num">{shown(c.nominal, c.quantity, u)}</td>
              <td className="num">{limit(c.lower, c.quantity)}</td>
              <td className="num">{limit(c.upper, c.quantity)}</td>
              <td>{c.gauge}</td>
              <td className="muted">{c.source}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
