import { describe, expect, it } from 'vitest';
import { analyseSpec } from '../../core/calculate';
import type { SpringReport } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { SpecInput } from '../../core/spec';
import type { ExtensionReport } from '../../core/springs/extension/report';
import type { TorsionReport } from '../../core/springs/torsion/report';
import type { CompressionReport } from '../../core/springs/compression/report';
import { fromInternal } from '../../core/units';
import {
  compressionDrawing, extensionDrawing, extensionLoadDiagram, loadDeflectionDiagram, specDrawingOptions, springDiagram,
  springDrawing, torqueAngleDiagram, torsionDrawing,
} from '../../core/drawing';
import { legLayout, loadedLeg } from '../../core/drawing/torsion-legs';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';
import { all, attr, only, parseXml, part, pointList, readAxis, texts } from '../support/svg-reader';
import type { Node } from '../support/svg-reader';

const polygons = (node: Node) => all(node, (n) => n.name === 'polygon');

/** The characteristic's first and last points, and the test-load markers, in the chart's own units. */
function readChart(svg: string) {
  const root = parseXml(svg);
  const x = readAxis(root, 'x');
  const y = readAxis(root, 'y');
  const data = (p: [number, number]): [number, number] => [x.toData(p[0]), y.toData(p[1])];
  const line = pointList(only(root, 'characteristic').children[0] as Node).map(data);
  const loads = all(only(root, 'test-loads'), (n) => n.name === 'circle').map((c) => data([attr(c, 'cx'), attr(c, 'cy')]));
  const limit = part(root, 'marker').map((m) => m.children.find((n) => n.name === 'line') as Node);
  return { root, x, y, line, loads, limit, labels: texts(root) };
}

// ---- springs -------------------------------------------------------------------------------------

function analyse(input: SpecInput): SpringReport {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return analyseSpec(parsed.value);
}
const asExtension = (input: SpecInput) => analyse(input) as ExtensionReport;
const asTorsion = (input: SpecInput) => analyse(input) as TorsionReport;

/** Inch extension part: d 0.080, De 0.750, 24 body coils, full loops (Di 0.590), so L0 = 25·0.08 + 2·0.59 = 3.180. */
const drawbarInch: SpecInput = {
  ...drawbarExtension, units: 'inch', wireDiameter: 0.08, outerDiameter: 0.75, bodyCoils: 24, initialTension: 2,
  loads: [{ length: 3.5, force: 5, tolerancePercent: 10 }, { length: 3.8 }], materialOverrides: undefined,
} as SpecInput;

/** Inch torsion part: d 0.080, De 0.875, 8.5 body coils, so the tangential legs lie parallel when free. */
const lidInch: SpecInput = {
  ...lidTorsion, units: 'inch', wireDiameter: 0.08, outerDiameter: 0.875, bodyCoils: 8.5, arborDiameter: 0.6,
  legs: [{ length: 1.5 }, { length: 1.25 }], loads: [{ angle: 45, torque: 2, tolerancePercent: 10 }, { angle: 120 }],
  materialOverrides: undefined,
} as SpecInput;

const extension = asExtension(drawbarExtension);
const extensionInch = asExtension(drawbarInch);
const torsion = asTorsion(lidTorsion);
const torsionInch = asTorsion(lidInch);
const compression = analyse(valveSpringMetric) as CompressionReport;

const endForms = ['machine-loop', 'full-loop', 'crossover-loop', 'side-loop', 'extended-hook'] as const;
type EndForm = (typeof endForms)[number];
/** An extended hook needs its straight length; 12 mm here. */
const end = (form: EndForm) => (form === 'extended-hook' ? { form, extension: 12 } : form);
const withEnds = (a: EndForm, b: EndForm) => asExtension({ ...drawbarExtension, ends: [end(a), end(b)] } as SpecInput);

