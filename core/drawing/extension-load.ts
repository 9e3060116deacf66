/**
 * Force against length (or extension) of an extension spring: nothing until the initial tension is
 * overcome at the free length, then the linear characteristic out past the maximum safe length.
 */
import type { ExtensionReport } from '../springs/extension/report';
import { fromInternal, unitSymbol } from '../units';
import { linearScale } from './axes';
import type { Chart } from './chart';
import { at, axesMarkup, dashed, legend, marker, plotArea, pointLabel, verticalMarker } from './chart';
import type { LoadPoint } from './common';
import { loadPoints, risingLabel, toleranceLegend, upperValue } from './common';
import type { LoadDeflectionOptions } from './load-deflection';
import { group, line, polyline, svgDocument } from './svg';
import { lineWeight, mutedInk, seriesColours } from './style';
import { symbols } from '../vocabulary';

interface Axes {
  chart: Chart;
  /** Abscissa value, in the spec's units, of a spring length given in internal units. */
  xOf: (length: number) => number;
  force: (force: number) => number;
}

const stroke = { stroke: seriesColours.primary, width: lineWeight.thick };

/** The diagram reaches the farther of the longest test length and the maximum safe length. */
function lastLength(report: ExtensionReport): number {
  return Math.max(report.maximumSafeLength, ...report.loads.map((l) => l.length));
}

function forceAt(report: ExtensionReport, length: number): number {
  return report.initialTension + report.rate * (length - report.freeLength);
}

function loadPointsOf(report: ExtensionReport, a: Pick<Axes, 'xOf' | 'force'>): LoadPoint[] {
  return report.loads.map((l, i) => ({
    x: a.xOf(l.length), y: a.force(l.force), label: `F${i + 1}`,
    specified: l.specifiedForce === null ? null : a.force(l.specifiedForce), tolerancePercent: l.tolerancePercent,
  }));
}

function axes(report: ExtensionReport, options: LoadDeflectionOptions): Axes & { points: LoadPoint[] } {
  const width = options.width ?? 480;
  const height = options.height ?? 300;
  const area = plotArea(width, height);
  const length = (v: number) => fromInternal(v, 'length', report.units);
  const xOf = options.abscissa === 'deflection' ? (l: number) => length(l - report.freeLength) : length;
  const force = (v: number) => fromInternal(v, 'force', report.units);
  const points = loadPointsOf(report, { xOf, force });
  const top = Math.max(force(forceAt(report, lastLength(report))), ...points.map(upperValue));
  return {
    chart: {
      width, height, area,
      x: linearScale(xOf(report.freeLength), xOf(lastLength(report)), [area.left, area.right], 8),
      y: linearScale(0, top, [area.bottom, area.top], 6),
    },
    xOf, force, points,
  };
}

/** The step at the free length: the force jumps from nothing to the initial tension. */
function initialTension(a: Axes, report: ExtensionReport): string {
  const foot = at(a.chart, a.xOf(report.freeLength), 0);
  const start = at(a.chart, a.xOf(report.freeLength), a.force(report.initialTension));
  return group([
    line(foot, start, { stroke: seriesColours.primary, width: lineWeight.thin }),
    marker(start, 'square', seriesColours.primary), pointLabel(a.chart, start, 'F0', risingLabel.dx, risingLabel.dy),
  ], 'initial-tension');
}

/** `report` in internal units, as `analyseSpec` gives it; the axes read in the spec's own units. */
export function extensionLoadDiagram(report: ExtensionReport, options: LoadDeflectionOptions = {}): string {
  const a = axes(report, options);
  const c = a.chart;
  const end = lastLength(report);
  const characteristic = [
    at(c, a.xOf(report.freeLength), a.force(report.initialTension)), at(c, a.xOf(end), a.force(forceAt(report, end))),
  ];
  const lengthWord = options.abscissa === 'deflection' ? 'Extension' : 'Length';
  const limit = dashed(mutedInk);
  return svgDocument(c.width, c.height, [
    axesMarkup(c, { x: `${lengthWord} (${unitSymbol('length', report.units)})`, y: `Force (${unitSymbol('force', report.units)})` }),
    verticalMarker(c, a.xOf(report.maximumSafeLength), symbols.maximumSafeLength, limit),
    group([polyline(characteristic, stroke)], 'characteristic'),
    initialTension(a, report),
    loadPoints(c, a.points),
    legend(c, [
      { label: 'characteristic', stroke }, { label: `${symbols.maximumSafeLength} maximum safe length`, stroke: limit }, ...toleranceLegend(a.points, 'force'),
    ], 'left'),
  ]);
}
