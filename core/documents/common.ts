import type { Settings } from '../settings/schema';
import type { Spec, SpringKind } from '../spec';
import { effectiveFinish } from '../finishing/effective';
import { kindLabel, kindTerms } from '../vocabulary';
import type { Field, Letterhead } from './types';

export function letterhead(settings: Settings): Letterhead {
  const p = settings.shopProfile;
  const contact = [p.phone && `Tel. ${p.phone}`, p.email && p.email].filter((s): s is string => Boolean(s));
  return { name: p.name || 'Spring shop (name not set)', addressLines: [...p.addressLines], contact, logo: p.logo ?? null };
}

/** Fields whose value is empty are left off the page rather than printed blank. */
export function present(fields: readonly Field[]): Field[] {
  return fields.filter((f) => f.value.trim() !== '');
}

/** The drawing number with its revision: "KP-2210 rev. C". */
export function drawingText(number: string, revision: string): string {
  if (!number) return revision ? `rev. ${revision}` : '';
  return revision ? `${number} rev. ${revision}` : number;
}

/** "compression" → "Compression spring", the drawing's heading when the part has no number. */
export function kindTitle(kind: SpringKind): string {
  return `${kindLabel(kind)} spring`;
}

/**
 * Finish, bake and tolerance grade, the same for every kind. An electroplated finish always shows its
 * bake: the one the customer or the finish names, never one chosen here.
 */
export function orderFields(spec: Spec, settings: Settings): Field[] {
  const { id, finish, bakeSpecification } = effectiveFinish(spec, settings.finishes);
  const fields: Field[] = [{ label: 'Finish', value: finish?.name ?? id ?? 'none (plain)' }];
  if (finish?.electroplated) fields.push({ label: 'Hydrogen relief bake', value: bakeSpecification ?? 'to be named by the customer' });
  fields.push({ label: kindTerms[spec.kind].toleranceGrade, value: String(spec.toleranceGrade ?? settings.defaults.toleranceGrade) });
  return fields;
}

/**
 * The drawing's free length; with a force specified it is a reference dimension (EN 15800 / DIN 2095: the
 * maker adjusts it to hold the force), and the document says so.
 */
export function freeLengthText(length: string, forceSpecified: boolean): string {
  return forceSpecified ? `${length} (reference)` : length;
}
