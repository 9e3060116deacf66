/** Text typed into a number field: a plain decimal with an optional exponent; a comma is not a decimal point. */
const numberPattern = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export type Parsed = { ok: true; value: number | undefined } | { ok: false; message: string };

/** Empty text is "not given"; anything else must be a number. */
export function parseNumber(text: string): Parsed {
  const t = text.trim();
  if (t === '') return { ok: true, value: undefined };
  if (!numberPattern.test(t)) {
    return { ok: false, message: t.includes(',') ? 'use a point for decimals, e.g. 2.5' : 'a number, e.g. 2.5' };
  }
  return { ok: true, value: Number(t) };
}

/**
 * A value shown in a field: the shortest decimal within one part in a million, at most seven significant
 * digits. Seven digits carry a value to the other unit system and back to what was typed (45 mm →
 * 1.771654 in → 45 mm), and the snap drops the float noise a conversion leaves (44.99999 → 45).
 */
export function numberText(value: number | undefined | null): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  if (value === 0) return '0';
  for (let digits = 1; digits < 7; digits++) {
    const candidate = Number(value.toPrecision(digits));
    if (Math.abs(candidate - value) <= 1e-6 * Math.abs(value)) return String(candidate);
  }
  return String(Number(value.toPrecision(7)));
}

/** Comma- or space-separated whole numbers, e.g. order quantities "100, 1000, 5000". */
export function parseList(text: string): { ok: true; value: number[] } | { ok: false; message: string } {
  const parts = text.split(/[,;\s]+/).filter((p) => p !== '');
  const value: number[] = [];
  for (const p of parts) {
    if (!/^\d+$/.test(p)) return { ok: false, message: `"${p}" is not a whole number of pieces` };
    value.push(Number(p));
  }
  return { ok: true, value };
}
