import { useDeferredValue } from 'react';
import type { Evaluation } from '../../../model/evaluate';
import { fieldName } from '../../../model/labels';
import { ReviewCaution, StoredEnergyCaution } from '../../../components/Caution';
import { Findings } from './Findings';
import { KeyFigures, LoadTable, StressBars } from './Readouts';
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
  const { internal: r, spec, errors } = evaluation;
  const deferred = useDeferredValue(r);
  return (
    <aside className="results" aria-label="Results" data-calc={version} data-state={r ? 'ok' : 'incomplete'} aria-busy={deferred !== r}>
      {r && spec ? (
        <>
          <KeyFigures r={r} />
          <LoadTable r={r} />
          <StressBars r={r} />
          <Findings findings={r.findings} onGo={onGo} />
          <SpringCautions r={r} spec={spec} />
          {deferred && deferred.kind === spec.kind ? <SpringFigures r={deferred} spec={spec} title={title} /> : null}
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
