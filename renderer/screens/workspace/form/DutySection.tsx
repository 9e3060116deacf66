import { CheckField, SelectField, TextField } from '../../../components/form/inputs';
import type { DutyDraft } from '../../../model/duty-draft';

interface DutyProps {
  duty: DutyDraft;
  onChange(patch: Partial<DutyDraft>): void;
  /** What the two working points are called and measured in (lengths, or angles for torsion). */
  points: [string, string];
  unit: string;
}

/** Static, or cycling between two working points (the fatigue check needs both). */
export function DutySection({ duty, onChange, points, unit }: DutyProps) {
  return (
    <fieldset className="section">
      <legend>Duty</legend>
      <div className="grid grid--3">
        <SelectField rare path="spec.duty.type" label="Duty" value={duty.type} onChange={(v) => onChange({ type: v })}
          choices={[{ value: 'static', label: 'static (few cycles)' }, { value: 'cyclic', label: 'cyclic (fatigue)' }]} />
      </div>
      {duty.type === 'cyclic' ? (
        <div className="grid grid--4">
          <TextField path="spec.duty.between[0]" label={points[0]} unit={unit} numeric value={duty.between[0]}
            onChange={(v) => onChange({ between: [v, duty.between[1]] })} />
          <TextField path="spec.duty.between[1]" label={points[1]} unit={unit} numeric value={duty.between[1]}
            onChange={(v) => onChange({ between: [duty.between[0], v] })} />
          <TextField path="spec.duty.cycles" label="Cycles required" numeric value={duty.cycles} onChange={(v) => onChange({ cycles: v })} />
          <TextField path="spec.duty.frequency" label="Working frequency" unit="Hz" numeric value={duty.frequency}
            onChange={(v) => onChange({ frequency: v })} />
          <CheckField path="spec.duty.peened" label="Shot peened (raises the endurance limit)" checked={duty.peened}
            onChange={(on) => onChange({ peened: on })} />
        </div>
      ) : null}
    </fieldset>
  );
}
