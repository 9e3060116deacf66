import { memo } from 'react';
import type { UnitSystem } from '../../../../core/units';
import { unitSymbol } from '../../../../core/units';
import { SelectField, TextField } from '../../../components/form/inputs';
import type { DiameterGiven } from '../../../model/spec-draft';
import type { Edit } from './edit';
import { editSpec } from './edit';

const diameterNames: Record<DiameterGiven, string> = { outerDiameter: 'Outside diameter OD', innerDiameter: 'Inside diameter ID', meanDiameter: 'Mean diameter D' };

/** The one coil diameter the drawing dimensions: outside (works in a bore), inside (works over a rod or arbor) or mean. */
export const DiameterSection = memo(function DiameterSection({ units, diameterGiven, diameter, edit }: {
  units: UnitSystem; diameterGiven: DiameterGiven; diameter: string; edit: Edit;
}) {
  const set = editSpec(edit);
  return (
    <fieldset className="section">
      <legend>Diameters</legend>
      <div className="grid grid--3">
        <SelectField rare path="spec.diameterGiven" label="The drawing dimensions the" value={diameterGiven}
          onChange={(v) => set((s) => ({ ...s, diameterGiven: v }))}
          choices={[
            { value: 'outerDiameter', label: 'outside diameter (bore)' },
            { value: 'innerDiameter', label: 'inside diameter (rod)' },
            { value: 'meanDiameter', label: 'mean diameter' },
          ]} />
        <TextField path={`spec.${diameterGiven}`} label={diameterNames[diameterGiven]} unit={unitSymbol('length', units)} numeric
          value={diameter} onChange={(v) => set((s) => ({ ...s, diameter: v }))} />
      </div>
    </fieldset>
  );
});
