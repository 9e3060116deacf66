import type { ManufacturingPlan } from '../../../../core/process/plan';
import type { Spec } from '../../../../core/spec';
import { bakeGuidance, bakeSpecNames, parseBakeSpecification } from '../../../../core/finishing/bake';
import { effectiveFinish } from '../../../../core/finishing/effective';
import type { Finish } from '../../../../core/settings/schema';
import { toInternal } from '../../../../core/units';

/**
 * What each hydrogen-relief specification says for this wire, side by side. The comparison is for the
 * estimator and the engineer; the traveller carries only the named specification's bake.
 */
export function BakeComparison({ plan, spec, finishes }: { plan: ManufacturingPlan; spec: Spec; finishes: readonly Finish[] }) {
  const { finish, bakeSpecification } = effectiveFinish(spec, finishes);
  if (!finish?.electroplated) return null;
  const guidance = bakeGuidance(toInternal(plan.material.tensileStrength, 'stress', plan.units), { units: plan.units });
  if (!guidance.ok) return null;
  const named = bakeSpecification === null ? null : parseBakeSpecification(bakeSpecification);
  return (
    <section className="panel" aria-labelledby="bake-compare-title">
      <h3 id="bake-compare-title" className="panel__title">Hydrogen-relief bake: what each specification says</h3>
      <p className="muted">
        {bakeSpecification ? <>The order names <strong>{bakeSpecification}</strong>: only its bake prints on the traveller.</>
          : 'No specification is named: the customer must name one before the lot goes to plating.'}
      </p>
      <table className="table table--compact">
        <thead><tr><th scope="col">Specification</th><th scope="col">For this wire</th><th scope="col">Source</th></tr></thead>
        <tbody>
          {guidance.value.map((g) => (
            <tr key={g.spec} className={g.spec === named ? 'is-selected' : undefined}>
              <td>{g.spec === 'spring-maker-practice' ? g.title : bakeSpecNames[g.spec]}{g.spec === named ? ' (named)' : ''}</td>
              <td>{g.says}{g.conflict ? ` — ${g.conflict}` : ''}</td>
              <td className="muted">{g.source}{g.verified ? '' : ' (not checked against the standard)'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
