/** The cautions every printed document carries (common trade practice, in the project's own words; see docs/sources.md). */
import { effectiveFinish } from '../finishing/effective';
import type { FinishChoice } from '../finishing/effective';
import type { ManufacturingPlan } from '../process/plan';
import type { OperationKind } from '../process/types';
import type { Finish } from '../settings/schema';
import type { NoticeModel } from './types';

export const STORED_ENERGY_CAUTION =
  'Springs store energy. A compressed, extended or wound spring can let it go suddenly while it is set, tested, ' +
  'assembled or removed, and can injure people. Use guards and fixtures; never hold a loaded spring by hand.';

export const REVIEW_CAUTION =
  'The figures in this document support, and do not replace, review of the design by a qualified engineer, ' +
  'the customer\'s approval of the drawing, and the standards, codes and regulations that apply where the ' +
  'spring is used.';

/** For the shop's own papers only: where its tables come from is no matter for a customer document. */
export const TABLES_CAUTION =
  'Tolerance and process tables are reproduced from third-party reprints and may be incomplete: check them against the current standard.';

/** The caution every document carries; the shop's own papers add the note on its tables. */
export function cautionNotice(audience: 'customer' | 'shop'): NoticeModel {
  const review = audience === 'shop' ? `${REVIEW_CAUTION} ${TABLES_CAUTION}` : REVIEW_CAUTION;
  return { title: 'Caution', paragraphs: [STORED_ENERGY_CAUTION, review] };
}

/** What the floor must know before it starts, from the operations the routing holds. */
export interface SafetyContext {
  pressesToSolid: boolean;
  grinds: boolean;
  heatTreats: boolean;
  electroplated: boolean;
  /** The bake specification as named by the customer or the finish, never chosen here. */
  bakeSpecification: string | null;
}

function platingNote(bake: string | null): string {
  const named = bake
    ? `Bake to the named specification: ${bake}. Start the bake within that specification's window after plating.`
    : 'NO BAKE SPECIFICATION IS NAMED: do not release the lot to plating until the customer names one.';
  return 'Hydrogen embrittlement: electroplated high-strength spring steel can crack suddenly, even long after ' +
    `delivery and without warning. ${named} Baking lowers the risk but does not remove it; the bake is never ` +
    'chosen by this software.';
}

export function safetyNotes(c: SafetyContext): string[] {
  const notes = [STORED_ENERGY_CAUTION];
  if (c.pressesToSolid) notes.push('Set removal: press to solid only in a guarded fixture; keep hands clear of the stroke.');
  if (c.electroplated) notes.push(platingNote(c.bakeSpecification));
  if (c.grinds) notes.push('Grinding wheels can burst if misused: check each wheel, its flanges and the guard before the run.');
  if (c.heatTreats) notes.push('Ovens and plating lines are hot and use acids: follow the local occupational-safety rules.');
  return notes;
}

/** What the floor must know for this plan: from its operations and the order's effective finish and bake. */
export function planSafetyNotes(plan: ManufacturingPlan, spec: FinishChoice, finishes: readonly Finish[]): string[] {
  const has = (kind: OperationKind) => plan.operations.some((op) => op.kind === kind);
  const { finish, bakeSpecification } = effectiveFinish(spec, finishes);
  return safetyNotes({
    pressesToSolid: has('set'), grinds: has('grind'), heatTreats: has('stress-relieve') || has('bake'),
    electroplated: finish?.electroplated ?? false, bakeSpecification,
  });
}
