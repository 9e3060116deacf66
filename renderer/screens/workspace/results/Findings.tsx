import type { Finding } from '../../../../core/result';
import { fieldName } from '../../../model/labels';

const order = { error: 0, warning: 1, note: 2 } as const;
const severityText = { error: 'Error', warning: 'Warning', note: 'Note' } as const;

/** The maker's review: each finding with its severity and fix; a finding with a field takes you to it. */
export function Findings({ findings, onGo, title = 'Review findings' }: { findings: Finding[]; onGo(path: string): void; title?: string }) {
  const sorted = [...findings].sort((a, b) => order[a.severity] - order[b.severity]);
  return (
    <section className="panel" aria-labelledby="findings-title">
      <h3 id="findings-title" className="panel__title">{title} <span className="count">{findings.length}</span></h3>
      {sorted.length === 0 ? <p className="muted">Nothing to remark: the review found no problem.</p> : (
        <ul className="findings">
          {sorted.map((f, i) => (
            <li key={`${f.code}-${i}`} className={`finding finding--${f.severity}`} data-code={f.code}>
              <span className="finding__severity">{severityText[f.severity]}</span>
              <div className="finding__body">
                {f.path ? (
                  <button type="button" className="finding__message" onClick={() => onGo(f.path)}>
                    {f.message} <span className="finding__field">go to {fieldName(f.path)} ›</span>
                  </button>
                ) : <p className="finding__message finding__message--plain">{f.message}</p>}
                {f.fix ? <p className="finding__fix"><span className="finding__fix-label">Fix:</span> {f.fix}</p> : null}
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
