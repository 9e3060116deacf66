import { useCallback, useMemo } from 'react';
import type { FormHandle } from '../../../components/form/scope';
import { FormScope } from '../../../components/form/scope';
import type { FormError } from '../../../model/errors';
import { jobPaths } from '../../../model/job-draft';
import { convertDraft, draftPaths } from '../../../model/spec-draft';
import type { Drafts } from '../../../hooks/useJobEditor';
import { useStable } from '../../../hooks/useStable';
import type { SpringKind } from '../../../../core/spec';
import { kindScreenOf } from '../kinds/kind-screens';
import type { SpecDraft } from '../../../model/spec-draft';
import { DiameterSection } from './DiameterSection';
import { KindSwitch } from './KindSwitch';
import type { Edit } from './edit';
import { FinishSection } from './FinishSection';
import { JobSection } from './JobSection';
import { QuantitySection } from './QuantitySection';
import { UnitsSwitch } from './UnitsSwitch';
import { WireSection } from './WireSection';

interface SpecFormProps {
  drafts: Drafts;
  edit: Edit;
  errors: FormError[];
  handle(h: FormHandle): void;
}

/** The sections only the chosen kind has, from the renderer's table of kinds. */
function KindSections<K extends SpringKind>({ kind, spec, edit }: { kind: K; spec: SpecDraft; edit: Edit }) {
  const { Sections } = kindScreenOf(kind);
  return <Sections spring={spec[kind]} order={spec.order} units={spec.units} edit={edit} />;
}

/** The spec in the order an estimator reads a drawing: who and what, wire, diameters, coils, lengths, duty, finish, quantities. */
export function SpecForm({ drafts, edit, errors, handle }: SpecFormProps) {
  const spec = drafts.spec;
  const switchUnits = useCallback((u: 'metric' | 'inch') => edit((d) => ({ ...d, spec: convertDraft(d.spec, u) })), [edit]);
  const fields = useStable(useMemo(() => [...jobPaths, ...draftPaths(spec).map((p) => `spec.${p}`)], [spec]));
  return (
    <FormScope scope="job" errors={errors} fields={fields} handle={handle}>
      {(unplaced) => (
        <form className="spec-form" aria-label="Spring specification" noValidate onSubmit={(e) => e.preventDefault()}>
          {unplaced.length > 0 ? (
            <div className="form-errors" role="alert">
              {unplaced.map((e, i) => <p key={i}>{e.path ? <code>{e.path}</code> : null} {e.message}</p>)}
            </div>
          ) : null}
          <div className="form-top">
            <KindSwitch kind={spec.kind} edit={edit} />
            <UnitsSwitch units={spec.units} onChange={switchUnits} />
          </div>
          <JobSection job={drafts.job} edit={edit} />
          <WireSection units={spec.units} material={spec.material} wireDiameter={spec.wireDiameter} overrides={spec.overrides} edit={edit} />
          <DiameterSection units={spec.units} diameterGiven={spec.diameterGiven} diameter={spec.diameter} edit={edit} />
          <KindSections kind={spec.kind} spec={spec} edit={edit} />
          <FinishSection kind={spec.kind} order={spec.order} units={spec.units} edit={edit} />
          <QuantitySection order={spec.order} notes={spec.notes} edit={edit} />
        </form>
      )}
    </FormScope>
  );
}
