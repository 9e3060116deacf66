import { useDeferredValue } from 'react';
import type { Evaluation } from '../../../model/evaluate';
import { fieldName } from '../../../model/labels';
import { ReviewCaution, StoredEnergyCaution } from '../../../components/Caution';
import { Findings } from './Findings';
import { KeyFigures, LoadTable, StressBars } from './Readouts';
import { loadRows, stressBars } from './readout-data';
import type { SpringReport } from '../../../../core/calculate';
import { SpringCautions } from './Cautions';
import { SpringFigures } from './SpringFigures';

interface ResultsProps {
  evaluation: Evaluation;
  /** Changes with every edit; the panel shows the one its figures belong to (data-calc). */
  version: number;
  title: string;
  onGo(path: string): void;
}

/** Live results of the form: figures, stresses, findings, cautions and drawings, or what stands in the way. */
export function ResultsPanel({ evaluation, version, title, onGo }: ResultsProps) {
  const { internal: r, spec, errors, waitingOn, probes } = evaluation;
  const deferred = useDeferredValue(r);
  const partial = waitingOn.length > 0;
  const waitingFor = waitingOn.map(fieldName).join(', ');
  // With a field standing in at its saved value, a table or the findings show only when they do not move with it.
  const steady = (pick: (x: SpringReport) => unknown) =>
    !partial || (r !== null && probes.length > 0 && probes.every((p) => JSON.stringify(pick(r)) === JSON.stringify(pick(p))));
  return (
    <aside className="results" aria-label="Results" data-calc={version} data-state={r ? (partial ? 'partial' : 'ok') : 'incomplete'} aria-busy={deferred !== r}>
      {r && spec ? (
        <>
          {partial ? (
            <section className="panel panel--waiting" aria-labelledby="waiting-title">
              <h3 id="waiting-title" className="panel__title">Waiting for {waitingFor}</h3>
              <ul className="missing-list">
                {errors.map((e, i) => (
                  <li key={i}><button type="button" className="link" onClick={() => onGo(e.path)}>{fieldName(e.path)}</button>: {e.message}</li>
                ))}
              </ul>
              <p className="muted">Its saved value stands in until it reads; the figures below do not depend on it, and the rest of the edits are saved.</p>
            </section>
          ) : null}
          <KeyFigures r={r} probes={probes} waitingFor={waitingFor} />
          {steady(loadRows) ? <LoadTable r={r} /> : null}
          {steady(stressBars) ? <StressBars r={r} /> : null}
          {steady((x) => x.findings) ? <Findings findings={r.findings} onGo={onGo} /> : null}
          <SpringCautions r={r} spec={spec} />
          {!partial && deferred && deferred.kind === spec.kind ? <SpringFigures r={deferred} spec={spec} title={title} /> : null}
        </>
      ) : (
        <>
          <section className="panel" aria-labelledby="pending-title">
            <h3 id="pending-title" className="panel__title">Results appear when the spring is complete</h3>
            <ul className="missing-list">
              {errors.map((e, i) => (
                <li key={i}>
                  <button type="button" className="link" onClick={() => onGo(e.path)}>{fieldName(e.path)}</button>: {e.missing ? 'needed' : e.message}
                </li>
              ))}
            </ul>
          </section>
          <StoredEnergyCaution />
        </>
      )}
      <ReviewCaution />
    </aside>
  );
}