describe('extension and torsion drawings are well-formed SVG in the basic subset', () => {
  const drawings: [string, string][] = [
    ['extension, metric', extensionDrawing(extension, { title: 'DB <7> & co', loopPosition: { angle: 90, tolerance: 15 } })],
    ['extension, inch, left-hand', extensionDrawing(extensionInch, { directionOfWind: 'left', width: 640, height: 240 })],
    ...endForms.map((form): [string, string] => [`extension, ${form}`, extensionDrawing(withEnds(form, 'machine-loop'))]),
    ['extension, extended hook with its length', extensionDrawing(asExtension({
      ...drawbarExtension, ends: ['side-loop', { form: 'extended-hook', extension: 15 }],
    } as SpecInput), { loopPosition: { angle: 180 } })],
    ['torsion, metric', torsionDrawing(torsion, { title: 'LID <3>' })],
    ['torsion, free angle given', torsionDrawing(torsion, { freeAngle: 135, freeAngleTolerance: 5 })],
    ['torsion, radial and hooked legs, opening', torsionDrawing(asTorsion({
      ...lidTorsion, loadDirection: 'opening', legs: [{ length: 25, form: 'radial' }, { length: 30, form: 'hooked' }],
    } as SpecInput), { legForms: ['radial', 'hooked'], freeAngle: 30 })],
    ['torsion, inch', torsionDrawing(torsionInch, { width: 520, height: 320 })],
    ['torsion, left-hand, in-line legs', torsionDrawing(asTorsion({ ...lidTorsion, windDirection: 'left', bodyCoils: 6 } as SpecInput))],
    ['extension load diagram', extensionLoadDiagram(extension)],
    ['extension load diagram, inch, against extension', extensionLoadDiagram(extensionInch, { abscissa: 'deflection' })],
    ['torque–angle diagram', torqueAngleDiagram(torsion)],
    ['torque–angle diagram, inch', torqueAngleDiagram(torsionInch)],
  ];
  it.each(drawings)('%s', (_name, svg) => {
    const root = parseXml(svg);
    expect(root.name).toBe('svg');
    expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(svg).not.toMatch(/<style|class=|<marker|clip-?path|foreignObject|textPath|<path|<ellipse/i);
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    // The PDF sets text in a standard font, which has Latin-1 and no Greek.
    for (const t of texts(root)) expect(t, t).toMatch(/^[\u0020-\u007e\u00a0-\u00ff]*$/);
  });
});

