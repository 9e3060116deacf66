import { useMemo, useState } from 'react';
import type { DesignAnswer, DesignCandidate } from '../../../core/design';
import type { FieldError } from '../../../core/result';
import { useApi } from '../../api';
import { ScreenHeading } from '../../components/ScreenHeading';
import { FormScope } from '../../components/form/scope';
import { Progress } from '../../components/Progress';
import { ReviewCaution, StoredEnergyCaution } from '../../components/Caution';
import { useNavigation } from '../../hooks/navigation';
import { useShopData } from '../../hooks/shop-data';
import { friendlyError } from '../../model/errors';
import type { RequirementDraft } from '../../model/requirement-draft';
import { emptyRequirementDraft, requirementOfDraft } from '../../model/requirement-draft';
import { CandidateTable } from './CandidateTable';
import { RequirementForm, requirementFields } from './RequirementForm';

const underRequirement = (errors: FieldError[]) => errors.map((e) => ({ ...e, path: e.path.replace(/^requirement\.?/, '') }));

/** Springs the shop can make from the customer's requirement, cheapest first; one becomes a job. */
export function DesignScreen() {
  const api = useApi();
  const nav = useNavigation();
  const shop = useShopData();
  const [draft, setDraft] = useState<RequirementDraft>(() => emptyRequirementDraft(shop.settings?.defaults.units ?? 'metric'));
  const [errors, setErrors] = useState<FieldError[]>([]);
  const [answer, setAnswer] = useState<DesignAnswer | null>(null);
  const [asked, setAsked] = useState<unknown>(null);
  const [state, setState] = useState<'idle' | 'searching' | 'making'>('idle');
  const [failure, setFailure] = useState<string | null>(null);
  const formErrors = useMemo(() => errors.map((e) => friendlyError(e)), [errors]);
  const set = <K extends keyof RequirementDraft>(key: K, value: RequirementDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));

  const search = async () => {
    const { requirement, errors: typing } = requirementOfDraft(draft);
    setFailure(null);
    if (typing.length > 0) {
      setErrors(typing);
      return;
    }
    setState('searching');
    const result = await api.designSprings({ requirement, limit: 10 });
    setState('idle');
    if (!result.ok) {
      setErrors(underRequirement(result.error.details ?? [result.error]));
      setAnswer(null);
      return;
    }
    setErrors([]);
    setAsked(requirement);
    setAnswer(result.value);
  };

  const make = async (c: DesignCandidate) => {
    setState('making');
    const result = await api.adoptDesign({ requirement: asked, spec: c.spec, job: draft.reference.trim() ? { partNumber: draft.reference.trim().slice(0, 64) } : {} });
    setState('idle');
    if (!result.ok) {
      setFailure(result.error.message);
      return;
    }
    shop.refresh();
    nav.openJob(result.value.id);
  };

  return (
    <section className="screen screen--design" aria-labelledby="design-title">
      <div className="screen__head">
        <ScreenHeading id="design-title">Design from the customer&apos;s requirement</ScreenHeading>
        <div className="screen__actions">
          <button type="button" className="button button--primary" disabled={state !== 'idle'} onClick={() => void search()}>Find designs</button>
        </div>
      </div>
      <p className="muted">
        Every wire the shop can use, every allowed grade and end type: the coil diameter inside the envelope and the coils for the
        forces, checked by the engine and the maker&apos;s review, priced with the shop&apos;s own costing.
      </p>
      <FormScope scope="requirement" errors={formErrors} fields={requirementFields}>
        {(unplaced) => <>
          {unplaced.length > 0 ? <ul className="error-text" role="alert">{unplaced.map((e) => <li key={`${e.path}-${e.code}`}>{e.path ? `${e.path}: ` : ''}{e.message}</li>)}</ul> : null}
          <RequirementForm draft={draft} finishes={shop.settings?.finishes ?? []} set={set} />
        </>}
      </FormScope>
      {state === 'searching' ? <Progress label="Searching…" /> : null}
      {failure ? <p className="error-text" role="alert">{failure}</p> : null}
      {answer ? <DesignResults answer={answer} busy={state !== 'idle'} onMake={(c) => void make(c)} /> : null}
    </section>
  );
}

function DesignResults({ answer, busy, onMake }: { answer: DesignAnswer; busy: boolean; onMake(c: DesignCandidate): void }) {
  const s = answer.searched;
  return (
    <section className="design-results" aria-labelledby="design-results-title">
      <h2 id="design-results-title" className="panel__title">
        {answer.candidates.length > 0 ? `${answer.feasibleCount} designs meet the requirement; the best ${answer.candidates.length}` : 'No design meets the requirement'}
      </h2>
      <p className="muted">
        Tried {s.wires} wires, {s.combinations} wire, end and peening combinations, {s.points} coil diameters; {s.engineRuns} designs analysed and
        reviewed by the engine. {answer.clearanceRule}
      </p>
      {answer.infeasible ? (
        <div className="panel" role="alert">
          <p>{answer.infeasible.message}</p>
        </div>
      ) : <CandidateTable answer={answer} busy={busy} onMake={onMake} />}
      <StoredEnergyCaution />
      <ReviewCaution />
    </section>
  );
}
