/**
 * The words customers write in the text cells of a request sheet, read into the spec's own values: spring
 * kinds, end forms and wire grades. The aliases are common trade practice (the names wire is ordered by);
 * a cell that matches nothing is an error naming the cell, never a guess.
 */
import type { CompressionEnds, ExtensionEndForm, SpringKind } from '../spec';
import { wireGrades } from '../materials/catalog';

const plain = (text: string): string => text.toLowerCase().replace(/&/g, ' and ').replace(/[^a-z0-9.]+/g, ' ').trim();

const KIND_WORDS: Record<string, SpringKind> = {
  compression: 'compression', comp: 'compression', c: 'compression', 'compression spring': 'compression', push: 'compression',
  extension: 'extension', ext: 'extension', e: 'extension', tension: 'extension', 'extension spring': 'extension', 'tension spring': 'extension', pull: 'extension',
  torsion: 'torsion', tor: 'torsion', t: 'torsion', 'torsion spring': 'torsion',
};

export function readKind(text: string): SpringKind | null {
  return KIND_WORDS[plain(text)] ?? null;
}

const COMPRESSION_END_WORDS: Record<string, CompressionEnds> = {
  'closed and ground': 'closed-ground', 'closed ground': 'closed-ground', 'c and g': 'closed-ground', cg: 'closed-ground',
  'squared and ground': 'closed-ground', 'square and ground': 'closed-ground', 'sq and gr': 'closed-ground', ground: 'closed-ground',
  'closed not ground': 'closed', closed: 'closed', squared: 'closed', square: 'closed', 'closed unground': 'closed', cng: 'closed',
  'open and ground': 'open-ground', 'open ground': 'open-ground', 'plain and ground': 'open-ground', og: 'open-ground',
  open: 'open', plain: 'open', 'open not ground': 'open', 'open unground': 'open',
};

const EXTENSION_END_WORDS: Record<string, ExtensionEndForm> = {
  'machine loop': 'machine-loop', 'machine loops': 'machine-loop', 'machine hook': 'machine-loop', 'machine hooks': 'machine-loop',
  'full loop': 'full-loop', 'full loops': 'full-loop', 'german loop': 'full-loop',
  'crossover loop': 'crossover-loop', 'crossover loops': 'crossover-loop', 'cross over loop': 'crossover-loop', crossover: 'crossover-loop',
  'side loop': 'side-loop', 'side loops': 'side-loop', 'extended hook': 'extended-hook', 'extended hooks': 'extended-hook',
};

export const readCompressionEnds = (text: string): CompressionEnds | null => COMPRESSION_END_WORDS[plain(text)] ?? null;
export const readExtensionEnds = (text: string): ExtensionEndForm | null => EXTENSION_END_WORDS[plain(text)] ?? null;

/** Names wire is ordered by that are not in a grade's id or standard designation (common trade practice). */
const GRADE_ALIASES: Record<string, string> = {
  'music wire': 'astm-a228', mw: 'astm-a228', 'piano wire': 'astm-a228',
  'oil tempered': 'astm-a229', 'oil tempered carbon': 'astm-a229', ot: 'astm-a229',
  'chrome vanadium': 'astm-a232', crv: 'astm-a232', 'chrome silicon': 'astm-a401', crsi: 'astm-a401',
  'stainless 302': 'astm-a313-302', 'ss 302': 'astm-a313-302', ss302: 'astm-a313-302', '302': 'astm-a313-302', '302 ss': 'astm-a313-302',
  '17 7': 'astm-a313-631', '17 7 ph': 'astm-a313-631', '631': 'astm-a313-631',
  'phosphor bronze': 'astm-b159', 'beryllium copper': 'astm-b197', becu: 'astm-b197', 'be cu': 'astm-b197',
  'stainless 1.4310': 'en10270-3-1.4310', '1.4310': 'en10270-3-1.4310', 'x10crni18 8': 'en10270-3-1.4310',
};

/**
 * The keys a grade answers to: its id, its grade symbol with and without the standard ("SH", "EN 10270-1 SH",
 * "A228", "ASTM A228"), and the standard alone where only one grade of the library comes under it.
 */
function gradeKeys(id: string, standard: string, soleOfStandard: boolean): string[] {
  const keys = [plain(id)];
  if (soleOfStandard) keys.push(plain(standard));
  if (id.startsWith('en10270')) {
    const symbol = id.split('-').slice(-1)[0] ?? id;
    keys.push(plain(symbol), plain(`${standard} ${symbol}`), plain(`${symbol} ${standard}`));
  } else if (id.startsWith('astm-')) {
    const symbol = id.slice('astm-'.length);
    keys.push(plain(symbol), plain(`astm ${symbol}`));
  }
  return keys;
}

const GRADE_INDEX: ReadonlyMap<string, string> = (() => {
  const index = new Map<string, string>();
  const perStandard = new Map<string, number>();
  for (const g of wireGrades) perStandard.set(g.standard, (perStandard.get(g.standard) ?? 0) + 1);
  for (const g of wireGrades) {
    for (const key of gradeKeys(g.id, g.standard, perStandard.get(g.standard) === 1)) index.set(key, g.id);
    index.set(plain(g.name), g.id);
  }
  for (const [alias, id] of Object.entries(GRADE_ALIASES)) if (wireGrades.some((g) => g.id === id)) index.set(alias, id);
  return index;
})();

/** The wire grade id a cell names; null when it names none of the library's grades. */
export function readGrade(text: string): string | null {
  return GRADE_INDEX.get(plain(text)) ?? null;
}