describe('extension spring drawing', () => {
  const dimension = (root: Node, prefix: string) => part(root, 'dimension').find((d) => texts(d).some((t) => t.startsWith(prefix)));
  /** Distance between the tips of a dimension's two arrowheads (each polygon's first point is its tip). */
  const arrowSpan = (d: Node | undefined) => {
    const tips = polygons(d as Node).map((p) => pointList(p)[0] as [number, number]);
    expect(tips).toHaveLength(2);
    const [a, b] = tips as [[number, number], [number, number]];
    return Math.hypot(b[0] - a[0], b[1] - a[1]);
  };

  it('dimensions L0, LK, De, d and the loop heights in mm, and fills the data block (metric)', () => {
    const all = texts(parseXml(extensionDrawing(extension)));
    // L0 = (Nb + 1)·d + 2·Di = 21.5·1.5 + 2·10.5 = 53.25; F1 = F0 + R·(70 − 53.25) with R = 1.4283 N/mm.
    // Both loops one inside diameter high: dimensioned once, for both.
    for (const t of ['L0 = 53.25 mm', 'LK = 32.25 mm', 'De = 13.50 mm', 'd = 1.50 mm', '2× LH = 10.50 mm']) expect(all).toContain(t);
    for (const t of ['20.5', '8.00 N', '1.43 N/mm', '70.00 mm', '31.9 N', '80.00 mm', '46.2 N', 'full loop, both']) expect(all).toContain(t);
    expect(all).toContain(`${(extension.maximumSafeLength).toFixed(2)} mm`);
    expect(all.filter((t) => t.includes('LH ='))).toHaveLength(1);
  });

  it('dimensions each loop height when the ends differ in height', () => {
    const hooked = asExtension({ ...drawbarExtension, ends: ['full-loop', { form: 'extended-hook', extension: 15 }] } as SpecInput);
    const heights = texts(parseXml(extensionDrawing(hooked))).filter((t) => t.includes('LH ='));
    // The hook's straight length adds to its inside height.
    expect(heights).toEqual(['LH = 10.50 mm', 'LH = 25.50 mm']);
  });

  it('dimensions in inches at 0.001 in, forces in lbf (inch)', () => {
    const all = texts(parseXml(extensionDrawing(extensionInch)));
    for (const t of ['L0 = 3.180 in', 'LK = 2.000 in', 'De = 0.750 in', 'd = 0.080 in', '2× LH = 0.590 in', '3.500 in', '5.00 lbf ±10 %', '2.00 lbf']) {
      expect(all).toContain(t);
    }
    expect(all.some((t) => t.endsWith(' lbf/in'))).toBe(true);
    expect(all.join(' ')).not.toMatch(/mm|N\/mm/);
  });

  it('draws L0 and LK to the scale of the view, whatever the ends', () => {
    const hooked = asExtension({ ...drawbarExtension, ends: ['full-loop', { form: 'extended-hook', extension: 15 }] } as SpecInput);
    for (const report of [extension, hooked, withEnds('side-loop', 'crossover-loop')]) {
      const root = parseXml(extensionDrawing(report));
      const ratio = arrowSpan(dimension(root, 'L0 =')) / arrowSpan(dimension(root, 'LK ='));
      expect(ratio).toBeCloseTo(report.freeLength / report.bodyLength, 2);
    }
    expect(hooked.freeLength).toBeCloseTo(extension.freeLength + 15, 9);
  });

  it.each([[20.5], [12], [8.25]])('one coil stroke per half turn of the body: %d body coils', (bodyCoils) => {
    const report = asExtension({ ...drawbarExtension, bodyCoils, loads: [] } as SpecInput);
    const coils = only(parseXml(extensionDrawing(report)), 'coils');
    expect(coils.children.filter((n) => n.name === 'polygon')).toHaveLength(Math.ceil(2 * bodyCoils));
    // The close-wound body spans LK by De exactly.
    const corners = coils.children.flatMap(pointList);
    const extent = (i: 0 | 1) => Math.max(...corners.map((p) => p[i])) - Math.min(...corners.map((p) => p[i]));
    expect(extent(0) / extent(1)).toBeCloseTo(report.bodyLength / report.outerDiameter, 3);
  });

  it.each(endForms)('draws both ends, each in its form: %s and a full loop', (form) => {
    const root = parseXml(extensionDrawing(withEnds(form, 'full-loop')));
    const loops = part(root, 'loop');
    expect(loops).toHaveLength(2);
    expect(loops.map((l) => l.attrs['data-form'])).toEqual([form, 'full-loop']);
    for (const loop of loops) expect(polygons(loop).length).toBeGreaterThan(0);
    const all = texts(root);
    if (form === 'full-loop') expect(all).toContain('full loop, both');
    else expect(all).toEqual(expect.arrayContaining(['End 1', 'End 2', 'full loop']));
  });

  it('turns the second loop by the relative loop position and states it', () => {
    const across = (svg: string, i: number) => {
      const ys = polygons(part(parseXml(svg), 'loop')[i] as Node).flatMap(pointList).map((p) => p[1]);
      return Math.max(...ys) - Math.min(...ys);
    };
    const inLine = extensionDrawing(extension);
    const square = extensionDrawing(extension, { loopPosition: { angle: 90, tolerance: 15 } });
    expect(across(inLine, 1) / across(inLine, 0)).toBeCloseTo(1, 2);
    expect(across(square, 1) / across(square, 0)).toBeLessThan(0.3);
    expect(texts(parseXml(square))).toEqual(expect.arrayContaining(['Loop position', '90° ±15°']));
    expect(texts(parseXml(inLine))).not.toContain('Loop position');
  });

  it('escapes the title and the material name', () => {
    const svg = extensionDrawing({ ...extension, material: 'R&D <grade>' }, { title: 'P/N 12 <rev B> & co' });
    expect(svg).toContain('P/N 12 &lt;rev B&gt; &amp; co');
    expect(svg).toContain('R&amp;D &lt;grade&gt;');
    expect(svg).not.toContain('<rev B>');
    expect(texts(parseXml(svg))).toEqual(expect.arrayContaining(['R&D <grade>', 'P/N 12 <rev B> & co']));
  });
});

