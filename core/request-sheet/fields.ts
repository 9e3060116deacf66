/**
 * What a column of a customer's request sheet can hold, and the words sheets use for it in their headers.
 * Headers are matched after lower-casing and dropping punctuation and units in brackets ("Wire dia. (mm)" →
 * "wire dia"), except the single letters d and D, which EN 13906-1 gives two meanings: d is the wire
 * diameter and D the mean coil diameter. The word lists are common trade practice in English-language
 * request sheets and drawings' title blocks.
 */
import type { FieldMeasure } from '../typed-number';

export const requestFields = [
  'partNumber', 'drawingNumber', 'drawingRevision', 'kind', 'material', 'wireDiameter', 'outerDiameter', 'innerDiameter',
  'meanDiameter', 'freeLength', 'totalCoils', 'activeCoils', 'ends', 'rate', 'load', 'loadLength', 'loadAtLength',
  'quantity', 'notes',
] as const;
export type RequestField = (typeof requestFields)[number];

export interface RequestFieldEntry {
  label: string;
  /** What a number in the column measures; absent for text columns. */
  measure?: FieldMeasure | 'count';
  /** Header words, already normalised (see normaliseHeader). */
  headers: readonly string[];
  /** Exact single-letter headers, case kept (d ≠ D). */
  symbols?: readonly string[];
  /** Header words that name the field only when no column names it better ("Item" is often a line number). */
  weak?: readonly string[];
}

export const requestFieldTable: Record<RequestField, RequestFieldEntry> = {
  partNumber: { label: 'Part number', headers: ['part number', 'part no', 'part', 'pn', 'p n', 'item', 'item no', 'customer part', 'part ref', 'part id'], weak: ['item', 'item no'] },
  drawingNumber: { label: 'Drawing number', headers: ['drawing', 'drawing number', 'drawing no', 'dwg', 'dwg no', 'drg', 'drg no'] },
  drawingRevision: { label: 'Drawing revision', headers: ['rev', 'revision', 'drawing rev', 'dwg rev', 'issue'] },
  kind: { label: 'Kind', headers: ['kind', 'type', 'spring type', 'spring kind', 'style'] },
  material: { label: 'Material / grade', headers: ['material', 'grade', 'wire grade', 'matl', 'mat', 'material grade', 'wire material', 'spec'] },
  wireDiameter: { label: 'Wire diameter', measure: 'length', headers: ['wire dia', 'wire diameter', 'wire', 'wire size', 'wd', 'dia wire', 'wire d'], symbols: ['d'] },
  outerDiameter: { label: 'Outside diameter', measure: 'length', headers: ['od', 'o d', 'outside dia', 'outside diameter', 'outer dia', 'outer diameter', 'de', 'd e', 'max od'] },
  innerDiameter: { label: 'Inside diameter', measure: 'length', headers: ['id', 'i d', 'inside dia', 'inside diameter', 'inner dia', 'inner diameter', 'di', 'd i', 'min id'] },
  meanDiameter: { label: 'Mean diameter', measure: 'length', headers: ['mean dia', 'mean diameter', 'md', 'dm', 'coil dia', 'coil diameter'], symbols: ['D'] },
  freeLength: { label: 'Free length', measure: 'length', headers: ['free length', 'l0', 'lo', 'l 0', 'fl', 'length free', 'free len', 'free lg', 'length'] },
  totalCoils: { label: 'Total coils', measure: 'count', headers: ['total coils', 'coils', 'nt', 'n t', 'no of coils', 'number of coils', 'tc', 'coils total'] },
  activeCoils: { label: 'Active coils', measure: 'count', headers: ['active coils', 'na', 'n a', 'working coils', 'ac', 'coils active'], symbols: ['n'] },
  ends: { label: 'Ends', headers: ['ends', 'end', 'end type', 'end form', 'ends type', 'end condition', 'end style'] },
  rate: { label: 'Rate', measure: 'rate', headers: ['rate', 'spring rate', 'stiffness', 'r', 'k', 'rate r'] },
  load: { label: 'Load', measure: 'force', headers: ['load', 'force', 'f1', 'p1', 'test load', 'working load', 'load f1', 'f'] },
  loadLength: { label: 'Length at load', measure: 'length', headers: ['length at load', 'load length', 'l1', 'test length', 'working length', 'at length', 'loaded length', 'length l1'] },
  loadAtLength: { label: 'Load @ length', headers: ['load at length', 'load @ length', 'force at length', 'f l', 'f at l', 'load @ height', 'load at height'] },
  quantity: { label: 'Quantity', measure: 'pieces', headers: ['quantity', 'qty', 'quantities', 'qtys', 'pcs', 'pieces', 'order qty', 'annual qty', 'eau', 'volume', 'batch'] },
  notes: { label: 'Notes', headers: ['notes', 'note', 'remarks', 'remark', 'comment', 'comments', 'description', 'desc'] },
};

/** Lower case, units in brackets and punctuation gone, "@" kept as a word: "Load @ Length (N @ mm)" → "load @ length". */
export function normaliseHeader(header: string): string {
  return header
    .replace(/\([^)]*\)|\[[^\]]*\]/g, ' ')
    .toLowerCase()
    .replace(/ø|⌀/g, 'dia ')
    .replace(/[^a-z0-9@]+/g, ' ')
    .trim()
    .replace(/\s+/g, ' ');
}
