/**
 * Fatigue diagram of a spring in cyclic duty: alternating against mean torsional stress, with the
 * Goodman line and the Gerber parabola through the Zimmerli endurance point to the torsional ultimate
 * strength (Shigley 9e §10-9), the load line from the origin and the operating point.
 */
import type { CompressionReport } from '../springs/compression/report';
import type { FatigueResult } from '../springs/fatigue';
import { zimmerliReaches } from '../springs/fatigue';
import { significant } from '../format';
import { fromInternal, unitSymbol } from '../units';
import { linearScale } from './axes';
import type { Chart, ChartSize } from './chart';
import { at, axesMarkup, dashed, legend, marker, plotArea, pointLabel } from './chart';
import type { Point } from './svg';
import { group, polyline, svgDocument, text } from './svg';
import { dash, fontSize, lineWeight, mutedInk, seriesColours } from './style';

/** Intercepts on the alternating-stress axis of the two failure lines through the Zimmerli point. */
export function enduranceIntercepts(f: Pick<FatigueResult, 'enduranceAlternating' | 'enduranceMean' | 'ultimateShear'>) {
  const ratio = f.enduranceMean / f.ultimateShear;
  return { goodman: f.enduranceAlternating / (1 - ratio), gerber: f.enduranceAlternating / (1 - ratio * ratio) };
}

/** The lines exist only while the Zimmerli mean stress is below the ultimate (not so for very soft wire). */
function drawable(f: FatigueResult): boolean {
  return zimmerliReaches(f.enduranceMean, f.ultimateShear);
}

const noLinesText = 'Zimmerli point beyond the ultimate strength';
const goodmanStroke = { stroke: seriesColours.primary, width: lineWeight.thick };
const gerberStroke = { stroke: seriesColours.tertiary, width: lineWeight.thick, dash: dash.dashed };

function chart(report: CompressionReport, f: FatigueResult, size: ChartSize): { c: Chart; s: (v: number) => number } {
  const width = size.width ?? 480;
  const height = size.height ?? 300;
  const area = plotArea(width, height);
  const s = (v: number) => fromInternal(v, 'stress', report.units);
  const { goodman, gerber } = enduranceIntercepts(f);
  const top = Math.max(f.enduranceAlternating, f.stressAlternating, ...(drawable(f) ? [goodman, gerber] : []));
  return {
    c: {
      width, height, area,
      x: linearScale(0, s(Math.max(f.ultimateShear, f.enduranceMean, f.stressMean)), [area.left, area.right], 8),
      y: linearScale(0, s(top), [area.bottom, area.top], 6),
    },
    s,
  };
}

function failureLines(c: Chart, s: (v: number) => number, f: FatigueResult): string[] {
  const { goodman, gerber } = enduranceIntercepts(f);
  const su = f.ultimateShear;
  const parabola: Point[] = Array.from({ length: 41 }, (_, i) => {
    const m = (su * i) / 40;
    return at(c, s(m), s(gerber * (1 - (m / su) ** 2)));
  });
  return [
    group([polyline([at(c, 0, s(goodman)), at(c, s(su), 0)], goodmanStroke)], 'goodman'),
    group([polyline(parabola, gerberStroke)], 'gerber'),
  ];
}

/** Load line from the origin through the operating point to the Goodman line. */
function loadLine(c: Chart, s: (v: number) => number, f: FatigueResult): string {
  const { goodman } = enduranceIntercepts(f);
  const slope = f.stressAlternating / f.stressMean;
  // Past the operating point too when that lies beyond the line (safety factor below 1).
  const mean = Math.max(f.stressMean, goodman / (slope + goodman / f.ultimateShear));
  return group([polyline([at(c, 0, 0), at(c, s(mean), s(mean * slope))], dashed(mutedInk))], 'load-line');
}

function safetyText(f: FatigueResult): string {
  const factor = (n: number | null) => (n === null ? 'no limit' : significant(n));
  return `nf = ${factor(f.goodmanSafetyFactor)} (Goodman), ${factor(f.gerberSafetyFactor)} (Gerber)`;
}

/** Null for static duty: the report then carries no fatigue check to draw. `report` in internal units. */
export function goodmanDiagram(report: CompressionReport, size: ChartSize = {}): string | null {
  const f = report.fatigue;
  if (!f) return null;
  const { c, s } = chart(report, f, size);
  const unit = unitSymbol('stress', report.units);
  const zimmerli = at(c, s(f.enduranceMean), s(f.enduranceAlternating));
  const operating = at(c, s(f.stressMean), s(f.stressAlternating));
  const zimmerliLabel = f.peened ? 'Zimmerli (peened)' : 'Zimmerli';
  const lines = drawable(f);
  return svgDocument(c.width, c.height, [
    axesMarkup(c, { x: `Mean stress (${unit})`, y: `Alternating stress (${unit})` }),
    ...(lines ? failureLines(c, s, f) : []),
    lines && f.stressMean > 0 ? loadLine(c, s, f) : '',
    group([marker(zimmerli, 'diamond', seriesColours.primary), pointLabel(c, zimmerli, zimmerliLabel)], 'zimmerli'),
    group([
      marker(operating, 'circle', seriesColours.secondary), pointLabel(c, operating, 'operating point', 6, 12),
    ], 'operating-point'),
    lines ? legend(c, [
      { label: 'Goodman', stroke: goodmanStroke },
      { label: 'Gerber', stroke: gerberStroke },
      { label: 'load line', stroke: dashed(mutedInk) },
    ]) : '',
    group([text({ x: c.area.right - 6, y: c.area.top + 66 }, lines ? safetyText(f) : noLinesText, {
      size: fontSize.small, anchor: 'end',
    })], 'safety'),
  ]);
}
