import { freeParameterSchema, seatingSchema } from '../../../../../core/spec';
import type { UnitSystem } from '../../../../../core/units';
import { unitSymbol } from '../../../../../core/units';
import { CheckField, SelectField, TextField } from '../../../../components/form/inputs';
import type { CompressionDraft } from '../../../../model/compression-draft';
import { emptyLoad } from '../../../../model/compression-draft';
import { freeParameterLabels, seatingLabels } from '../../../../model/labels';
import type { Edit } from '../../form/edit';
import { editKind } from '../../form/edit';
import { LoadRows } from '../../form/LoadRows';

/** Free length, the test lengths with their forces and tolerances, seating, and what the maker may adjust. */
export function LoadsSection({ spring, units, edit }: { spring: CompressionDraft; units: UnitSystem; edit: Edit }) {
  const set = editKind(edit, 'compression');
  const length = unitSymbol('length', units);
  return (
    <fieldset className="section">
      <legend>Lengths &amp; loads</legend>
      <div className="grid grid--3">
        <TextField path="spec.freeLength" label="Free length L0" unit={length} numeric value={spring.freeLength}
          onChange={(v) => set((k) => ({ ...k, freeLength: v }))} />
        <SelectField rare path="spec.seating" label="Seating (for buckling)" value={spring.seating} wide
          onChange={(v) => set((k) => ({ ...k, seating: v }))}
          choices={seatingSchema.options.map((s) => ({ value: s, label: seatingLabels[s] }))} />
      </div>
      <LoadRows rows={spring.loads} noun="test length" tag="L" blank={emptyLoad} onChange={(loads) => set((k) => ({ ...k, loads }))}
        columns={[
          { key: 'length', label: (n) => `Test length L${n}`, unit: length },
          { key: 'force', label: (n) => `Force F${n} (if specified)`, unit: unitSymbol('force', units) },
          { key: 'tolerancePercent', label: (n) => `Tolerance on F${n} ±`, unit: '%', rare: true },
        ]} />
      <fieldset className="subsection">
        <legend>The maker may adjust (EN 15800 free parameters)</legend>
        <div className="checks">
          {freeParameterSchema.options.map((p) => (
            <CheckField rare key={p} path={`spec.freeParameters.${p}`} label={freeParameterLabels[p]} checked={spring.freeParameters.includes(p)}
              onChange={(on) => set((k) => ({ ...k, freeParameters: on ? [...k.freeParameters, p] : k.freeParameters.filter((x) => x !== p) }))} />
          ))}
        </div>
      </fieldset>
    </fieldset>
  );
}
