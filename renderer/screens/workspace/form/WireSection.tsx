import { memo } from 'react';
import type { UnitSystem } from '../../../../core/units';
import { unitSymbol } from '../../../../core/units';
import { SelectField, TextField } from '../../../components/form/inputs';
import { useShopData } from '../../../hooks/shop-data';
import type { OverridesDraft } from '../../../model/spec-draft';
import { useRareTabStop } from '../../../components/form/scope';
import { formatQuantity } from '../../../../core/format';
import type { Edit } from './edit';
import { editSpec } from './edit';

/**
 * The grade's own designation first ("SH", "A228"), the last part of its id: typing it picks the grade in the
 * closed list, a few keys instead of arrowing through the library.
 */
const gradeCode = (id: string): string => (id.split('-').pop() ?? id).toUpperCase();

/** Wire grade and size, and the mill certificate's figures where they replace the library's. */
interface WireProps {
  units: UnitSystem;
  material: string;
  wireDiameter: string;
  overrides: OverridesDraft;
  edit: Edit;
}

export const WireSection = memo(function WireSection({ units: u, material, wireDiameter, overrides, edit }: WireProps) {
  const set = editSpec(edit);
  const rareStop = useRareTabStop();
  const { grades } = useShopData();
  const grade = grades.find((g) => g.id === material);
  const range = grade
    ? `Sizes ${formatQuantity(grade.diameterRange.min, 'length', u)} to ${formatQuantity(grade.diameterRange.max, 'length', u)}; ` +
      `service ${formatQuantity(grade.serviceTemperature.min, 'temperature', u)} to ${formatQuantity(grade.serviceTemperature.max, 'temperature', u)}`
    : undefined;
  const override = (key: keyof OverridesDraft) => (v: string) => set((s) => ({ ...s, overrides: { ...s.overrides, [key]: v } }));
  return (
    <fieldset className="section">
      <legend>Wire &amp; grade</legend>
      <div className="grid grid--3">
        <SelectField path="spec.material" label="Wire grade" value={material} wide hint={range}
          onChange={(v) => set((s) => ({ ...s, material: v }))}
          choices={[{ value: '', label: 'Choose a grade…' }, ...grades.map((g) => ({ value: g.id, label: `${gradeCode(g.id)} · ${g.name}` }))]} />
        <TextField path="spec.wireDiameter" label="Wire diameter d" unit={unitSymbol('length', u)} numeric
          value={wireDiameter} onChange={(v) => set((s) => ({ ...s, wireDiameter: v }))} />
      </div>
      <details className="more" open={Object.values(overrides).some((v) => v !== '') || undefined}>
        <summary tabIndex={rareStop}>Mill certificate values (replace the library’s)</summary>
        <div className="grid grid--4">
          <TextField path="spec.materialOverrides.tensileStrength" label="Tensile strength Rm" unit={unitSymbol('stress', u)} numeric
            value={overrides.tensileStrength} onChange={override('tensileStrength')} />
          <TextField path="spec.materialOverrides.shearModulus" label="Shear modulus G" unit={unitSymbol('stress', u)} numeric
            value={overrides.shearModulus} onChange={override('shearModulus')} />
          <TextField path="spec.materialOverrides.elasticModulus" label="Elastic modulus E" unit={unitSymbol('stress', u)} numeric
            value={overrides.elasticModulus} onChange={override('elasticModulus')} />
          <TextField path="spec.materialOverrides.density" label="Density" unit={unitSymbol('density', u)} numeric
            value={overrides.density} onChange={override('density')} />
        </div>
      </details>
    </fieldset>
  );
});