describe('torsion spring drawing', () => {
  it('dimensions OD, LK, the legs and d in mm, and fills the data block (metric)', () => {
    const root = parseXml(torsionDrawing(torsion, { freeAngle: 135, freeAngleTolerance: 5 }));
    const all = texts(root);
    // LK = (Nb + 1)·d = 6.25·2; M1 = 7.6486 N·mm/° · 60°.
    for (const t of ['De = 22.00 mm', 'LK = 12.50 mm', '25.00 mm', '30.00 mm', 'd = 2.00 mm']) expect(all).toContain(t);
    for (const t of ['18.00 mm', '5.25', 'right-hand', 'closing (winds up)', '7.65 N·mm/°', '60°', '459 N·mm', '688 N·mm']) {
      expect(all).toContain(t);
    }
    expect(all).toEqual(expect.arrayContaining(['Arbor', '15.00 mm', 'Di at 90°', '17.14 mm']));
    expect(texts(only(root, 'free-angle'))).toEqual(['135° ±5°']);
    expect(all).toContain('135° ±5°');
  });

  it('dimensions in inches and torques in lbf·in (inch)', () => {
    const all = texts(parseXml(torsionDrawing(torsionInch)));
    for (const t of ['De = 0.875 in', 'd = 0.080 in', '1.500 in', '1.250 in', 'Arbor', '0.600 in', '2.00 lbf·in ±10 %']) expect(all).toContain(t);
    expect(all.some((t) => t.endsWith(' lbf·in/°'))).toBe(true);
    expect(all.join(' ')).not.toMatch(/mm/);
  });

  it('gives the free angle the body coils make, as a reference, when the drawing states none', () => {
    const free = (bodyCoils: number, windDirection: 'right' | 'left') =>
      texts(parseXml(torsionDrawing(asTorsion({ ...lidTorsion, bodyCoils, windDirection } as SpecInput))));
    // Tangential legs leave the coil Nb turns apart: a quarter turn over leaves them square, a whole number in line.
    expect(free(5.25, 'right')).toContain('(90°)');
    expect(free(5.25, 'left')).toContain('(90°)');
    expect(free(6, 'right')).toContain('(180°)');
    expect(free(8.5, 'left')).toContain('(0°)');
  });

  it('lays the legs out at the free angle, leg 2 reaching leg 1 after turning through it', () => {
    for (const freeAngle of [30, 90, 135, 180, 250]) {
      for (const r of [torsion, { ...torsion, windDirection: 'left' as const }, { ...torsion, loadDirection: 'opening' as const }]) {
        const layout = legLayout(r, { freeAngle });
        const [one, two] = layout.legs;
        const between = (Math.acos(Math.max(-1, Math.min(1, one.direction.x * two.direction.x + one.direction.y * two.direction.y))) * 180) / Math.PI;
        expect(between).toBeCloseTo(Math.min(freeAngle, 360 - freeAngle), 6);
        const turned = loadedLeg(layout, freeAngle);
        expect(turned.direction.x).toBeCloseTo(one.direction.x, 9);
        expect(turned.direction.y).toBeCloseTo(one.direction.y, 9);
        for (const leg of layout.legs) {
          expect(Math.hypot(leg.start.x, leg.start.y)).toBeCloseTo(r.meanDiameter / 2, 9);
          // Tangential: the leg runs square to the radius where it leaves.
          expect(leg.start.x * leg.direction.x + leg.start.y * leg.direction.y).toBeCloseTo(0, 9);
        }
      }
    }
  });

  it('turns leg 2 the way the coils wind up under a closing load', () => {
    // Seen from the leg-2 end a right-hand body turns anticlockwise towards the viewer; y is down on screen.
    expect(legLayout(torsion).loadSense).toBe(-1);
    expect(legLayout({ ...torsion, windDirection: 'left' }).loadSense).toBe(1);
    expect(legLayout({ ...torsion, loadDirection: 'opening' }).loadSense).toBe(1);
  });

  it('draws leg 2 dashed at each working angle, marked with the angle', () => {
    const root = parseXml(torsionDrawing(torsion));
    const positions = only(root, 'working-positions').children.filter((n) => n.name === 'polyline');
    expect(positions).toHaveLength(torsion.loads.length);
    for (const p of positions) expect(p.attrs['stroke-dasharray']).toBeTruthy();
    expect(texts(only(root, 'working-angles'))).toEqual(['60°', '90°']);
  });

  it('radial legs leave the body along the radius', () => {
    const layout = legLayout(torsion, { freeAngle: 60, legForms: ['radial', 'radial'] });
    for (const leg of layout.legs) {
      const cross = leg.start.x * leg.direction.y - leg.start.y * leg.direction.x;
      expect(cross).toBeCloseTo(0, 9);
      expect(leg.start.x * leg.direction.x + leg.start.y * leg.direction.y).toBeGreaterThan(0);
    }
  });

  it.each([[5.25], [6], [9.5]])('one coil stroke per half turn of the body, two legs in each view: %d body coils', (bodyCoils) => {
    const root = parseXml(torsionDrawing(asTorsion({ ...lidTorsion, bodyCoils } as SpecInput)));
    const coils = only(root, 'coils');
    expect(coils.children.filter((n) => n.name === 'polygon')).toHaveLength(Math.ceil(2 * bodyCoils));
    expect(polygons(only(root, 'legs'))).toHaveLength(2);
    expect(part(only(root, 'end-view'), 'leg')).toHaveLength(2);
  });

  it('lines the side view up with the end view: both axes at one height', () => {
    const root = parseXml(torsionDrawing(torsion));
    const axisY = (view: string) => {
      const lines = all(only(root, view), (n) => n.attrs['data-part'] === 'centre-line').flatMap((g) => g.children);
      const horizontal = lines.find((l) => attr(l, 'y1') === attr(l, 'y2')) as Node;
      return attr(horizontal, 'y1');
    };
    expect(axisY('side-view')).toBeCloseTo(axisY('end-view'), 6);
  });

  it.each([[90], [135], [180], [250]])('dimensions a free angle of %d° with an arc that passes outside the body', (freeAngle) => {
    const root = parseXml(torsionDrawing(torsion, { freeAngle }));
    const [outer, inner] = polygons(only(root, 'body-end')).map(pointList) as [[number, number][], [number, number][]];
    const centre = [0, 1].map((i) => outer.reduce((sum, p) => sum + p[i as 0 | 1], 0) / outer.length) as [number, number];
    const radius = Math.max(...outer.map((p) => Math.hypot(p[0] - centre[0], p[1] - centre[1])));
    expect(radius).toBeGreaterThan(Math.max(...inner.map((p) => Math.hypot(p[0] - centre[0], p[1] - centre[1]))));
    const arc = only(root, 'free-angle').children.find((n) => n.name === 'polyline') as Node;
    for (const p of pointList(arc)) expect(Math.hypot(p[0] - centre[0], p[1] - centre[1])).toBeGreaterThan(radius);
    expect(texts(only(root, 'free-angle'))).toEqual([`${freeAngle}°`]);
  });

  it('escapes the title and the material name', () => {
    const svg = torsionDrawing({ ...torsion, material: 'R&D <grade>' }, { title: 'P/N 12 <rev B> & co' });
    expect(svg).toContain('P/N 12 &lt;rev B&gt; &amp; co');
    expect(texts(parseXml(svg))).toEqual(expect.arrayContaining(['R&D <grade>', 'P/N 12 <rev B> & co']));
  });
});

