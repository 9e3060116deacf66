import { memo } from 'react';
import { extensionEndFormSchema } from '../../../../../core/spec';
import type { UnitSystem } from '../../../../../core/units';
import { unitSymbol } from '../../../../../core/units';
import { CheckField, SelectField, TextField } from '../../../../components/form/inputs';
import { emptyLoad } from '../../../../model/compression-draft';
import type { EndDraft, ExtensionDraft } from '../../../../model/extension-draft';
import { extensionEndLabels } from '../../../../model/labels';
import type { OrderDraft } from '../../../../model/spec-draft';
import { DutySection } from '../../form/DutySection';
import type { Edit } from '../../form/edit';
import { editKind } from '../../form/edit';
import { LoadRows } from '../../form/LoadRows';
import { WindSelect } from '../../form/WindSelect';

function EndFields({ end, i, length, onChange }: { end: EndDraft; i: number; length: string; onChange(patch: Partial<EndDraft>): void }) {
  const name = i === 0 ? 'First end' : 'Second end';
  return (
    <>
      <SelectField path={`spec.ends[${i}]`} label={name} value={end.form} onChange={(v) => onChange({ form: v })}
        choices={extensionEndFormSchema.options.map((f) => ({ value: f, label: extensionEndLabels[f] }))} />
      <TextField path={`spec.ends[${i}].gap`} label={`${name}: loop opening`} unit={length} numeric value={end.gap} onChange={(v) => onChange({ gap: v })} />
      {end.form === 'extended-hook' ? (
        <TextField path={`spec.ends[${i}].extension`} label={`${name}: hook extension`} unit={length} numeric value={end.extension}
          onChange={(v) => onChange({ extension: v })} />
      ) : null}
      <TextField rare path={`spec.ends[${i}].bendRadius`} label={`${name}: bend radius`} unit={length} numeric value={end.bendRadius}
        onChange={(v) => onChange({ bendRadius: v })} />
    </>
  );
}

/** The sections only an extension spring has: body and ends, lengths inside the ends with initial tension, duty. */
export const ExtensionSections = memo(function ExtensionSections({ spring, order, units, edit }: {
  spring: ExtensionDraft; order: OrderDraft; units: UnitSystem; edit: Edit;
}) {
  const set = editKind(edit, 'extension');
  const length = unitSymbol('length', units);
  const setEnd = (i: 0 | 1) => (patch: Partial<EndDraft>) =>
    set((k) => ({ ...k, ends: (i === 0 ? [{ ...k.ends[0], ...patch }, k.ends[1]] : [k.ends[0], { ...k.ends[1], ...patch }]) as [EndDraft, EndDraft] }));
  return (
    <>
      <fieldset className="section">
        <legend>Body &amp; ends</legend>
        <div className="grid grid--4">
          <TextField path="spec.bodyCoils" label="Body coils" numeric value={spring.bodyCoils} onChange={(v) => set((k) => ({ ...k, bodyCoils: v }))} />
          <WindSelect order={order} edit={edit} />
        </div>
        <div className="grid grid--4"><EndFields end={spring.ends[0]} i={0} length={length} onChange={setEnd(0)} /></div>
        <div className="grid grid--4"><EndFields end={spring.ends[1]} i={1} length={length} onChange={setEnd(1)} /></div>
      </fieldset>
      <fieldset className="section">
        <legend>Lengths &amp; loads (inside the ends)</legend>
        <div className="grid grid--4">
          <TextField path="spec.freeLength" label="Free length inside ends" unit={length} numeric value={spring.freeLength}
            hint="Leave empty to take the one the ends make" onChange={(v) => set((k) => ({ ...k, freeLength: v }))} />
          <TextField path="spec.bodyLength" label="Body length" unit={length} numeric value={spring.bodyLength}
            hint="If the drawing gives it" onChange={(v) => set((k) => ({ ...k, bodyLength: v }))} />
          <TextField path="spec.initialTension" label="Initial tension" unit={unitSymbol('force', units)} numeric value={spring.initialTension}
            hint="Leave empty to have one proposed" onChange={(v) => set((k) => ({ ...k, initialTension: v }))} />
          <TextField path="spec.loopAngle" label="Loop angle" unit="°" numeric value={spring.loopAngle} onChange={(v) => set((k) => ({ ...k, loopAngle: v }))} />
          <TextField rare path="spec.loopAngleTolerance" label="Loop angle tolerance ±" unit="°" numeric value={spring.loopAngleTolerance}
            onChange={(v) => set((k) => ({ ...k, loopAngleTolerance: v }))} />
        </div>
        <LoadRows rows={spring.loads} noun="test length" tag="L" blank={emptyLoad} onChange={(loads) => set((k) => ({ ...k, loads }))}
          columns={[
            { key: 'length', label: (n) => `Length inside ends L${n}`, unit: length },
            { key: 'force', label: (n) => `Force F${n} (if specified)`, unit: unitSymbol('force', units) },
            { key: 'tolerancePercent', label: (n) => `Tolerance on F${n} ±`, unit: '%', rare: true },
          ]} />
        <CheckField path="spec.mechanicalStop" label="The assembly has a mechanical stop (limits the extension)" checked={spring.mechanicalStop}
          onChange={(on) => set((k) => ({ ...k, mechanicalStop: on }))} />
      </fieldset>
      <DutySection duty={spring.duty} unit={length} points={['Working length, short L1', 'Working length, long L2']}
        onChange={(patch) => set((k) => ({ ...k, duty: { ...k.duty, ...patch } }))} />
    </>
  );
});
