import { describe, expect, it } from 'vitest';
import { analyseSpec } from '../../core/calculate';
import { springDrawing, specDrawingOptions } from '../../core/drawing';
import { MAX_DRAWN_TURNS, TURNS_DRAWN_EACH_END, omittedTurns } from '../../core/drawing/coils';
import { parseSpec } from '../../core/spec';
import { cellPadding, fitText } from '../../core/drawing/table';
import { textWidth } from '../../core/drawing/svg';
import type { Spec } from '../../core/spec';
import { drawbarExtension, lidTorsion } from '../fixtures/specs';

const spec = (raw: unknown): Spec => {
  const r = parseSpec(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};
const drawing = (s: Spec): string => springDrawing(analyseSpec(s), specDrawingOptions(s));
const polygons = (svg: string): number => (svg.match(/<polygon/g) ?? []).length;

const compression = (coils: number) => spec({
  kind: 'compression', units: 'metric', material: 'en10270-1-dh', wireDiameter: 1, outerDiameter: 10, totalCoils: coils,
  ends: 'closed-ground', freeLength: coils * 2.5,
});

describe('drawing cost is bounded whatever the coil count', () => {
  it('draws every turn of an ordinary spring and no omission mark', () => {
    const svg = drawing(compression(12));
    expect(svg).not.toContain('omitted-turns');
    expect(omittedTurns(12)).toBeNull();
  });

  // ISO 2162-1 (simplified representation): the middle coils of a long spring may be left out and the
  // wire centres joined by thin chain lines across the gap (from memory).
  it.each([
    ['compression', (n: number) => compression(n)],
    ['extension', (n: number) => spec({ ...drawbarExtension, bodyCoils: n })],
    ['torsion', (n: number) => spec({ ...lidTorsion, bodyCoils: n })],
  ])('a %s body of 4000 turns draws no more than one of 30, with the break marked', (_kind, make) => {
    const long = drawing(make(4000));
    const short = drawing(make(30));
    expect(long).toContain('data-part="omitted-turns"');
    expect(polygons(long)).toBeLessThanOrEqual(polygons(short));
    expect(long.length).toBeLessThan(short.length * 1.5);
  });

  it('cuts a long title in the data block with an ellipsis to its cell', () => {
    const s = compression(10);
    const title = 'KP-2210-LONG-PART-NUMBER-AS-SOME-CUSTOMERS-WRITE-THEM-0123456789AB';
    const svg = springDrawing(analyseSpec(s), { ...specDrawingOptions(s), title });
    expect(svg).not.toContain(title);
    expect(svg).toMatch(/>KP-2210-[A-Z0-9-]*\.\.\.</);
    expect(fitText('x'.repeat(4000), 100, 7)).toMatch(/^x+\.\.\.$/);
    expect(textWidth(fitText('W'.repeat(4000), 100, 7), 7)).toBeLessThanOrEqual(100 - 2 * cellPadding);
    expect(fitText('Material', 100, 7)).toBe('Material');
  });

  it('keeps the same number of turns at each end', () => {
    expect(omittedTurns(MAX_DRAWN_TURNS + 10)).toEqual({ from: TURNS_DRAWN_EACH_END, to: MAX_DRAWN_TURNS + 10 - TURNS_DRAWN_EACH_END });
  });
});
