import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSpec } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { SpecInput } from '../../core/spec';
import type { CompressionReport } from '../../core/springs/compression/report';
import { fromInternal } from '../../core/units';
import {
  compressionDrawing, escapeXml, goodmanDiagram, linearTicks, loadDeflectionDiagram, logTicks, niceStep, num,
  priceCurve,
} from '../../core/drawing';
import { axialProfile, springGeometry } from '../../core/drawing/compression-view';
import { referenceSpring, valveSpringMetric } from '../fixtures/specs';
import { all, attr, only, parseXml, part, pointList, readAxis, texts } from '../support/svg-reader';
import type { Node } from '../support/svg-reader';

function expectOneTwoFive(step: number): void {
  const mantissa = Number((step / 10 ** Math.floor(Math.log10(step) + 1e-9)).toPrecision(6));
  expect([1, 2, 5]).toContain(mantissa);
}

/** The 1-2-5 step just below `step`. */
function finerStep(step: number): number {
  const mantissa = Math.round(step / 10 ** Math.floor(Math.log10(step) + 1e-9));
  return step * (mantissa === 5 ? 0.4 : 0.5);
}

function expectLinearOneTwoFive(values: number[]): void {
  expect(values.length).toBeGreaterThanOrEqual(3);
  const step = (values[1] as number) - (values[0] as number);
  values.slice(1).forEach((v, i) => expect(v - (values[i] as number)).toBeCloseTo(step, 9));
  expectOneTwoFive(step);
}

// ---- springs ---------------------------------------------------------------------------------------

function analyse(input: SpecInput): CompressionReport {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  if (parsed.value.kind !== 'compression') throw new Error('expected a compression spec');
  return analyseSpec(parsed.value);
}

/** An inch part: d 0.080, De 0.875, L0 2.400, 10 coils closed and ground (Ls = 0.800). */
const valveSpringInch: SpecInput = {
  ...valveSpringMetric,
  units: 'inch',
  wireDiameter: 0.08,
  outerDiameter: 0.875,
  freeLength: 2.4,
  loads: [{ length: 1.8 }, { length: 1.4, force: 15, tolerancePercent: 10 }],
  materialOverrides: undefined,
};

const cyclicValveSpring: SpecInput = { ...valveSpringMetric, duty: { type: 'cyclic', between: [45, 35], cycles: 1e7 } };

const metric = analyse(valveSpringMetric);
const inch = analyse(valveSpringInch);

