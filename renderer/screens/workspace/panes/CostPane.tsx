import { useMemo, useState } from 'react';
import type { CostEstimate, PriceBreak } from '../../../../core/costing/types';
import { priceCurve } from '../../../../core/drawing';
import { useApi } from '../../../api';
import { Figure } from '../../../components/Figure';
import { useNavigation } from '../../../hooks/navigation';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { useQuery } from '../../../hooks/useQuery';
import { money } from '../../../model/shown';
import { unitPriceText } from '../../../../core/documents/text';
import { SettingsMoved } from './SettingsMoved';
import { PriceJudgement } from './PriceJudgement';

/** The price of the spring being edited at each break, line by line, from the shop's rates and prices. */
export function CostPane({ editor }: { editor: JobEditor }) {
  const api = useApi();
  const spec = editor.evaluation.spec;
  const quantities = spec?.quantities;
  const key = spec ? JSON.stringify(spec) : null;
  const orderQuantity = editor.job?.orderQuantity ?? undefined;
  const judgement = editor.job?.judgement;
  const pricing = { ...(orderQuantity ? { orderQuantity } : {}), ...(judgement ? { judgement } : {}) };
  const cost = useQuery(key === null ? null : `${key}|${JSON.stringify(pricing)}`, () => api.costEstimate({ spec, quantities, ...pricing }), 200);
  return (
    <div className="pane">
      <div className="pane__controls">
        <p className="muted">{quantities ? `Breaks from the spec’s price-break quantities (${quantities.join(', ')})` : orderQuantity ? `No breaks given: the shop’s breaks around the order quantity, ${orderQuantity} pcs` : 'No breaks or order quantity given: 100, 1000, 5000'}{orderQuantity && quantities ? `, with the order quantity ${orderQuantity}` : ''}.</p>
        <button type="button" className="button" onClick={cost.reload} disabled={!spec}>Recalculate</button>
        {cost.state === 'loading' ? <span role="status" className="muted">Pricing…</span> : null}
      </div>
      {!spec ? <p className="notice">Complete the spec first: pricing needs a valid spring.</p> : null}
      {cost.error ? <p className="error-text" role="alert">{cost.error.message}</p> : null}
      {editor.job && !editor.dirty && cost.value ? <SettingsMoved jobId={editor.job.id} revision={editor.job.revision} currency={cost.value.currency} /> : null}
      {spec && cost.value ? <CostBody estimate={cost.value} /> : null}
      {spec && cost.value && editor.job && !editor.dirty ? <PriceJudgement editor={editor} estimate={cost.value} /> : null}
    </div>
  );
}

function CostBody({ estimate }: { estimate: CostEstimate }) {
  const nav = useNavigation();
  const [chosen, setChosen] = useState(0);
  const c = estimate.currency;
  const curve = useMemo(() => priceCurve(estimate.breaks.map((b) => ({ quantity: b.quantity, unitPrice: b.unitPrice })), c, { width: 520, height: 280 }), [estimate, c]);
  const lines = estimate.breaks[chosen] ?? estimate.breaks[0];
  return (
    <>
      {estimate.missing.length > 0 ? (
        <div className="notice notice--warn" role="alert">
          <p><strong>The price is incomplete.</strong> The estimate went without:</p>
          <ul>{estimate.missing.map((m) => <li key={m.code + m.path}>{m.message}</li>)}</ul>
          <button type="button" className="button" onClick={() => nav.go({ screen: 'settings' })}>Open Shop settings</button>
        </div>
      ) : null}
      <div className="cost">
        <section className="panel" aria-labelledby="breaks-title">
          <h3 id="breaks-title" className="panel__title">Price breaks</h3>
          <table className="table breaks">
            <thead><tr><th scope="col" className="num">Quantity</th><th scope="col" className="num">Start</th><th scope="col" className="num">Unit price</th><th scope="col" className="num">Total</th><th scope="col"><span className="sr-only">Lines</span></th></tr></thead>
            <tbody>
              {estimate.breaks.map((b, i) => (
                <tr key={b.quantity} className={i === chosen ? 'is-selected' : undefined}>
                  <td className="num">{b.quantity}</td>
                  <td className="num">{b.startQuantity}</td>
                  <td className="num" data-unit-price={b.quantity}>{c} {unitPriceText(b.unitPrice)}</td>
                  <td className="num">{money(b.total, c)}</td>
                  <td><button type="button" className="button button--small" aria-pressed={i === chosen} onClick={() => setChosen(i)}>Lines for {b.quantity}</button></td>
                </tr>
              ))}
            </tbody>
          </table>
          {estimate.charges.length > 0 ? (
            <table className="table charges"><tbody>
              {estimate.charges.map((ch) => <tr key={ch.key} data-line={ch.key}><th scope="row">{ch.item}</th><td className="muted">{ch.basis}</td><td className="num">{money(ch.amount, c)}</td></tr>)}
            </tbody></table>
          ) : null}
          <p className="muted">Minimum order value {money(estimate.minimumOrderValue, c)}.</p>
        </section>
        <Figure svg={curve} label="Unit price against order quantity" />
      </div>
      {lines ? <CostLines pb={lines} currency={c} /> : null}
    </>
  );
}

function CostLines({ pb, currency }: { pb: PriceBreak; currency: string }) {
  return (
    <section className="panel" aria-labelledby="lines-title">
      <h3 id="lines-title" className="panel__title">Cost lines for {pb.quantity} pcs</h3>
      <table className="table">
        <thead><tr><th scope="col">Group</th><th scope="col">Item</th><th scope="col">Basis</th><th scope="col" className="num">Amount</th></tr></thead>
        <tbody>
          {pb.lines.map((l) => (
            <tr key={l.key} data-line={l.key}><td><span className={`tag tag--${l.group}`}>{l.group}</span></td><td>{l.item}</td><td className="muted">{l.basis}</td><td className="num">{money(l.amount, currency)}</td></tr>
          ))}
        </tbody>
        <tfoot><tr><th scope="row" colSpan={3}>Total</th><td className="num">{money(pb.total, currency)}</td></tr></tfoot>
      </table>
    </section>
  );
}
