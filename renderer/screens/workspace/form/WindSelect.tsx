import { SelectField } from '../../../components/form/inputs';
import { windLabels } from '../../../model/labels';
import type { OrderDraft } from '../../../model/spec-draft';
import type { Edit } from './edit';
import { editSpec } from './edit';

/** Hand of wind as the order states it (compression and extension; a torsion spring's wind is part of its spec). */
export function WindSelect({ order, edit }: { order: OrderDraft; edit: Edit }) {
  return (
    <SelectField rare path="spec.directionOfWind" label="Direction of wind" value={order.directionOfWind}
      onChange={(v) => editSpec(edit)((s) => ({ ...s, order: { ...s.order, directionOfWind: v } }))}
      choices={[{ value: '', label: 'not stated' }, ...(['right', 'left', 'either'] as const).map((w) => ({ value: w, label: windLabels[w] }))]} />
  );
}
