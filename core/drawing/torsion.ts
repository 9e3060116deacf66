/**
 * Torsion spring drawing in the manner of ISO 2162-1: the side view and the end view at free position,
 * dimensioned, the free angle between the legs and leg 2 at its working angles in the end view, and the
 * spring data and test torques in a block beside them (ISO 2162-2).
 */
import type { LegForm } from '../spec/torsion';
import type { TorsionReport } from '../springs/torsion/report';
import type { Box } from './common';
import { angleText, dataBlock, sheetLayout } from './common';
import type { ViewPlacement } from './compression-view';
import { toScreen } from './compression-view';
import { arcLine, freeAngleArc, freeAngleDimension, freeAngleLabelBox, workingAngleLabels } from './torsion-angle';
import type { Polyline } from './torsion-clearance';
import { boxOutline } from './torsion-clearance';
import { freeAngleText, torsionLoadRows, torsionParameterRows } from './torsion-data';
import type { TorsionDimensionInput } from './torsion-dimensions';
import { endViewLines, legDimensions, sideDimensions, sideLabelBand } from './torsion-dimensions';
import { wireLeader } from './torsion-leader';
import { legEnd, legLayout } from './torsion-legs';
import type { TorsionGeometry } from './torsion-views';
import { endExtent, endView, loadedLegs, sideExtent, sideView, torsionGeometry } from './torsion-views';
import { group, svgDocument } from './svg';
import type { TableRow } from './table';

export interface TorsionDrawingOptions {
  width?: number;
  height?: number;
  /** Heading of the data block, e.g. the part number. */
  title?: string;
  /** Angle between the legs when free (degrees), as the spec gives it; from the body coils when omitted. */
  freeAngle?: number;
  freeAngleTolerance?: number;
  /** Forms of leg 1 and leg 2, as the spec gives them; tangential when omitted. */
  legForms?: [LegForm, LegForm];
}

/** Room round the views: left (diameter), between them, right (leg dimensions), top and bottom (LK). */
const reserve = { left: 36, gap: 40, right: 26, top: 26, bottom: 42 };

interface Placements {
  side: ViewPlacement;
  end: ViewPlacement;
  endBox: Box;
}

/** One scale for both views, side by side on one level so they line up. */
function placements(g: TorsionGeometry, box: Box): Placements {
  const s = sideExtent(g);
  const e = endExtent(g);
  const top = Math.min(s.top, e.top);
  const bottom = Math.max(s.bottom, e.bottom);
  const across = s.right - s.left + (e.right - e.left);
  const width = box.width - reserve.left - reserve.gap - reserve.right;
  const height = box.height - reserve.top - reserve.bottom;
  const scale = Math.max(1e-6, Math.min(width / across, height / (bottom - top)));
  const left = box.left + reserve.left + (width - across * scale) / 2;
  const y = box.top + reserve.top + (height - (bottom - top) * scale) / 2 - top * scale;
  const endLeft = left + (s.right - s.left) * scale + reserve.gap;
  return {
    side: { scale, origin: { x: left - s.left * scale, y } },
    end: { scale, origin: { x: endLeft - e.left * scale, y } },
    // The gap between the views is left to the side view's dimensions.
    endBox: { left: endLeft, top: box.top, width: box.left + box.width - endLeft, height: box.height },
  };
}

/** The free angle's arc and text, placed clear of `lines`; and what later labels must then keep clear of. */
function freeAngleMarks(g: TorsionGeometry, end: ViewPlacement, label: string, lines: Polyline[]): { markup: string; avoid: Polyline[] } {
  const arc = freeAngleArc(g.layout);
  if (!arc) return { markup: '', avoid: lines };
  const box = freeAngleLabelBox(arc, end, label, lines);
  return {
    markup: freeAngleDimension(arc, g.layout, end, label, box),
    avoid: [...lines, arcLine(arc).map(toScreen(end)), boxOutline(box)],
  };
}

/** Free angle, working positions, leg lengths and the wire leader, each label clear of what is drawn before it. */
function endViewMarks(input: TorsionDimensionInput, freeAngleLabel: string): string {
  const { g, end } = input;
  const loaded = loadedLegs(g).map((leg, i) => ({ end: legEnd(leg), direction: leg.direction, label: angleText(g.angles[i] ?? 0) }));
  const freeAngle = freeAngleMarks(g, end, freeAngleLabel, [...endViewLines(input.report, g, end), ...sideLabelBand(input)]);
  return group([
    freeAngle.markup,
    workingAngleLabels(loaded, end),
    ...legDimensions(input),
    wireLeader(input, freeAngle.avoid),
  ], 'end-dimensions');
}

/** `report` in internal units, as `analyseSpec` gives it; texts come out in the spec's own units. */
export function torsionDrawing(report: TorsionReport, options: TorsionDrawingOptions = {}): string {
  const width = options.width ?? 480;
  const height = options.height ?? 300;
  const sheet = sheetLayout(width, height);
  const layout = legLayout(report, options);
  const g = torsionGeometry(report, layout);
  const p = placements(g, sheet.views);
  const input: TorsionDimensionInput = { report, g, ...p };
  const heading: TableRow[] = [{ cells: [options.title ?? 'Torsion spring'], bold: true }];
  const tables = [[...heading, ...torsionParameterRows(report, layout, options.freeAngleTolerance)], torsionLoadRows(report)];
  return svgDocument(width, height, [
    sideView(g, p.side),
    endView(g, p.end),
    group(sideDimensions(input), 'dimensions'),
    endViewMarks(input, freeAngleText(layout, options.freeAngleTolerance)),
    dataBlock(tables, sheet.table),
  ]);
}
