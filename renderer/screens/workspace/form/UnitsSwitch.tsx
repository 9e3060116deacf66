import { memo } from 'react';
import type { UnitSystem } from '../../../../core/units';
import { useFormField, useRareTabStop } from '../../../components/form/scope';

const systems: { value: UnitSystem; label: string; detail: string }[] = [
  { value: 'metric', label: 'Metric', detail: 'mm, N, MPa' },
  { value: 'inch', label: 'Inch', detail: 'in, lbf, psi' },
];

/** The job's unit system; switching converts every value entered so far. */
export const UnitsSwitch = memo(function UnitsSwitch({ units, onChange }: { units: UnitSystem; onChange(units: UnitSystem): void }) {
  const f = useFormField('spec.units');
  const rareStop = useRareTabStop();
  return (
    <fieldset className="units-switch" id={f.id}>
      <legend>Units of this job</legend>
      {systems.map((s) => (
        <label key={s.value} className={`units-switch__option${units === s.value ? ' is-on' : ''}`}>
          <input type="radio" name="job-units" value={s.value} checked={units === s.value} onChange={() => onChange(s.value)}
            ref={units === s.value ? f.ref : undefined} tabIndex={rareStop} />
          <span>{s.label}</span> <span className="muted">{s.detail}</span>
        </label>
      ))}
    </fieldset>
  );
});