describe('extension load diagram', () => {
  it('starts at (L0, F0) above the step from zero, and runs on at the rate (metric)', () => {
    const c = readChart(extensionLoadDiagram(extension));
    const [start, end] = [c.line[0], c.line[c.line.length - 1]] as [[number, number], [number, number]];
    expect(start[0]).toBeCloseTo(53.25, 1);
    expect(start[1]).toBeCloseTo(8, 1);
    expect((end[1] - start[1]) / (end[0] - start[0])).toBeCloseTo(extension.rate, 2);
    const step = only(c.root, 'initial-tension').children.find((n) => n.name === 'line') as Node;
    expect(c.x.toData(attr(step, 'x1'))).toBeCloseTo(53.25, 1);
    expect(c.y.toData(attr(step, 'y1'))).toBeCloseTo(0, 1);
    expect(c.loads.map((p) => p[0])).toEqual([expect.closeTo(70, 1), expect.closeTo(80, 1)]);
    expect(c.labels).toEqual(expect.arrayContaining(['Length (mm)', 'Force (N)', 'F0', 'F1', 'F2', 'Ln']));
  });

  it('draws the maximum safe length dashed where it lies', () => {
    const c = readChart(extensionLoadDiagram(extension));
    expect(c.limit).toHaveLength(1);
    const line = c.limit[0] as Node;
    expect(line.attrs['stroke-dasharray']).toBeTruthy();
    expect(c.x.toData(attr(line, 'x1'))).toBeCloseTo(extension.maximumSafeLength, 1);
  });

  it('reads in inches and lbf, from zero extension when asked (inch)', () => {
    const c = readChart(extensionLoadDiagram(extensionInch, { abscissa: 'deflection' }));
    const start = c.line[0] as [number, number];
    expect(start[0]).toBeCloseTo(0, 3);
    expect(start[1]).toBeCloseTo(2, 2);
    expect(c.loads[0]?.[0]).toBeCloseTo(3.5 - 3.18, 3);
    expect(c.labels).toEqual(expect.arrayContaining(['Extension (in)', 'Force (lbf)', 'specified force and tolerance']));
  });
});

