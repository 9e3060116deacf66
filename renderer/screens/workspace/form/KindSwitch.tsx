import type { SpringKind } from '../../../../core/spec';
import { springKinds } from '../../../../core/spec';
import { memo } from 'react';
import { SelectField } from '../../../components/form/inputs';
import type { Edit } from './edit';
import { kindLabel } from '../../../../core/vocabulary';

/** The kind of spring; each kind keeps what was typed for it, so switching back loses nothing. */
export const KindSwitch = memo(function KindSwitch({ kind, edit }: { kind: SpringKind; edit: Edit }) {
  return (
    <SelectField path="spec.kind" label="Kind of spring" value={kind} onChange={(k) => edit((d) => ({ ...d, spec: { ...d.spec, kind: k } }))}
      choices={springKinds.map((k) => ({ value: k, label: kindLabel(k) }))} />
  );
});
