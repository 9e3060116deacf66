import type { SpringReport } from '../../../../core/calculate';
import { formatQuantity } from '../../../../core/format';
import { allowableBand } from '../../../../core/review/limits';
import { captions, kindTerms } from '../../../../core/vocabulary';
import { inShopMark } from '../../../model/numbers';
import { loadRows, readouts, stressBars } from './readout-data';

/** The figures an estimator checks first, in the job's units. `r` in internal units. */
export function KeyFigures({ r, probes = [], waitingFor }: { r: SpringReport; probes?: readonly SpringReport[]; waitingFor?: string }) {
  const shown = readouts(r);
  const moved = new Set(probes.flatMap((probe) => readouts(probe).filter((p, i) => p.value !== shown[i]?.value).map((p) => p.symbol)));
  return (
    <section className="panel" aria-labelledby="figures-title">
      <h3 id="figures-title" className="panel__title">Key figures</h3>
      <dl className="figures">
        {shown.map((f) => (
          <div key={f.name} className="figures__item" data-figure={f.symbol}>
            <dt>{f.name} <span className="figures__symbol">{f.symbol}</span></dt>
            {moved.has(f.symbol) ? <dd className="figures__waiting">— <span className="muted">waits for {waitingFor}</span></dd> : <dd>{inShopMark(f.value)}</dd>}
          </div>
        ))}
      </dl>
    </section>
  );
}

/** Load at each test point against what the drawing asks. */
export function LoadTable({ r }: { r: SpringReport }) {
  const rows = loadRows(r);
  if (rows.length === 0) return null;
  const angles = kindTerms[r.kind].workingPosition === 'angle';
  return (
    <table className="table table--compact loadtable" aria-label={angles ? 'Torques at the working angles' : 'Forces at the test lengths'}>
      <thead><tr><th scope="col">Test</th><th scope="col" className="num">{angles ? 'Deflection' : 'Length'}</th><th scope="col" className="num">{angles ? 'Torque' : 'Force'}</th><th scope="col" className="num">Asked</th><th scope="col">Within?</th></tr></thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.point}>
            <th scope="row">{row.point}</th><td className="num">{inShopMark(row.at)}</td><td className="num">{inShopMark(row.load)}</td><td className="num">{inShopMark(row.asked)}</td>
            <td>{row.within === null ? '—' : row.within ? 'yes' : <strong className="error-text">no</strong>}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** A bar's full width is 125 % of the allowable; the mark at 80 % of the width is the allowable itself. */
export function StressBars({ r }: { r: SpringReport }) {
  const u = r.units;
  return (
    <section className="panel" aria-labelledby="stress-title">
      <h3 id="stress-title" className="panel__title">{captions.stressChart}</h3>
      {stressBars(r).length === 0 ? <p className="muted">Give a working {kindTerms[r.kind].workingPosition} to see its stress.</p> : null}
      <ul className="bars">
        {stressBars(r).map((b) => {
          const ratio = b.value / b.allowable;
          const text = inShopMark(`${formatQuantity(b.value, 'stress', u)} of ${formatQuantity(b.allowable, 'stress', u)} (${Math.round(ratio * 100)} %)`);
          return (
            <li key={b.label} className={`bar bar--${allowableBand(b.value, b.allowable)}`}>
              <span className="bar__label">{b.label}</span>
              <div className="bar__track" role="meter" aria-label={`${b.label}, ${b.basis}`} aria-valuemin={0}
                aria-valuemax={Math.round(b.allowable)} aria-valuenow={Math.round(b.value)} aria-valuetext={text}>
                <div className="bar__fill" style={{ width: `${Math.min(100, (ratio / 1.25) * 100)}%` }} />
                <div className="bar__limit" aria-hidden="true" />
              </div>
              <span className="bar__value">{text}</span>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
