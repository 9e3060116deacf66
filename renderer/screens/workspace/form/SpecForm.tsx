import { useCallback, useMemo, useState } from 'react';
import { fieldName } from '../../../model/labels';
import { sentenceCase } from '../../../../core/vocabulary';
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
  understood: readonly { path: string; message: string }[];
  handle(h: FormHandle): void;
}

const ORDER_KEY = 'coilwright.entry-order';

/** Whether Tab visits every field, as the estimator last chose on this machine (the compact order by default). */
function useEntryOrder(): [boolean, (every: boolean) => void] {
  const [every, setEvery] = useState(() => {
    try { return window.localStorage.getItem(ORDER_KEY) === 'every'; } catch { return false; }
  });
  const choose = useCallback((on: boolean) => {
    setEvery(on);
    try { window.localStorage.setItem(ORDER_KEY, on ? 'every' : 'compact'); } catch { /* a private window keeps it for now */ }
  }, []);
  return [every, choose];
}

/** The sections only the chosen kind has, from the renderer's table of kinds. */
function KindSections<K extends SpringKind>({ kind, spec, edit }: { kind: K; spec: SpecDraft; edit: Edit }) {
  const { Sections } = kindScreenOf(kind);
  return <Sections spring={spec[kind]} order={spec.order} units={spec.units} edit={edit} />;
}

/** The spec in the order an estimator reads a drawing: who and what, wire, diameters, coils, lengths, duty, finish, quantities. */
export function SpecForm({ drafts, edit, errors, understood, handle }: SpecFormProps) {
  const [every, setEvery] = useEntryOrder();
  const spec = drafts.spec;
  const switchUnits = useCallback((u: 'metric' | 'inch') => edit((d) => ({ ...d, spec: convertDraft(d.spec, u) })), [edit]);
  const fields = useStable(useMemo(() => [...jobPaths, ...draftPaths(spec).map((p) => `spec.${p}`)], [spec]));
  return (
    <FormScope scope="job" errors={errors} fields={fields} handle={handle} understood={understood} compact={!every}>
      {(unplaced) => (
        <form className="spec-form" aria-label="Spring specification" noValidate onSubmit={(e) => e.preventDefault()}>
          {unplaced.length > 0 ? (
            <div className="form-errors" role="alert">
              {unplaced.map((e, i) => <p key={i}>{e.path ? `${sentenceCase(fieldName(e.path.replace(/^spec\./, '')))}: ` : null}{e.message}</p>)}
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
          <label className="entry-order">
            <input type="checkbox" checked={every} onChange={(e) => setEvery(e.target.checked)} />
            {' '}Tab through every field (otherwise Tab visits the fields a drawing gives; the others stay a click away)
          </label>
        </form>
      )}
    </FormScope>
  );
}
