import { memo } from 'react';
import type { UnitSystem } from '../../../../../core/units';
import { unitSymbol } from '../../../../../core/units';
import type { CompressionDraft } from '../../../../model/compression-draft';
import type { OrderDraft } from '../../../../model/spec-draft';
import { DutySection } from '../../form/DutySection';
import type { Edit } from '../../form/edit';
import { editKind } from '../../form/edit';
import { CoilsSection } from './CoilsSection';
import { LoadsSection } from './LoadsSection';

/** The sections only a compression spring has. */
export const CompressionSections = memo(function CompressionSections({ spring, order, units, edit }: {
  spring: CompressionDraft; order: OrderDraft; units: UnitSystem; edit: Edit;
}) {
  const set = editKind(edit, 'compression');
  return (
    <>
      <CoilsSection spring={spring} order={order} edit={edit} />
      <LoadsSection spring={spring} units={units} edit={edit} />
      <DutySection duty={spring.duty} unit={unitSymbol('length', units)}
        points={['Working length, long L1', 'Working length, short L2']}
        onChange={(patch) => set((k) => ({ ...k, duty: { ...k.duty, ...patch } }))} />
    </>
  );
});
