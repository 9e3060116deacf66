import type { ManufacturingPlan } from '../../../../core/process/plan';
import { shown } from '../../../model/shown';

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
                {op.outside ? <span className="tag">outside</span> : op.workCentre ? <span className="muted">{op.workCentre.name}</span>
                  : <span className="error-text">no work centre fits (Shop settings → Machines)</span>}
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
