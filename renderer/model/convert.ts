import type { FieldMeasure } from '../../core/typed-number';
import type { Quantity, QuantityMap, UnitSystem } from '../../core/units';
import { fromInternal, OWN, quantityAt, sameInBothSystems, toInternal } from '../../core/units';
import { numberText, parseNumber } from './numbers';

/** Converts the text of one field between unit systems; text that is not a number is kept as typed. */
export function convertText(text: string, quantity: Quantity, from: UnitSystem, to: UnitSystem): string {
  if (from === to) return text;
  const parsed = parseNumber(text, quantity, from);
  if (!parsed.ok || parsed.value === undefined) return text;
  return numberText(fromInternal(toInternal(parsed.value, quantity, from), quantity, to));
}

/**
 * Converts every text of a draft part whose field the quantity map declares (the spec's own map from core,
 * so the form converts exactly what the engine does). A draft part mirrors the spec's shape: nested parts
 * and lists follow the map; quantities that read the same in both systems (counts, angles) keep their text.
 */
export function convertTexts<T>(draft: T, map: QuantityMap, from: UnitSystem, to: UnitSystem): T {
  if (from === to) return draft;
  const walk = (v: unknown, m: Quantity | typeof OWN | QuantityMap): unknown => {
    if (Array.isArray(v)) return v.map((item) => walk(item, m));
    if (m === OWN) return v;
    if (typeof m === 'string') return typeof v === 'string' && !sameInBothSystems(m) ? convertText(v, m, from, to) : v;
    if (v === null || typeof v !== 'object') return v;
    const out: Record<string, unknown> = {};
    for (const [key, inner] of Object.entries(v as Record<string, unknown>)) {
      const sub = m[key];
      out[key] = sub === undefined ? inner : walk(inner, sub);
    }
    return out;
  };
  return walk(draft, map) as T;
}

/** What the reader understood of one field's text, e.g. `read "12 mm" as 0.4724409 in`. */
export interface Understood {
  path: string;
  message: string;
}

/** What the field at a spec path measures, by the spec's quantity map ("loads[1].force" → force). */
export function measureAt(quantities: QuantityMap, path: string): FieldMeasure | undefined {
  return quantityAt(quantities, path.replace(/\[\d+\]/g, ''));
}

/** Collects field errors and what was understood while a draft turns into the raw object the schema checks. */
export class RawBuilder {
  readonly errors: { code: string; path: string; message: string }[] = [];
  readonly understood: Understood[] = [];

  constructor(private readonly units?: UnitSystem, private readonly quantities: QuantityMap = {}) {}

  /** The number in `text` in the job's units, or undefined when empty or not a number (then an error names `path`). */
  number(path: string, text: string, measure: FieldMeasure | undefined = measureAt(this.quantities, path)): number | undefined {
    const parsed = parseNumber(text, measure, this.units);
    if (!parsed.ok) {
      this.errors.push({ code: parsed.code, path, message: parsed.message });
      return undefined;
    }
    if (parsed.understood) this.understood.push({ path, message: parsed.understood });
    return parsed.value;
  }

  /** Like `number`, but an empty field is an error too. */
  required(path: string, text: string, what: string): number | undefined {
    if (text.trim() === '') {
      this.errors.push({ code: 'required', path, message: `${what} is needed` });
      return undefined;
    }
    return this.number(path, text);
  }
}

/** Drops keys whose value is undefined, so optional fields are left out rather than sent as nothing. */
export function compact<T extends Record<string, unknown>>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}