describe('drawings are well-formed SVG', () => {
  const drawings: [string, string][] = [
    ['compression, metric', compressionDrawing(metric, { title: 'VS-1 <A&B>', directionOfWind: 'left' })],
    ['compression, inch, inside diameter', compressionDrawing(inch, { diameter: 'inner', width: 640, height: 240 })],
    ['compression, no loads', compressionDrawing(analyse(referenceSpring))],
    ['load–length', loadDeflectionDiagram(metric)],
    ['load–deflection, inch', loadDeflectionDiagram(inch, { abscissa: 'deflection' })],
    ['fatigue', goodmanDiagram(analyse(cyclicValveSpring)) ?? ''],
    ['price', priceCurve([{ quantity: 100, unitPrice: 2.4 }, { quantity: 5000, unitPrice: 0.55 }], 'EUR')],
    ['price, empty', priceCurve([], 'EUR')],
  ];
  it.each(drawings)('%s', (_name, svg) => {
    const root = parseXml(svg);
    expect(root.name).toBe('svg');
    expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(svg).not.toMatch(/<style|class=|<marker|clip-?path|foreignObject|textPath/i);
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('the checker itself rejects broken markup', () => {
    expect(() => parseXml('<svg><g></svg>')).toThrow();
    expect(() => parseXml('<svg><text>a < b</text></svg>')).toThrow();
    expect(() => parseXml('<svg><text>R&D</text></svg>')).toThrow();
    expect(() => parseXml('<svg a="1" a="2"/>')).toThrow();
    expect(() => parseXml('<svg/><svg/>')).toThrow();
  });
});

describe('compression spring drawing', () => {
  it('dimensions in mm at 0.01 mm and forces to 3 significant digits (metric)', () => {
    const all = texts(parseXml(compressionDrawing(metric)));
    // A force is specified, so L0 is a reference dimension, in parentheses (EN 15800 / DIN 2095, from memory; ISO 129-1 5.4).
    for (const t of ['(L0 = 60.00 mm)', 'De = 22.00 mm', 'd = 2.00 mm', '(Ls = 20.00 mm)']) expect(all).toContain(t);
    // Rate G·d⁴/(8·D³·n) = 81500·16/(8·8000·8) = 2.546875 N/mm; F1 = 2.546875 · (60 − 45) = 38.2 N.
    for (const t of ['45.00 mm', '35.00 mm', '38.2 N', '70.0 N ±10 %', '2.55 N/mm', 'closed, ground']) expect(all).toContain(t);
  });

  it('dimensions in inches at 0.001 in, forces in lbf (inch)', () => {
    const all = texts(parseXml(compressionDrawing(inch)));
    for (const t of ['(L0 = 2.400 in)', 'De = 0.875 in', 'd = 0.080 in', '(Ls = 0.800 in)', '1.800 in', '15.0 lbf ±10 %']) {
      expect(all).toContain(t);
    }
    expect(all.some((t) => t.endsWith(' lbf/in'))).toBe(true);
    expect(all.join(' ')).not.toMatch(/mm|N\/mm/);
  });

  it('dimensions the inside diameter when asked, and states the wind direction', () => {
    const all = texts(parseXml(compressionDrawing(metric, { diameter: 'inner', directionOfWind: 'left' })));
    expect(all).toContain('Di = 18.00 mm');
    expect(all).not.toContain('De = 22.00 mm');
    expect(all).toContain('left-hand');
  });

  it('escapes the title and the material name', () => {
    const svg = compressionDrawing({ ...metric, material: 'R&D <grade>' }, { title: 'P/N 12 <rev B> & co' });
    expect(svg).toContain('P/N 12 &lt;rev B&gt; &amp; co');
    expect(svg).toContain('R&amp;D &lt;grade&gt;');
    expect(svg).not.toContain('<rev B>');
    expect(texts(parseXml(svg))).toContain('R&D <grade>');
  });

  it.each([
    [10, 'closed-ground'], [6, 'closed'], [7.5, 'open'], [12.25, 'open-ground'],
  ] as const)('one coil stroke per half turn: %d total coils, %s ends', (totalCoils, ends) => {
    const report = analyse({ ...valveSpringMetric, totalCoils, ends, freeLength: 70, loads: [] });
    const coils = only(parseXml(compressionDrawing(report)), 'coils');
    expect(coils.children.filter((n) => n.name === 'polygon')).toHaveLength(Math.ceil(2 * totalCoils));
    // Ground or not, the wire reaches exactly from one end face to the other and across De.
    const corners = coils.children.flatMap(pointList);
    const extent = (i: 0 | 1) => Math.max(...corners.map((p) => p[i])) - Math.min(...corners.map((p) => p[i]));
    expect(extent(0) / extent(1)).toBeCloseTo(70 / 22, 3);
  });

  it.each(['closed-ground', 'closed', 'open-ground', 'open'] as const)('%s ends: active turns at the analysed pitch, closed ends at d', (ends) => {
    const report = analyse({ ...valveSpringMetric, ends, loads: [] });
    const g = springGeometry(report);
    expect(g.ends).toBe(ends);
    const x = axialProfile(g);
    const closed = ends.startsWith('closed') ? 1 : 0;
    expect(x(closed + 1) - x(closed)).toBeCloseTo(report.pitch, 9);
    expect(x(report.totalCoils - closed) - x(report.totalCoils - closed - 1)).toBeCloseTo(report.pitch, 9);
    if (closed) expect(x(1) - x(0)).toBeCloseTo(2, 9);
    expect(x(report.totalCoils) - x(0)).toBeCloseTo(ends.endsWith('ground') ? 60 : 58, 9);
  });

  it('scales the view to the box, keeping the aspect of free length to outside diameter', () => {
    for (const [width, height] of [[480, 300], [640, 240], [300, 400]] as const) {
      const root = parseXml(compressionDrawing(metric, { width, height }));
      expect([attr(root, 'width'), attr(root, 'height')]).toEqual([width, height]);
      const corners = only(root, 'coils').children.flatMap(pointList);
      const xs = corners.map((p) => p[0]);
      const ys = corners.map((p) => p[1]);
      const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
      // Ground ends: the view spans exactly L0 by De.
      expect((x1 - x0) / (y1 - y0)).toBeCloseTo(60 / 22, 2);
      expect(x0).toBeGreaterThan(0);
      expect(y0).toBeGreaterThan(0);
      expect(y1).toBeLessThan(height);
      const numbers = all(root, () => true).flatMap((n) => [n.attrs.x, n.attrs.x1, n.attrs.x2].filter((v) => v !== undefined).map(Number));
      expect(Math.max(...numbers)).toBeLessThanOrEqual(width);
    }
  });
});

describe('axis ticks', () => {
  it('steps follow the 1-2-5 series and are the finest that fit', () => {
    fc.assert(fc.property(fc.double({ min: 1e-4, max: 1e7, noNaN: true }), fc.integer({ min: 2, max: 12 }), (span, maxTicks) => {
      const step = niceStep(span, maxTicks);
      expectOneTwoFive(step);
      expect(span / step).toBeLessThanOrEqual(maxTicks * (1 + 1e-9));
      expect(span / finerStep(step)).toBeGreaterThan(maxTicks * (1 - 1e-9));
    }));
  });

  it('linear ticks cover the data with whole steps', () => {
    expect(linearTicks(0, 101.875, 6).values).toEqual([0, 20, 40, 60, 80, 100, 120]);
    expect(linearTicks(0, 0.875, 6).values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(linearTicks(3, 3).values.length).toBeGreaterThan(1);
  });

  it('log ticks run 1-2-5 per decade, decades only over more than three', () => {
    expect(logTicks(100, 5000)).toEqual([100, 200, 500, 1000, 2000, 5000]);
    expect(logTicks(120, 4500)).toEqual([100, 200, 500, 1000, 2000, 5000]);
    expect(logTicks(1, 1e6)).toEqual([1, 10, 100, 1000, 10000, 100000, 1000000]);
  });

  it.each([
    ['load–length', loadDeflectionDiagram(metric)],
    ['load–deflection, inch', loadDeflectionDiagram(inch, { abscissa: 'deflection' })],
    ['fatigue', goodmanDiagram(analyse(cyclicValveSpring)) ?? ''],
  ])('the %s diagram labels its axes on the 1-2-5 series', (_name, svg) => {
    const root = parseXml(svg);
    expectLinearOneTwoFive(readAxis(root, 'x').values);
    expectLinearOneTwoFive(readAxis(root, 'y').values);
  });
});

describe('load–deflection diagram', () => {
  function characteristic(svg: string): { start: [number, number]; end: [number, number]; labels: string[] } {
    const root = parseXml(svg);
    const x = readAxis(root, 'x');
    const y = readAxis(root, 'y');
    const line = only(root, 'characteristic').children[0] as Node;
    const [first, last] = [pointList(line)[0], pointList(line).at(-1)] as [[number, number], [number, number]];
    const data = (p: [number, number]): [number, number] => [x.toData(p[0]), y.toData(p[1])];
    return { start: data(first), end: data(last), labels: texts(root) };
  }

  it('runs from (L0, 0) to (Ls, Fs) in plot coordinates, metric', () => {
    const c = characteristic(loadDeflectionDiagram(metric));
    expect(c.start[0]).toBeCloseTo(60, 1);
    expect(c.start[1]).toBeCloseTo(0, 1);
    // Fs = R · (L0 − Ls) = 2.546875 · 40 N.
    expect(c.end[0]).toBeCloseTo(20, 1);
    expect(c.end[1]).toBeCloseTo(101.875, 0);
    expect(c.labels).toEqual(expect.arrayContaining(['Length (mm)', 'Force (N)', 'Ls', 'Ln', 'F1', 'F2']));
  });

  it('runs from zero to the stroke to solid against deflection, inch', () => {
    const c = characteristic(loadDeflectionDiagram(inch, { abscissa: 'deflection' }));
    expect(c.start[0]).toBeCloseTo(0, 2);
    expect(c.start[1]).toBeCloseTo(0, 1);
    expect(c.end[0]).toBeCloseTo(2.4 - 0.8, 2);
    expect(c.end[1] / fromInternal(inch.solidForce, 'force', 'inch')).toBeCloseTo(1, 2);
    expect(c.labels).toEqual(expect.arrayContaining(['Deflection (in)', 'Force (lbf)']));
  });

  it('draws the buckling deflection dashed when the spring buckles before solid, and not otherwise', () => {
    const markers = (r: CompressionReport) => part(parseXml(loadDeflectionDiagram(r)), 'marker');
    const buckling = (r: CompressionReport) => markers(r).filter((m) => texts(m).includes('buckling'));
    expect(buckling(metric)).toHaveLength(0);
    const found = buckling({ ...metric, bucklingDeflection: 30 });
    expect(found).toHaveLength(1);
    const drawn = found[0]?.children.find((n) => n.name === 'line');
    expect(drawn?.attrs['stroke-dasharray']).toBeTruthy();
    expect(buckling({ ...metric, bucklingDeflection: 45 })).toHaveLength(0);
  });
});

describe('fatigue diagram', () => {
  it('is null for static duty', () => {
    expect(metric.fatigue).toBeNull();
    expect(goodmanDiagram(metric)).toBeNull();
  });

  it('draws the Goodman line through the Zimmerli point to the torsional ultimate strength', () => {
    const report = analyse(cyclicValveSpring);
    const f = report.fatigue;
    if (!f) throw new Error('cyclic duty should carry a fatigue check');
    const root = parseXml(goodmanDiagram(report) ?? '');
    const x = readAxis(root, 'x');
    const y = readAxis(root, 'y');
    const goodman = pointList(only(root, 'goodman').children[0] as Node).map((p) => [x.toData(p[0]), y.toData(p[1])]);
    const [start, end] = [goodman[0], goodman[goodman.length - 1]] as [number[], number[]];
    expect(end[0]).toBeCloseTo(f.ultimateShear, -1);
    expect(end[1]).toBeCloseTo(0, 0);
    // Straight line: the Zimmerli point (Ssm, Ssa) lies on it.
    const onLine = (start[1] as number) * (1 - f.enduranceMean / (end[0] as number));
    expect(onLine / f.enduranceAlternating).toBeCloseTo(1, 2);
    const operating = only(root, 'operating-point').children.find((n) => n.name === 'circle') as Node;
    expect(x.toData(attr(operating, 'cx'))).toBeCloseTo(f.stressMean, -1);
    expect(y.toData(attr(operating, 'cy'))).toBeCloseTo(f.stressAlternating, -1);
    expect(texts(root)).toEqual(expect.arrayContaining(['Goodman', 'Gerber', 'Mean stress (MPa)', 'Alternating stress (MPa)']));
  });
});

describe('fatigue diagram of very soft wire', () => {
  it('draws the points without failure lines when the Zimmerli mean stress exceeds the ultimate', () => {
    const report = analyse(cyclicValveSpring);
    const f = report.fatigue;
    if (!f) throw new Error('cyclic duty should carry a fatigue check');
    const svg = goodmanDiagram({ ...report, fatigue: { ...f, ultimateShear: 0.9 * f.enduranceMean } }) ?? '';
    const root = parseXml(svg);
    expect(part(root, 'goodman')).toHaveLength(0);
    expect(part(root, 'operating-point')).toHaveLength(1);
    expect(svg).not.toMatch(/NaN|Infinity/);
  });
});

describe('price curve', () => {
  const points = [
    { quantity: 5000, unitPrice: 0.55 }, { quantity: 100, unitPrice: 2.4 }, { quantity: 1000, unitPrice: 0.82 },
  ];

  it('places quantities on a log axis and prices on a linear one', () => {
    const root = parseXml(priceCurve(points, 'EUR'));
    const x = readAxis(root, 'x');
    x.values.forEach((v) => expectOneTwoFive(v));
    const px = (q: number) => x.positions[x.values.indexOf(q)] as number;
    // Equal ratios, equal distances: 100 → 1000 spans as far as 500 → 5000.
    expect(px(1000) - px(100)).toBeCloseTo(px(5000) - px(500), 1);
    const drawn = pointList(only(root, 'price-curve').children[0] as Node);
    expect(drawn.map((p) => p[0])).toEqual([px(100), px(1000), px(5000)].map((v) => expect.closeTo(v, 1)));
    expectLinearOneTwoFive(readAxis(root, 'y').values);
    expect(texts(root)).toEqual(expect.arrayContaining(['Quantity (pcs)', 'Unit price (EUR)', '2.40', '0.820']));
  });

  it('escapes the currency label', () => {
    const svg = priceCurve(points, 'A&B <x>');
    expect(svg).toContain('Unit price (A&amp;B &lt;x&gt;)');
    expect(texts(parseXml(svg))).toContain('Unit price (A&B <x>)');
  });

  it('leaves out quantities a log axis cannot show, and says when nothing is left', () => {
    const root = parseXml(priceCurve([{ quantity: 0, unitPrice: 3 }, ...points], 'EUR'));
    expect(pointList(only(root, 'price-curve').children[0] as Node)).toHaveLength(3);
    expect(texts(parseXml(priceCurve([], 'EUR')))).toContain('no prices');
  });
});

describe('svg helpers', () => {
  it('escapes the five XML specials', () => {
    expect(escapeXml(`a<b>&"c'`)).toBe('a&lt;b&gt;&amp;&quot;c&apos;');
  });

  it('writes coordinates to 0.01 and refuses non-finite ones', () => {
    expect(num(12.3456)).toBe('12.35');
    expect(num(-0.001)).toBe('0');
    expect(() => num(Number.NaN)).toThrow(RangeError);
  });
});
