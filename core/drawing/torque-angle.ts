/** Torque against angular deflection of a torsion spring: the linear characteristic from the free position. */
import type { TorsionReport } from '../springs/torsion/report';
import { fromInternal, unitSymbol } from '../units';
import { linearScale } from './axes';
import type { Chart, ChartSize } from './chart';
import { at, axesMarkup, dashed, legend, plotArea, verticalMarker } from './chart';
import type { LoadPoint } from './common';
import { loadPoints, toleranceLegend, upperValue } from './common';
import { group, polyline, svgDocument } from './svg';
import { lineWeight, mutedInk, seriesColours } from './style';

const stroke = { stroke: seriesColours.primary, width: lineWeight.thick };

function torquePoints(report: TorsionReport): LoadPoint[] {
  const torque = (v: number) => fromInternal(v, 'torque', report.units);
  return report.loads.map((l, i) => ({
    x: l.angle, y: torque(l.torque), label: `M${i + 1}`,
    specified: l.specifiedTorque === null ? null : torque(l.specifiedTorque), tolerancePercent: l.tolerancePercent,
  }));
}

/** The diagram reaches the farther of the largest working angle and the maximum safe angle. */
function lastAngle(report: TorsionReport): number {
  return Math.max(report.maximumSafeAngle, report.maximumAngle, ...report.loads.map((l) => l.angle));
}

function chart(report: TorsionReport, points: LoadPoint[], size: ChartSize): Chart {
  const width = size.width ?? 480;
  const height = size.height ?? 300;
  const area = plotArea(width, height);
  const end = lastAngle(report);
  const top = fromInternal(report.ratePerDegree * end, 'torque', report.units);
  return {
    width, height, area,
    x: linearScale(0, end, [area.left, area.right], 8),
    y: linearScale(0, Math.max(top, ...points.map(upperValue)), [area.bottom, area.top], 6),
  };
}

/** `report` in internal units (N·mm, degrees), as `analyseSpec` gives it; the torque axis reads in the spec's units. */
export function torqueAngleDiagram(report: TorsionReport, size: ChartSize = {}): string {
  const points = torquePoints(report);
  const c = chart(report, points, size);
  const end = lastAngle(report);
  const line = [at(c, 0, 0), at(c, end, fromInternal(report.ratePerDegree * end, 'torque', report.units))];
  const limit = dashed(mutedInk);
  return svgDocument(c.width, c.height, [
    axesMarkup(c, { x: 'Deflection angle (°)', y: `Torque (${unitSymbol('torque', report.units)})` }),
    verticalMarker(c, report.maximumSafeAngle, 'max. safe', limit),
    group([polyline(line, stroke)], 'characteristic'),
    loadPoints(c, points),
    legend(c, [
      { label: 'characteristic', stroke }, { label: 'maximum safe angle', stroke: limit }, ...toleranceLegend(points, 'torque'),
    ], 'left'),
  ]);
}
