import type { Finish } from '../settings/schema';

/** The spec's order fields the finish depends on. */
export interface FinishChoice {
  finish?: string | undefined;
  bakeSpecification?: string | undefined;
}

/** The finish an order gets and the bake that goes with it, as every screen, plan and document reads it. */
export interface EffectiveFinish {
  /** The finish id the spec names; null for none. */
  id: string | null;
  /** The shop's finish of that id; null for none, or when the shop has no finish of that id. */
  finish: Finish | null;
  /** The bake the customer names on the spec, else the one the finish names; never chosen here. */
  bakeSpecification: string | null;
}

export function effectiveFinish(spec: FinishChoice, finishes: readonly Finish[]): EffectiveFinish {
  const id = spec.finish === undefined || spec.finish === 'none' ? null : spec.finish;
  const finish = id === null ? null : finishes.find((f) => f.id === id) ?? null;
  return { id, finish, bakeSpecification: spec.bakeSpecification ?? finish?.bakeSpecification ?? null };
}
