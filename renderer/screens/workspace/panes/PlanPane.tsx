import { kindTerms } from '../../../../core/vocabulary';
import { BakeComparison } from './BakeComparison';
import { useState } from 'react';
import type { ManufacturingPlan } from '../../../../core/process/plan';
import type { Spec } from '../../../../core/spec';
import { planSafetyNotes } from '../../../../core/documents/cautions';
import { lotWireTexts } from '../../../../core/documents/traveller-sections';
import { useApi } from '../../../api';
import { Caution } from '../../../components/Caution';
import { PlainInput } from '../../../components/Plain';
import { useShopData } from '../../../hooks/shop-data';
import type { JobEditor } from '../../../hooks/useJobEditor';
import { useQuery } from '../../../hooks/useQuery';
import { parseNumber } from '../../../model/numbers';
import { Findings } from '../results/Findings';
import { Inspection, Operations } from './PlanTables';
import { SetCalibrationPanel } from './SetCalibrationPanel';
import { RoutingJudgement } from './RoutingJudgement';

function initialQuantity(editor: JobEditor): string {
  const q = editor.drafts.job.orderQuantity || editor.evaluation.spec?.quantities?.[0]?.toString();
  return q && q !== '' ? q : '1000';
}

/** How the shop makes an order of the spring being edited: routing, wire, inspection, with the floor's cautions. */
export function PlanPane({ editor, onGo }: { editor: JobEditor; onGo(path: string): void }) {
  const api = useApi();
  const [quantityText, setQuantityText] = useState(() => initialQuantity(editor));
  const parsed = parseNumber(quantityText);
  const quantity = parsed.ok && parsed.value !== undefined && Number.isInteger(parsed.value) && parsed.value >= 1 ? parsed.value : null;
  const spec = editor.evaluation.spec;
  const judgement = editor.job?.judgement;
  const key = spec && quantity ? JSON.stringify([spec, quantity, judgement]) : null;
  const plan = useQuery(key, () => api.manufacturingPlan({ spec, orderQuantity: quantity ?? 1, ...(judgement ? { judgement } : {}) }), 200);
  return (
    <div className="pane">
      <div className="pane__controls">
        <PlainInput label="Order quantity (pcs)" value={quantityText} onChange={setQuantityText} numeric
          hint={quantity === null ? 'a whole number of pieces, 1 or more' : 'Plans this many good pieces'} />
        {plan.state === 'loading' ? <span role="status" className="muted">Planning…</span> : null}
      </div>
      {!spec ? <p className="notice">Complete the spec first: the plan needs a valid spring.</p> : null}
      {plan.error ? <p className="error-text" role="alert">{plan.error.message}</p> : null}
      {spec && plan.value ? <PlanBody plan={plan.value} spec={spec} onGo={onGo} /> : null}
      {spec && plan.value && editor.job && !editor.dirty ? <RoutingJudgement editor={editor} plan={plan.value} /> : null}
    </div>
  );
}

/** A title for each of the floor's safety notes (core/documents/cautions), by what it opens with. */
function floorTitle(note: string): string {
  const titles: [string, string][] = [
    ['Springs store', 'Stored energy'], ['Set removal', 'Set removal'], ['Hydrogen', 'Hydrogen embrittlement'],
    ['Grinding', 'Grinding wheels'], ['Ovens', 'Heat and acids'],
  ];
  return titles.find(([start]) => note.startsWith(start))?.[1] ?? 'On the floor';
}

function PlanBody({ plan, spec, onGo }: { plan: ManufacturingPlan; spec: Spec; onGo(path: string): void }) {
  const { settings } = useShopData();
  const notes = planSafetyNotes(plan, spec, settings?.finishes ?? []);
  const u = plan.units;
  const lot = lotWireTexts(plan);
  const len = (v: number) => `${v.toFixed(u === 'inch' ? 3 : 2)} ${u === 'inch' ? 'in' : 'mm'}`;
  return (
    <>
      <dl className="facts">
        <div><dt>Wire</dt><dd>{plan.material.name}, d {len(plan.material.wireDiameter)}</dd></div>
        {plan.coiledFreeLength !== null && plan.freeLength !== null ? (
          <div><dt>Coil to free length</dt><dd>{len(plan.coiledFreeLength)}{plan.coiledFreeLength > plan.freeLength ? ` (finished ${len(plan.freeLength)})` : ''}</dd></div>
        ) : null}
        <div><dt>Wire per piece</dt><dd>{len(plan.wireLengthPerPiece)}</dd></div>
        <div><dt>Start quantity</dt><dd>{plan.lotWire.startQuantity} pcs for {plan.orderQuantity} good</dd></div>
        <div><dt>Wire for the lot</dt><dd>{lot.length}, {lot.mass}</dd></div>
        <div><dt>Wire stock</dt><dd className={`stock stock--${plan.lotWire.stock.status}`} data-stock={plan.lotWire.stock.status}>{plan.lotWire.stock.text}</dd></div>
        <div><dt>{kindTerms[plan.kind].toleranceGrade}</dt><dd>{plan.toleranceGrade}</dd></div>
      </dl>
      <div className="cautions cautions--grid">
        {notes.map((n) => <Caution key={n} title={floorTitle(n)}>{n}</Caution>)}
      </div>
      <Operations plan={plan} />
      <BakeComparison plan={plan} spec={spec} finishes={settings?.finishes ?? []} />
      <SetCalibrationPanel spec={spec} />
      <Inspection plan={plan} />
      {plan.findings.length > 0 ? <Findings findings={plan.findings} onGo={onGo} title="Planning findings" /> : null}
    </>
  );
}
