import { useState } from 'react';
import type { ApiError } from '../../../../core/api';
import type { CostEstimate } from '../../../../core/costing/types';
import type { JobJudgement } from '../../../../core/quoting/judgement';
import { PlainInput } from '../../../components/Plain';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { parseNumber } from '../../../model/numbers';
import { money } from '../../../model/shown';

const num = (text: string): number | null => {
  const p = parseNumber(text);
  return p.ok && p.value !== undefined && p.value > 0 ? p.value : null;
};

/**
 * The estimator's price for this job: margin, a unit price at a break, one-off charges. Each override is
 * kept with the job, with its reason, and shown beside the shop's figure on the cost lines.
 */
export function PriceJudgement({ editor, estimate }: { editor: JobEditor; estimate: CostEstimate }) {
  const job = editor.job!;
  const j: JobJudgement = job.judgement;
  const c = estimate.currency;
  const [quantity, setQuantity] = useState(String(estimate.breaks[0]?.quantity ?? ''));
  const [price, setPrice] = useState('');
  const [margin, setMargin] = useState('');
  const [reason, setReason] = useState('');
  const [chargeLabel, setChargeLabel] = useState('');
  const [chargeAmount, setChargeAmount] = useState('');
  const [error, setError] = useState<ApiError | null>(null);
  const save = async (next: JobJudgement) => setError(await editor.saveJudgement(next));
  const why = reason.trim();
  const q = Number(quantity);
  const setUnit = () => {
    const v = num(price);
    if (v === null) return;
    void save({ ...j, price: { ...j.price, unitPrices: [...j.price.unitPrices.filter((p) => p.quantity !== q), { quantity: q, unitPrice: v, reason: why }] } });
  };
  const setMarginNow = () => {
    const p = parseNumber(margin);
    if (!p.ok || p.value === undefined) return;
    void save({ ...j, price: { ...j.price, marginPercent: { value: p.value, reason: why } } });
  };
  const addCharge = () => {
    const v = num(chargeAmount);
    if (v === null || chargeLabel.trim() === '') return;
    void save({ ...j, price: { ...j.price, charges: [...j.price.charges, { label: chargeLabel.trim(), amount: v }] } });
  };
  return (
    <section className="panel price-judgement" aria-labelledby="judgement-title">
      <h3 id="judgement-title" className="panel__title">Your price for this job</h3>
      <ul className="judgement-list">
        {j.price.marginPercent ? (
          <li>Margin {j.price.marginPercent.value} % — {j.price.marginPercent.reason}{' '}
            <button type="button" className="button button--small" onClick={() => void save({ ...j, price: { ...j.price, marginPercent: undefined } })}>Back to the shop margin</button></li>
        ) : null}
        {j.price.unitPrices.map((p) => (
          <li key={p.quantity} data-unit-override={p.quantity}>Unit price at {p.quantity} pcs: {money(p.unitPrice, c)} — {p.reason}{' '}
            <button type="button" className="button button--small" onClick={() => void save({ ...j, price: { ...j.price, unitPrices: j.price.unitPrices.filter((x) => x !== p) } })}>Remove</button></li>
        ))}
        {j.price.charges.map((ch, i) => (
          <li key={`${ch.label}-${i}`}>One-off: {ch.label} {money(ch.amount, c)}{' '}
            <button type="button" className="button button--small" onClick={() => void save({ ...j, price: { ...j.price, charges: j.price.charges.filter((x) => x !== ch) } })}>Remove</button></li>
        ))}
      </ul>
      <div className="judgement-form">
        <PlainInput label="Reason" value={reason} onChange={setReason} hint="kept with each price you set" />
        <label className="field"><span className="field__label">Break</span>
          <select className="input" value={quantity} onChange={(e) => setQuantity(e.target.value)} aria-label="Break">
            {estimate.breaks.map((b) => <option key={b.quantity} value={b.quantity}>{b.quantity} pcs</option>)}
          </select>
        </label>
        <PlainInput label={`Unit price (${c})`} value={price} onChange={setPrice} numeric />
        <button type="button" className="button" disabled={why.length < 3 || num(price) === null} onClick={setUnit}>Set unit price</button>
        <PlainInput label="Margin (%)" value={margin} onChange={setMargin} numeric />
        <button type="button" className="button" disabled={why.length < 3 || margin.trim() === ''} onClick={setMarginNow}>Set margin</button>
        <PlainInput label="One-off charge" value={chargeLabel} onChange={setChargeLabel} hint="tooling, first article, certificates" />
        <PlainInput label={`Charge (${c})`} value={chargeAmount} onChange={setChargeAmount} numeric />
        <button type="button" className="button" disabled={chargeLabel.trim() === '' || num(chargeAmount) === null} onClick={addCharge}>Add charge</button>
      </div>
      {error ? <p className="error-text" role="alert">{error.message}</p> : null}
    </section>
  );
}
