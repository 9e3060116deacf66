import type { DesignAnswer, DesignCandidate } from '../../../core/design';
import { unitSymbol } from '../../../core/units';
import { significant } from '../../../core/format';
import { lengthDecimals } from '../../../core/format';

interface Props {
  answer: DesignAnswer;
  busy: boolean;
  onMake(candidate: DesignCandidate): void;
}

const money = (v: number, currency: string) => `${v.toFixed(v < 1 ? 4 : 2)} ${currency}`;

/** The ranked designs: key figures, price at the main break, and why each costs more than the first. */
export function CandidateTable({ answer, busy, onMake }: Props) {
  const u = answer.units;
  const len = (v: number) => v.toFixed(lengthDecimals[u]);
  const mm = unitSymbol('length', u);
  return (
    <div className="table-wrap">
      <table className="table table--compact" aria-label="Designs that meet the requirement, cheapest first">
        <thead>
          <tr>
            <th className="num">#</th><th>Wire</th><th className="num">d ({mm})</th><th className="num">OD ({mm})</th>
            <th className="num">{answer.kind === 'extension' ? 'Body coils' : 'Total coils'}</th><th>Ends</th><th className="num">L0 ({mm})</th><th className="num">{answer.kind === 'extension' ? `Initial tension (${unitSymbol('force', u)})` : `Solid (${mm})`}</th>
            <th className="num">Forces ({unitSymbol('force', u)})</th><th>Process</th><th className="num">Margin</th>
            <th className="num">Unit price at {answer.mainQuantity}</th><th>Why it ranks lower</th><th><span className="sr-only">Action</span></th>
          </tr>
        </thead>
        <tbody>
          {answer.candidates.map((c) => {
            const f = c.figures;
            return (
              <tr key={c.rank} data-rank={c.rank}>
                <td className="num">{c.rank}</td>
                <td>{f.gradeName}</td>
                <td className="num">{len(f.wireDiameter)}</td>
                <td className="num">{len(f.outerDiameter)}</td>
                <td className="num">{f.totalCoils}</td>
                <td>{f.ends}</td>
                <td className="num">{len(f.freeLength)}</td>
                <td className="num">{f.solidLength !== null ? len(f.solidLength) : f.initialTension !== null ? significant(f.initialTension) : '—'}</td>
                <td className="num">{f.forces.map((x) => significant(x.force)).join(' / ')}</td>
                <td>{[f.setRemoval ? 'set removal' : '', f.shotPeened ? 'shot peened' : ''].filter(Boolean).join(', ') || '—'}</td>
                <td className="num">{significant(100 * f.stressMargin, 2)} %</td>
                <td className="num">{money(c.unitPrice, c.currency)}{c.priced ? '' : ' (incomplete)'}</td>
                <td>{c.reasons.length === 0 ? 'cheapest' : c.reasons.join('; ')}</td>
                <td>
                  <button type="button" className="button" disabled={busy} onClick={() => onMake(c)} aria-label={`Make a job from design ${c.rank}`}>
                    Make job
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