describe('torque–angle diagram', () => {
  it('runs from (0, 0) at the rate per degree through the working torques (metric)', () => {
    const c = readChart(torqueAngleDiagram(torsion));
    const [start, end] = [c.line[0], c.line[c.line.length - 1]] as [[number, number], [number, number]];
    expect(start[0]).toBeCloseTo(0, 1);
    expect(start[1]).toBeCloseTo(0, 0);
    expect(end[1] / end[0]).toBeCloseTo(torsion.ratePerDegree, 2);
    expect(end[0]).toBeGreaterThanOrEqual(torsion.maximumSafeAngle - 0.5);
    expect(c.loads[0]?.[0]).toBeCloseTo(60, 0);
    expect(c.loads[0]?.[1]).toBeCloseTo(458.9, -1);
    expect(c.labels).toEqual(expect.arrayContaining(['Deflection angle (°)', 'Torque (N·mm)', 'M1', 'M2']));
    const limit = c.limit[0] as Node;
    expect(limit.attrs['stroke-dasharray']).toBeTruthy();
    expect(c.x.toData(attr(limit, 'x1'))).toBeCloseTo(torsion.maximumSafeAngle, 0);
  });

  it('reads torque in lbf·in (inch)', () => {
    const c = readChart(torqueAngleDiagram(torsionInch));
    const [start, end] = [c.line[0], c.line[c.line.length - 1]] as [[number, number], [number, number]];
    expect(start[1]).toBeCloseTo(0, 2);
    expect(end[1] / end[0]).toBeCloseTo(fromInternal(torsionInch.ratePerDegree, 'torque', 'inch'), 4);
    expect(c.labels).toContain('Torque (lbf·in)');
  });
});

describe('dispatch on the kind of spring', () => {
  it.each([
    ['compression', compression, (r: SpringReport) => compressionDrawing(r as CompressionReport), 'Compression spring'],
    ['extension', extension, (r: SpringReport) => extensionDrawing(r as ExtensionReport), 'Extension spring'],
    ['torsion', torsion, (r: SpringReport) => torsionDrawing(r as TorsionReport), 'Torsion spring'],
  ] as const)('springDrawing draws a %s spring as its own drawing does', (_kind, report, own, heading) => {
    const svg = springDrawing(report);
    expect(svg).toBe(own(report));
    expect(texts(parseXml(svg))).toContain(heading);
  });

  const size = { width: 400, height: 250 };
  it.each([
    ['compression', compression, (r: SpringReport) => loadDeflectionDiagram(r as CompressionReport, size), 'Force (N)'],
    ['extension', extension, (r: SpringReport) => extensionLoadDiagram(r as ExtensionReport, size), 'Force (N)'],
    ['torsion', torsion, (r: SpringReport) => torqueAngleDiagram(r as TorsionReport, size), 'Torque (N·mm)'],
  ] as const)('springDiagram plots a %s spring as its own diagram does', (_kind, report, own, axis) => {
    const svg = springDiagram(report, size);
    expect(svg).toBe(own(report));
    const root = parseXml(svg);
    expect([attr(root, 'width'), attr(root, 'height')]).toEqual([400, 250]);
    expect(texts(root)).toContain(axis);
  });

  it('passes what only the spec knows on to the drawing', () => {
    const spec = parseSpec({ ...lidTorsion, freeAngle: 135, freeAngleTolerance: 5 });
    if (!spec.ok) throw new Error('torsion spec should parse');
    expect(texts(parseXml(springDrawing(torsion, specDrawingOptions(spec.value))))).toContain('135° ±5°');
    const loops = parseSpec({ ...drawbarExtension, loopAngle: 90 });
    if (!loops.ok) throw new Error('extension spec should parse');
    expect(texts(parseXml(springDrawing(extension, specDrawingOptions(loops.value))))).toContain('90°');
    const inner = parseSpec({ ...valveSpringMetric, outerDiameter: undefined, innerDiameter: 18 });
    if (!inner.ok) throw new Error('compression spec should parse');
    expect(texts(parseXml(springDrawing(compression, specDrawingOptions(inner.value))))).toContain('Di = 18.00 mm');
  });
});
