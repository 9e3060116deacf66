/**
 * The renderer's table of kinds for the spec draft: each kind's empty part, its part from a stored spec,
 * its raw fields for the schema and the form paths it has. Unit conversion needs no entry: it follows the
 * kind's spec quantities in core's kind registry. With core/kinds/registry.ts and
 * screens/workspace/kinds/kind-screens.tsx, a new kind is one line in each table.
 */
import type { SpecOf } from '../../core/kinds/types';
import type { SpringKind } from '../../core/spec';
import type { CompressionDraft } from './compression-draft';
import { compressionFromSpec, compressionPaths, compressionRaw, emptyCompression } from './compression-draft';
import type { RawBuilder } from './convert';
import type { ExtensionDraft } from './extension-draft';
import { emptyExtension, extensionFromSpec, extensionPaths, extensionRaw } from './extension-draft';
import type { KindRaw } from './rows';
import type { TorsionDraft } from './torsion-draft';
import { emptyTorsion, torsionFromSpec, torsionPaths, torsionRaw } from './torsion-draft';

/** Each kind's part of the draft; a kind without one here does not compile. */
export interface KindDraftTypes {
  compression: CompressionDraft;
  extension: ExtensionDraft;
  torsion: TorsionDraft;
}

export type KindDraftOf<K extends SpringKind> = KindDraftTypes[K];

/** Every kind's part, each kept while another kind is chosen, so switching back loses nothing. */
export type KindDrafts = { [K in SpringKind]: KindDraftOf<K> };

export interface KindDraftModel<K extends SpringKind> {
  empty(): KindDraftOf<K>;
  fromSpec(spec: SpecOf<K>): KindDraftOf<K>;
  toRaw(draft: KindDraftOf<K>, b: RawBuilder): KindRaw;
  /** The spec paths the kind's sections have a field for, in reading order. */
  paths(draft: KindDraftOf<K>): string[];
}

export const kindDraftModels: { readonly [K in SpringKind]: KindDraftModel<K> } = {
  compression: { empty: emptyCompression, fromSpec: compressionFromSpec, toRaw: compressionRaw, paths: compressionPaths },
  extension: { empty: emptyExtension, fromSpec: extensionFromSpec, toRaw: extensionRaw, paths: extensionPaths },
  torsion: { empty: emptyTorsion, fromSpec: torsionFromSpec, toRaw: torsionRaw, paths: torsionPaths },
};

export const emptyKindDrafts = (): KindDrafts => ({
  compression: kindDraftModels.compression.empty(),
  extension: kindDraftModels.extension.empty(),
  torsion: kindDraftModels.torsion.empty(),
});
