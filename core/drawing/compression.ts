/**
 * Compression spring drawing: the side view at free length in the manner of ISO 2162-1, dimensioned,
 * with the spring data and the test loads in a block beside it (ISO 2162-2).
 */
import type { CompressionEnds } from '../spec/compression';
import type { CompressionReport } from '../springs/compression/report';
import type { SpringGeometry, ViewPlacement } from './compression-view';
import { springGeometry, springStrokes, springView, toScreen } from './compression-view';
import type { WindDirection } from './compression-data';
import { diameterLabel, freeLengthReference, lengthText, loadRows, parameterRows } from './compression-data';
import { leader, linearDimension } from './dimension';
import type { Hand } from './coils';
import type { TableRow } from './table';
import { dataBlock } from './common';
import type { Point } from './svg';
import { group, svgDocument } from './svg';

export interface CompressionDrawingOptions {
  width?: number;
  height?: number;
  /** Which diameter the drawing dimensions; outside unless the customer's drawing asks for the inside. */
  diameter?: 'outer' | 'inner';
  directionOfWind?: WindDirection;
  /** End form; read from the report's coil counts and solid length when omitted. */
  ends?: CompressionEnds;
  /** Heading of the data block, e.g. the part number. */
  title?: string;
}

const margin = 8;
/** Room around the view for dimensions: left (diameter), top (wire leader), bottom (two length tiers). */
const reserve = { left: 34, right: 12, top: 34, bottom: 50 };

function placement(g: SpringGeometry, box: { left: number; top: number; width: number; height: number }): ViewPlacement {
  const width = box.width - reserve.left - reserve.right;
  const height = box.height - reserve.top - reserve.bottom;
  const scale = Math.max(1e-6, Math.min(width / g.L0, height / (2 * g.R + g.d)));
  return {
    scale,
    // Centred with its dimensions, which take more room below the view than above it.
    origin: {
      x: box.left + reserve.left + (width - g.L0 * scale) / 2,
      y: box.top + (box.height + reserve.top - reserve.bottom) / 2,
    },
  };
}

interface DimensionInput {
  report: CompressionReport;
  g: SpringGeometry;
  v: ViewPlacement;
  diameter: 'outer' | 'inner';
  hand: Hand;
}

function lengthDimensions({ report, g, v }: DimensionInput): string[] {
  const screen = toScreen(v);
  const bottom = g.R + g.d / 2;
  const left = screen({ x: 0, y: bottom });
  return [
    linearDimension(left, screen({ x: g.L0, y: bottom }), -18, `L0 = ${lengthText(report, report.freeLength)}`,
      { reference: freeLengthReference(report) }),
    linearDimension(left, screen({ x: report.solidLength, y: bottom }), -36,
      `Ls = ${lengthText(report, report.solidLength)}`, { reference: true }),
  ];
}

function diameterDimension({ report, g, v, diameter }: DimensionInput): string {
  const screen = toScreen(v);
  const label = diameterLabel({ report, diameter });
  const half = diameter === 'inner' ? g.R - g.d / 2 : g.R + g.d / 2;
  const x = g.ends.endsWith('ground') ? 0 : g.d / 2;
  return linearDimension(screen({ x, y: half }), screen({ x, y: -half }), 16,
    `${label.symbol} = ${lengthText(report, label.value)}`);
}

/** Leader to the top of the wire at the turn nearest mid-length. */
function wireLeader({ report, g, v, hand }: DimensionInput): string {
  const tops = springStrokes(g, hand).flatMap((s) => [s.from, s.to]).filter((p) => p.y < 0);
  const nearest = (p: Point) => Math.abs(p.x - g.L0 / 2);
  const top = tops.sort((a, b) => nearest(a) - nearest(b))[0] ?? { x: g.L0 / 2, y: -g.R };
  const tip = toScreen(v)({ x: top.x, y: top.y - g.d / 2 });
  return leader(tip, { x: tip.x + 14, y: tip.y - 18 }, `d = ${lengthText(report, g.d)}`);
}

/** `report` in internal units, as `analyseSpec` gives it; texts come out in the spec's own units. */
export function compressionDrawing(report: CompressionReport, options: CompressionDrawingOptions = {}): string {
  const width = options.width ?? 480;
  const height = options.height ?? 300;
  const ends = options.ends ?? report.ends;
  const diameter = options.diameter ?? 'outer';
  const hand: Hand = options.directionOfWind === 'left' ? 'left' : 'right';
  const tableWidth = Math.min(180, Math.max(130, width * 0.32));
  const g = springGeometry(report, ends);
  const v = placement(g, { left: margin, top: margin, width: width - tableWidth - 3 * margin, height: height - 2 * margin });
  const input = { report, g, v, diameter, hand };
  const heading: TableRow[] = [{ cells: [options.title ?? 'Compression spring'], bold: true }];
  const rows = [[...heading, ...parameterRows({ report, ends, diameter, wind: options.directionOfWind })], loadRows(report)];
  return svgDocument(width, height, [
    springView(g, hand, v),
    group([...lengthDimensions(input), diameterDimension(input), wireLeader(input)], 'dimensions'),
    dataBlock(rows, { left: width - margin - tableWidth, top: margin, width: tableWidth, height: height - 2 * margin }),
  ]);
}
