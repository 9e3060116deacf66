import type { SpringReport } from '../../../../core/calculate';
import type { Spec } from '../../../../core/spec';
import { Caution, FatigueCaution, HydrogenCaution, NearSolidCaution, StoredEnergyCaution } from '../../../components/Caution';
import { useShopData } from '../../../hooks/shop-data';
import { effectiveFinish } from '../../../../core/finishing/effective';
import { reviewLimits } from '../../../../core/review/limits';

/** The cautions this spring calls for; stored energy always. `r` in internal units. */
export function SpringCautions({ r, spec }: { r: SpringReport; spec: Spec }) {
  const { settings } = useShopData();
  const { finish, bakeSpecification } = effectiveFinish(spec, settings?.finishes ?? []);
  // The set-removal verdict's own ratio: the governing method's stress at solid over its limit without set removal.
  const solid = r.kind === 'compression' ? r.setRemoval.ratio : 0;
  return (
    <div className="cautions">
      <StoredEnergyCaution />
      {r.kind === 'compression' && solid >= reviewLimits.nearAllowableRatio ? <NearSolidCaution percent={solid * 100} setRemoval={r.setRemoval.required} /> : null}
      {spec.kind === 'extension' && !spec.mechanicalStop ? (
        <Caution title="No mechanical stop">
          Without a stop an extension spring can be pulled past its safe length, take a set or let go of its hook. Ask for a
          stop in the assembly, or check that nothing can stretch it beyond the largest safe length shown above.
        </Caution>
      ) : null}
      {finish?.electroplated ? <HydrogenCaution finish={finish.name} bake={bakeSpecification} /> : null}
      {finish?.electroplated && spec.kind === 'extension' ? (
        <Caution title="Plating extension springs">Do not hold extension springs stretched while they are plated or baked.</Caution>
      ) : null}
      {r.fatigue ? <FatigueCaution /> : null}
    </div>
  );
}
