import type { SetCalibration } from '../../../../core/api';
import type { Spec } from '../../../../core/spec';
import { useApi } from '../../../api';
import { Caution } from '../../../components/Caution';
import { useQuery } from '../../../hooks/useQuery';
import { shown } from '../../../model/shown';

/** The model's coiled free length beside the one the shop's first-off records of similar springs call for. */
export function SetCalibrationPanel({ spec }: { spec: Spec }) {
  const api = useApi();
  const key = spec.kind === 'compression' ? JSON.stringify(spec) : null;
  const calibration = useQuery(key, () => api.setCalibration({ spec }), 200);
  if (key === null) return null;
  return (
    <section className="panel calibration" aria-labelledby="calibration-title">
      <h3 id="calibration-title" className="panel__title">Coiled free length from first-off results</h3>
      {calibration.error ? <p className="error-text" role="alert">{calibration.error.message}</p> : null}
      {calibration.value ? <CalibrationBody c={calibration.value} /> : null}
    </section>
  );
}

function CalibrationBody({ c }: { c: SetCalibration }) {
  const len = (v: number | null) => (v === null ? '—' : shown(v, 'length', c.units));
  return (
    <>
      <div className="calibration__values">
        <div>Model: <strong>{len(c.model.coiledFreeLength)}</strong> <span className="muted">(expected set {len(c.model.expectedSet)})</span></div>
        <div>Calibrated: <strong>{c.calibrated ? len(c.calibrated.coiledFreeLength) : 'model stands'}</strong>
          {c.calibrated ? <span className="muted"> (expected set {len(c.calibrated.expectedSet)})</span> : null}</div>
      </div>
      <p className={c.status === 'calibrated' ? undefined : 'notice'}>{c.reason}</p>
      {c.fit ? (
        <p className="muted">
          Fit: {c.fit.method}; ratio {c.fit.ratio.toFixed(3)}
          {c.fit.residualSd !== null && c.fit.relativeSpread !== null
            ? `, spread ±${len(c.fit.residualSd)} (${Math.round(c.fit.relativeSpread * 100)} % of the typical set)` : ', spread not measurable from one record'}
          ; {c.fit.records} record(s) of {c.fit.jobs} job(s), weight {Math.round(c.fit.weight * 100)} %.
        </p>
      ) : null}
      {c.evidence.length > 0 ? <Evidence c={c} /> : null}
      {c.excluded.length > 0 ? (
        <details><summary>Records not used ({c.excluded.length})</summary>
          <ul className="plain-list">{c.excluded.map((e) => <li key={e.recordId}>{e.jobNumber}: {e.reason}</li>)}</ul>
        </details>
      ) : null}
      <details><summary>Rules</summary><ul className="plain-list">{c.rules.map((r) => <li key={r}>{r}</li>)}</ul></details>
      <Caution title="First pieces decide">{c.caution}</Caution>
    </>
  );
}

function Evidence({ c }: { c: SetCalibration }) {
  const len = (v: number) => shown(v, 'length', c.units);
  return (
    <table className="table table--compact" aria-label="First-off records used">
      <thead><tr><th scope="col">Job</th><th scope="col">Grade</th><th scope="col" className="num">Similarity</th><th scope="col">Measured</th>
        <th scope="col" className="num">Coiled (model)</th><th scope="col" className="num">Coiled (used)</th>
        <th scope="col" className="num">Set predicted</th><th scope="col" className="num">Set measured</th></tr></thead>
      <tbody>
        {c.evidence.map((e) => (
          <tr key={e.recordId}>
            <td>{e.jobNumber}</td><td>{e.material}</td><td className="num">{Math.exp(-e.distance).toFixed(2)}</td>
            <td className="nowrap">{e.measuredOn}, {e.measuredBy}</td>
            <td className="num">{len(e.modelCoiledFreeLength)}</td><td className="num">{len(e.coiledFreeLength)}</td>
            <td className="num">{len(e.predictedSet)}</td><td className="num">{len(e.measuredSet)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
