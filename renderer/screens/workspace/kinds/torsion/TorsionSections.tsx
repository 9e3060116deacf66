import { memo } from 'react';
import { legFormSchema } from '../../../../../core/spec';
import type { UnitSystem } from '../../../../../core/units';
import { unitSymbol } from '../../../../../core/units';
import { SelectField, TextField } from '../../../../components/form/inputs';
import { legFormLabels, windLabels } from '../../../../model/labels';
import type { LegDraft, TorsionDraft } from '../../../../model/torsion-draft';
import { emptyAngleLoad } from '../../../../model/torsion-draft';
import { DutySection } from '../../form/DutySection';
import type { Edit } from '../../form/edit';
import { editKind } from '../../form/edit';
import { LoadRows } from '../../form/LoadRows';

function LegFields({ leg, i, length, onChange }: { leg: LegDraft; i: number; length: string; onChange(patch: Partial<LegDraft>): void }) {
  const name = i === 0 ? 'First leg' : 'Second leg';
  return (
    <>
      <TextField path={`spec.legs[${i}].length`} label={`${name}: length`} unit={length} numeric value={leg.length} onChange={(v) => onChange({ length: v })} />
      <SelectField path={`spec.legs[${i}].form`} label={`${name}: form`} value={leg.form} onChange={(v) => onChange({ form: v })}
        choices={legFormSchema.options.map((f) => ({ value: f, label: legFormLabels[f] }))} />
      <TextField rare path={`spec.legs[${i}].bendRadius`} label={`${name}: bend radius`} unit={length} numeric value={leg.bendRadius}
        onChange={(v) => onChange({ bendRadius: v })} />
    </>
  );
}

/** The sections only a torsion spring has: body and legs, wind and load direction, working angles and torques, duty. */
export const TorsionSections = memo(function TorsionSections({ spring, units, edit }: { spring: TorsionDraft; units: UnitSystem; edit: Edit }) {
  const set = editKind(edit, 'torsion');
  const length = unitSymbol('length', units);
  const setLeg = (i: 0 | 1) => (patch: Partial<LegDraft>) =>
    set((k) => ({ ...k, legs: (i === 0 ? [{ ...k.legs[0], ...patch }, k.legs[1]] : [k.legs[0], { ...k.legs[1], ...patch }]) as [LegDraft, LegDraft] }));
  return (
    <>
      <fieldset className="section">
        <legend>Body &amp; legs</legend>
        <div className="grid grid--4">
          <TextField path="spec.bodyCoils" label="Body coils" numeric value={spring.bodyCoils} onChange={(v) => set((k) => ({ ...k, bodyCoils: v }))} />
          <SelectField path="spec.windDirection" label="Direction of wind" value={spring.windDirection} onChange={(v) => set((k) => ({ ...k, windDirection: v }))}
            choices={(['right', 'left'] as const).map((w) => ({ value: w, label: windLabels[w] }))} />
          <SelectField path="spec.loadDirection" label="Load" value={spring.loadDirection} onChange={(v) => set((k) => ({ ...k, loadDirection: v }))}
            choices={[{ value: 'closing', label: 'closes the coils (usual)' }, { value: 'opening', label: 'opens the coils' }]} />
          <TextField path="spec.arborDiameter" label="Arbor diameter" unit={length} numeric value={spring.arborDiameter}
            onChange={(v) => set((k) => ({ ...k, arborDiameter: v }))} />
        </div>
        <div className="grid grid--3"><LegFields leg={spring.legs[0]} i={0} length={length} onChange={setLeg(0)} /></div>
        <div className="grid grid--3"><LegFields leg={spring.legs[1]} i={1} length={length} onChange={setLeg(1)} /></div>
      </fieldset>
      <fieldset className="section">
        <legend>Angles &amp; torques</legend>
        <div className="grid grid--4">
          <TextField path="spec.freeAngle" label="Free angle between legs" unit="°" numeric value={spring.freeAngle}
            onChange={(v) => set((k) => ({ ...k, freeAngle: v }))} />
          <TextField rare path="spec.freeAngleTolerance" label="Free angle tolerance ±" unit="°" numeric value={spring.freeAngleTolerance}
            onChange={(v) => set((k) => ({ ...k, freeAngleTolerance: v }))} />
        </div>
        <LoadRows rows={spring.loads} noun="working angle" tag="α" blank={emptyAngleLoad} onChange={(loads) => set((k) => ({ ...k, loads }))}
          columns={[
            { key: 'angle', label: (n) => `Deflection α${n} from free`, unit: '°' },
            { key: 'torque', label: (n) => `Torque M${n} (if specified)`, unit: unitSymbol('torque', units) },
            { key: 'tolerancePercent', label: (n) => `Tolerance on M${n} ±`, unit: '%', rare: true },
          ]} />
      </fieldset>
      <DutySection duty={spring.duty} unit="°" points={['Working deflection, first', 'Working deflection, second']}
        onChange={(patch) => set((k) => ({ ...k, duty: { ...k.duty, ...patch } }))} />
    </>
  );
});
