/**
 * Extension spring drawing: the side view at free length in the manner of ISO 2162-1 with both ends in
 * their form, dimensioned, and the spring data and test loads in a block beside it (ISO 2162-2).
 */
import type { ExtensionReport } from '../springs/extension/report';
import type { Hand } from './coils';
import type { Box } from './common';
import { dataBlock, fitView, sheetLayout } from './common';
import type { WindDirection } from './compression-data';
import type { ViewPlacement } from './compression-view';
import type { ExtensionDimensionInput } from './extension-dimensions';
import { diameterDimension, lengthDimensions, loopDimensions, wireLeader } from './extension-dimensions';
import type { LoopPosition } from './extension-data';
import { extensionLoadRows, extensionParameterRows } from './extension-data';
import type { ExtensionGeometry } from './extension-view';
import { extensionExtent, extensionGeometry, extensionView } from './extension-view';
import { group, svgDocument } from './svg';
import type { TableRow } from './table';

export interface ExtensionDrawingOptions {
  width?: number;
  height?: number;
  /** Heading of the data block, e.g. the part number. */
  title?: string;
  /** Hand the body is drawn in (right unless left is asked for); stated in the data block when given. */
  directionOfWind?: WindDirection;
  /** Relative position of the two loops, when the drawing specifies it. */
  loopPosition?: LoopPosition;
}

/** Room round the view for dimensions: left (diameter), top (loop heights), bottom (wire leader, LK, L0). */
const reserve = { left: 36, right: 12, top: 30, bottom: 72 };

function placement(g: ExtensionGeometry, box: Box): ViewPlacement {
  return fitView(extensionExtent(g), {
    left: box.left + reserve.left, top: box.top + reserve.top,
    width: box.width - reserve.left - reserve.right, height: box.height - reserve.top - reserve.bottom,
  });
}

/** `report` in internal units, as `analyseSpec` gives it; texts come out in the spec's own units. */
export function extensionDrawing(report: ExtensionReport, options: ExtensionDrawingOptions = {}): string {
  const width = options.width ?? 480;
  const height = options.height ?? 300;
  const hand: Hand = options.directionOfWind === 'left' ? 'left' : 'right';
  const sheet = sheetLayout(width, height);
  const g = extensionGeometry(report, hand, options.loopPosition?.angle);
  const v = placement(g, sheet.views);
  const input: ExtensionDimensionInput = { report, g, v };
  const heading: TableRow[] = [{ cells: [options.title ?? 'Extension spring'], bold: true }];
  const tables = [[...heading, ...extensionParameterRows(report, options)], extensionLoadRows(report)];
  return svgDocument(width, height, [
    extensionView(g, v),
    group([...lengthDimensions(input), ...loopDimensions(input), diameterDimension(input), wireLeader(input)], 'dimensions'),
    dataBlock(tables, sheet.table),
  ]);
}
