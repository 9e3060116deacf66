/**
 * The kind registry: every step that differs by kind of spring finds the kind's part here. A new kind is
 * its own files plus one line in this table (and one in the renderer's, renderer/model/kind-forms.ts); a
 * kind missing from either table does not compile.
 */
import type { SpringKind } from '../spec';
import { compressionKind } from './compression';
import { extensionKind } from './extension';
import { torsionKind } from './torsion';
import type { KindEntry } from './types';

const registry: { readonly [K in SpringKind]: KindEntry<K> } = {
  compression: compressionKind,
  extension: extensionKind,
  torsion: torsionKind,
};

/**
 * The entry of a spec's or report's kind. For a union (`Spec`, `SpringReport`) the entry takes the union:
 * the caller passes the spec or report whose kind it asked for, which is what keeps the pairing right.
 */
export function kindEntryOf<K extends SpringKind>(kind: K): KindEntry<K> {
  return registry[kind];
}
