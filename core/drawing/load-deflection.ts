/** Force against length (or deflection) of a compression spring, from free length to solid. */
import type { CompressionLoadResult, CompressionReport } from '../springs/compression/report';
import { fromInternal, unitSymbol } from '../units';
import { linearScale } from './axes';
import type { Chart, ChartSize, LegendEntry } from './chart';
import { at, axesMarkup, dashed, legend, marker, plotArea, pointLabel, verticalMarker } from './chart';
import type { Point } from './svg';
import { group, line, polyline, svgDocument } from './svg';
import { ink, lineWeight, mutedInk, seriesColours } from './style';
import { symbols } from '../vocabulary';

export interface LoadDeflectionOptions extends ChartSize {
  abscissa?: 'length' | 'deflection';
}

interface Axes {
  chart: Chart;
  /** Abscissa value, in the spec's units, of a spring length given in internal units. */
  xOf: (length: number) => number;
  force: (force: number) => number;
}

function upperForce(load: CompressionLoadResult): number {
  return (load.specifiedForce ?? 0) * (1 + (load.tolerancePercent ?? 0) / 100);
}

function axes(report: CompressionReport, options: LoadDeflectionOptions): Axes {
  const width = options.width ?? 480;
  const height = options.height ?? 300;
  const area = plotArea(width, height);
  const length = (v: number) => fromInternal(v, 'length', report.units);
  const xOf = options.abscissa === 'deflection' ? (l: number) => length(report.freeLength - l) : length;
  const force = (v: number) => fromInternal(v, 'force', report.units);
  // Test lengths below solid and specified forces above it stay on the diagram.
  const lengths = [report.freeLength, report.solidLength, ...report.loads.map((l) => l.length)];
  const forces = [report.solidForce, ...report.loads.flatMap((l) => [l.force, upperForce(l)])];
  return {
    chart: {
      width, height, area,
      x: linearScale(0, Math.max(...lengths.map(xOf)), [area.left, area.right], 8),
      y: linearScale(0, force(Math.max(...forces)), [area.bottom, area.top], 6),
    },
    xOf, force,
  };
}

const stroke = { stroke: seriesColours.primary, width: lineWeight.thick };

/** The specified force with its tolerance, as a bar with end ticks at the test length. */
function toleranceBar(a: Axes, load: CompressionLoadResult): string[] {
  if (load.specifiedForce === null || load.tolerancePercent === null) return [];
  const band = load.specifiedForce * (load.tolerancePercent / 100);
  const low = at(a.chart, a.xOf(load.length), a.force(load.specifiedForce - band));
  const high = at(a.chart, a.xOf(load.length), a.force(load.specifiedForce + band));
  const thin = { stroke: ink, width: lineWeight.thin };
  const tick = (p: Point) => line({ x: p.x - 3, y: p.y }, { x: p.x + 3, y: p.y }, thin);
  return [line(low, high, thin), tick(low), tick(high)];
}

function testLoads(a: Axes, report: CompressionReport): string {
  return group(report.loads.flatMap((load, i) => {
    const p = at(a.chart, a.xOf(load.length), a.force(load.force));
    return [...toleranceBar(a, load), marker(p, 'circle', seriesColours.secondary), pointLabel(a.chart, p, `F${i + 1}`)];
  }), 'test-loads');
}

function limits(a: Axes, report: CompressionReport): { markup: string[]; legend: LegendEntry[] } {
  const markup = [
    verticalMarker(a.chart, a.xOf(report.solidLength), 'Ls', { stroke: mutedInk, width: lineWeight.thin }),
    verticalMarker(a.chart, a.xOf(report.minimumWorkingLength), symbols.minimumWorkingLength, dashed(mutedInk)),
  ];
  const entries: LegendEntry[] = [{ label: `${symbols.minimumWorkingLength} minimum working length`, stroke: dashed(mutedInk) }];
  if (report.loads.some((l) => l.specifiedForce !== null && l.tolerancePercent !== null)) {
    entries.push({ label: 'specified force and tolerance', stroke: { stroke: ink, width: lineWeight.thin } });
  }
  const buckles = report.bucklingDeflection;
  // Buckling beyond the stroke to solid cannot happen in service and falls outside the diagram.
  if (buckles !== null && report.freeLength - buckles > report.solidLength) {
    const stroke = dashed(seriesColours.secondary);
    markup.push(verticalMarker(a.chart, a.xOf(report.freeLength - buckles), 'buckling', stroke));
    entries.push({ label: 'buckling deflection', stroke });
  }
  return { markup, legend: entries };
}

/** `report` in internal units, as `analyseSpec` gives it; the axes read in the spec's own units. */
export function loadDeflectionDiagram(report: CompressionReport, options: LoadDeflectionOptions = {}): string {
  const a = axes(report, options);
  const c = a.chart;
  const free = at(c, a.xOf(report.freeLength), 0);
  const solid = at(c, a.xOf(report.solidLength), a.force(report.solidForce));
  const lengthWord = options.abscissa === 'deflection' ? 'Deflection' : 'Length';
  const marks = limits(a, report);
  return svgDocument(c.width, c.height, [
    axesMarkup(c, {
      x: `${lengthWord} (${unitSymbol('length', report.units)})`, y: `Force (${unitSymbol('force', report.units)})`,
    }),
    ...marks.markup,
    group([polyline([free, solid], stroke)], 'characteristic'),
    group([marker(solid, 'square', seriesColours.primary), pointLabel(c, solid, 'Fs')], 'solid'),
    testLoads(a, report),
    // The characteristic falls to the right against length and rises to the right against deflection.
    legend(c, [{ label: 'characteristic', stroke }, ...marks.legend], lengthWord === 'Deflection' ? 'left' : 'right'),
  ]);
}
