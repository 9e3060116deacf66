import { memo } from 'react';
import type { UnitSystem } from '../../../../core/units';
import { unitSymbol } from '../../../../core/units';
import type { SpringKind } from '../../../../core/spec';
import { kindTerms } from '../../../../core/vocabulary';
import { SelectField, TextField } from '../../../components/form/inputs';
import { useShopData } from '../../../hooks/shop-data';
import type { OrderDraft } from '../../../model/spec-draft';
import type { Edit } from './edit';
import { editSpec } from './edit';

const gradeChoices = [
  { value: '', label: 'shop default' },
  { value: '1', label: 'Grade 1 (fine)' },
  { value: '2', label: 'Grade 2 (medium)' },
  { value: '3', label: 'Grade 3 (coarse)' },
] as const;

/** Tolerance grade, finish with its bake, peening and the service temperature. */
export const FinishSection = memo(function FinishSection({ kind, order, units, edit }: { kind: SpringKind; order: OrderDraft; units: UnitSystem; edit: Edit }) {
  const set = (patch: Partial<OrderDraft>) => editSpec(edit)((s) => ({ ...s, order: { ...s.order, ...patch } }));
  const { settings } = useShopData();
  const finishes = settings?.finishes ?? [];
  const chosen = finishes.find((f) => f.id === order.finish);
  const known = order.finish === '' || order.finish === 'none' || chosen !== undefined;
  const temperature = unitSymbol('temperature', units);
  return (
    <>
      <fieldset className="section">
        <legend>Tolerance grade</legend>
        <div className="grid grid--3">
          <SelectField rare path="spec.toleranceGrade" label={kindTerms[kind].toleranceGrade} value={order.toleranceGrade} choices={gradeChoices}
            onChange={(v) => set({ toleranceGrade: v })} hint="Sets the limits on the traveller and the inspection plan" wide />
        </div>
      </fieldset>
      <fieldset className="section">
        <legend>Finish</legend>
        <div className="grid grid--3">
          <SelectField path="spec.finish" label="Finish" value={order.finish} onChange={(v) => set({ finish: v })}
            hint={chosen?.electroplated ? 'Electroplated: a hydrogen-relief bake is needed' : undefined}
            choices={[
              { value: '', label: 'none' },
              ...finishes.map((f) => ({ value: f.id, label: f.electroplated ? `${f.name} (electroplated)` : f.name })),
              ...(known ? [] : [{ value: order.finish, label: `${order.finish} (not in the shop's finishes)` }]),
            ]} />
          <TextField rare path="spec.bakeSpecification" label="Bake specification" value={order.bakeSpecification}
            placeholder={chosen?.bakeSpecification ?? 'as the customer names it'} onChange={(v) => set({ bakeSpecification: v })} wide />
          <SelectField rare path="spec.shotPeen" label="Shot peen" value={order.shotPeen} onChange={(v) => set({ shotPeen: v })}
            choices={[{ value: '', label: 'as the duty needs' }, { value: 'yes', label: 'yes' }, { value: 'no', label: 'no' }]} />
          <TextField rare path="spec.serviceTemperature.min" label="Service temperature, lowest" unit={temperature} numeric
            value={order.temperatureMin} onChange={(v) => set({ temperatureMin: v })} />
          <TextField rare path="spec.serviceTemperature.max" label="Service temperature, highest" unit={temperature} numeric
            value={order.temperatureMax} onChange={(v) => set({ temperatureMax: v })} />
        </div>
      </fieldset>
    </>
  );
});
