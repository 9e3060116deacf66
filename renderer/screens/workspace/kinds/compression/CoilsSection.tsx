import { compressionEndsSchema } from '../../../../../core/spec';
import { SelectField, TextField } from '../../../../components/form/inputs';
import type { CompressionDraft } from '../../../../model/compression-draft';
import { endsLabels } from '../../../../model/labels';
import type { OrderDraft } from '../../../../model/spec-draft';
import type { Edit } from '../../form/edit';
import { editKind } from '../../form/edit';
import { WindSelect } from '../../form/WindSelect';

/** Coil count (total as the drawing usually gives it, or active), end form and hand of wind. */
export function CoilsSection({ spring, order, edit }: { spring: CompressionDraft; order: OrderDraft; edit: Edit }) {
  const set = editKind(edit, 'compression');
  return (
    <fieldset className="section">
      <legend>Coils &amp; ends</legend>
      <div className="grid grid--4">
        <SelectField rare path="spec.coilsGiven" label="Coils given as" value={spring.coilsGiven}
          onChange={(v) => set((k) => ({ ...k, coilsGiven: v }))}
          choices={[{ value: 'totalCoils', label: 'total coils Nt' }, { value: 'activeCoils', label: 'active coils n' }]} />
        <TextField path={`spec.${spring.coilsGiven}`} label={spring.coilsGiven === 'totalCoils' ? 'Total coils Nt' : 'Active coils n'} numeric
          value={spring.coils} onChange={(v) => set((k) => ({ ...k, coils: v }))} />
        <SelectField path="spec.ends" label="Ends" value={spring.ends} onChange={(v) => set((k) => ({ ...k, ends: v }))}
          choices={compressionEndsSchema.options.map((e) => ({ value: e, label: endsLabels[e] }))} />
        <WindSelect order={order} edit={edit} />
      </div>
    </fieldset>
  );
}
