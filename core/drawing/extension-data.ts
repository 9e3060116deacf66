/** The data block beside an extension spring view, with the symbols of ISO 2162-2 / EN 13906-2. */
import { formatQuantity } from '../format';
import { extensionEnds } from '../springs/extension/ends';
import type { ExtensionReport } from '../springs/extension/report';
import { angleText, specifiedText, windText } from './common';
import type { WindDirection } from './compression-data';
import { plainNumber } from './svg';
import type { TableRow } from './table';

/** Angle of one loop to the other about the axis (0° in line), as the drawing asks for it. */
export interface LoopPosition {
  angle: number;
  tolerance?: number;
}

export function extensionLength(report: ExtensionReport, value: number): string {
  return formatQuantity(value, 'length', report.units);
}

function endRows(report: ExtensionReport): [string, string][] {
  const [first, second] = report.ends.map((form) => extensionEnds[form].label);
  return first === second ? [['Ends', `${first}, both`]] : [['End 1', first ?? ''], ['End 2', second ?? '']];
}

export function extensionParameterRows(
  report: ExtensionReport, stated: { directionOfWind?: WindDirection; loopPosition?: LoopPosition } = {},
): TableRow[] {
  const r = report;
  const length = (v: number) => extensionLength(r, v);
  const rows: [string, string][] = [
    ['Material', r.material],
    ['d', length(r.wireDiameter)],
    ['De', length(r.outerDiameter)],
    ['Nb', plainNumber(r.bodyCoils)],
    ['L0', length(r.freeLength)],
    ['F0', formatQuantity(r.initialTension, 'force', r.units)],
    ['R', formatQuantity(r.rate, 'rate', r.units)],
    ['Ln', length(r.maximumSafeLength)],
    ['Fn', formatQuantity(r.maximumSafeForce, 'force', r.units)],
    ...endRows(r),
  ];
  if (stated.directionOfWind) rows.push(['Wind', windText[stated.directionOfWind]]);
  const loop = stated.loopPosition;
  if (loop) rows.push(['Loop position', angleText(loop.angle, loop.tolerance)]);
  return rows.map((cells) => ({ cells }));
}

export function extensionLoadRows(report: ExtensionReport): TableRow[] {
  if (report.loads.length === 0) return [];
  return [
    { cells: ['', 'L', 'F'], bold: true },
    ...report.loads.map((load, i) => ({
      cells: [String(i + 1), extensionLength(report, load.length), specifiedText({
        actual: load.force, specified: load.specifiedForce, tolerancePercent: load.tolerancePercent,
      }, 'force', report.units)],
    })),
  ];
}
