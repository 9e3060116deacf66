import { memo } from 'react';
import { TextAreaField, TextField } from '../../../components/form/inputs';
import type { OrderDraft } from '../../../model/spec-draft';
import type { Edit } from './edit';
import { editSpec } from './edit';

/** Price-break quantities, the inspection AQL, and notes that travel with the spec. */
export const QuantitySection = memo(function QuantitySection({ order, notes, edit }: { order: OrderDraft; notes: string; edit: Edit }) {
  const set = editSpec(edit);
  return (
    <fieldset className="section">
      <legend>Quantities</legend>
      <div className="grid grid--3">
        <TextField path="spec.quantities" label="Price-break quantities" unit="pcs" value={order.quantities} wide
          hint="Up to 12, split by ; or / or a new line, e.g. 100; 1 000; 5 000" onChange={(v) => set((s) => ({ ...s, order: { ...s.order, quantities: v } }))} />
        <TextField rare path="spec.aql" label="Inspection AQL" unit="%" numeric value={order.aql} placeholder="1.0"
          onChange={(v) => set((s) => ({ ...s, order: { ...s.order, aql: v } }))} />
      </div>
      <TextAreaField rare path="spec.notes" label="Spec notes" value={notes} rows={2}
        onChange={(v) => set((s) => ({ ...s, notes: v }))} />
    </fieldset>
  );
});
