/**
 * The renderer's table of kinds for the screens: each kind's form sections, key figures, stress bars and
 * load table rows. With core/kinds/registry.ts and model/kind-drafts.ts, a new kind is one line in each
 * table; a kind missing here does not compile.
 */
import type { ComponentType } from 'react';
import type { ReportOf } from '../../../../core/kinds/types';
import type { SpringKind } from '../../../../core/spec';
import type { UnitSystem } from '../../../../core/units';
import type { KindDraftOf } from '../../../model/kind-drafts';
import type { OrderDraft } from '../../../model/spec-draft';
import type { Edit } from '../form/edit';
import type { LoadRow, Readout, StressBar } from '../results/readout-data';
import { CompressionSections } from './compression/CompressionSections';
import { axialLoadRows, compressionBars, compressionFigures } from './compression/readouts';
import { ExtensionSections } from './extension/ExtensionSections';
import { extensionBars, extensionFigures } from './extension/readouts';
import { torsionBars, torsionFigures, torsionLoadRows } from './torsion/readouts';
import { TorsionSections } from './torsion/TorsionSections';

export interface KindSectionsProps<K extends SpringKind> {
  spring: KindDraftOf<K>;
  order: OrderDraft;
  units: UnitSystem;
  edit: Edit;
}

export interface KindScreen<K extends SpringKind> {
  Sections: ComponentType<KindSectionsProps<K>>;
  readouts(r: ReportOf<K>): Readout[];
  stressBars(r: ReportOf<K>): StressBar[];
  loadRows(r: ReportOf<K>): LoadRow[];
}

const screens: { readonly [K in SpringKind]: KindScreen<K> } = {
  compression: { Sections: CompressionSections, readouts: compressionFigures, stressBars: compressionBars, loadRows: axialLoadRows },
  extension: { Sections: ExtensionSections, readouts: extensionFigures, stressBars: extensionBars, loadRows: axialLoadRows },
  torsion: { Sections: TorsionSections, readouts: torsionFigures, stressBars: torsionBars, loadRows: torsionLoadRows },
};

export function kindScreenOf<K extends SpringKind>(kind: K): KindScreen<K> {
  return screens[kind];
}
