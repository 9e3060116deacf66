/** The data block beside a compression spring view, with the symbols of ISO 2162-2 / EN 13906-1. */
import { materialRow } from './material-row';
import type { CompressionEnds } from '../spec/compression';
import type { CompressionLoadResult, CompressionReport } from '../springs/compression/report';
import { formatQuantity } from '../format';
import { plainNumber } from './svg';
import type { TableRow } from './table';
import type { Wind } from '../vocabulary';
import { compressionEndTerms, symbols as s, windTerms } from '../vocabulary';

export type WindDirection = Wind;

export interface DataBlockInput {
  report: CompressionReport;
  ends: CompressionEnds;
  diameter: 'outer' | 'inner';
  wind?: WindDirection;
}

export function lengthText(report: CompressionReport, value: number): string {
  return formatQuantity(value, 'length', report.units);
}

export function wireDiameter(report: CompressionReport): number {
  return report.wireDiameter;
}

export function diameterLabel(input: Pick<DataBlockInput, 'report' | 'diameter'>): { symbol: string; value: number } {
  const r = input.report;
  return input.diameter === 'inner' ? { symbol: s.innerDiameter, value: r.innerDiameter } : { symbol: s.outerDiameter, value: r.outerDiameter };
}

/** With a force specified, L0 is a reference dimension (EN 15800 / DIN 2095): drawn in parentheses. */
export const freeLengthReference = (r: CompressionReport): boolean => r.loads.some((l) => l.specifiedForce !== null);

export function parameterRows(input: DataBlockInput): TableRow[] {
  const r = input.report;
  const diameter = diameterLabel(input);
  const rows: [string, string][] = [
    [s.wireDiameter, lengthText(r, wireDiameter(r))],
    [diameter.symbol, lengthText(r, diameter.value)],
    [s.freeLength, freeLengthReference(r) ? `(${lengthText(r, r.freeLength)})` : lengthText(r, r.freeLength)],
    [s.activeCoils, plainNumber(r.activeCoils)],
    [s.totalCoils, plainNumber(r.totalCoils)],
    [s.solidLength, lengthText(r, r.solidLength)],
    [s.rate, formatQuantity(r.rate, 'rate', r.units)],
    ['Ends', compressionEndTerms[input.ends].short],
  ];
  if (input.wind) rows.push(['Wind', windTerms[input.wind].short]);
  return [materialRow(r.material), ...rows.map((cells) => ({ cells }))];
}

/** The drawing states the force asked for, with its tolerance; without one, the force the design gives. */
function forceText(report: CompressionReport, load: CompressionLoadResult): string {
  if (load.specifiedForce === null) return formatQuantity(load.force, 'force', report.units);
  const force = formatQuantity(load.specifiedForce, 'force', report.units);
  return load.tolerancePercent === null ? force : `${force} ±${plainNumber(load.tolerancePercent, 1)} %`;
}

export function loadRows(report: CompressionReport): TableRow[] {
  if (report.loads.length === 0) return [];
  return [
    { cells: ['', 'L', 'F'], bold: true },
    ...report.loads.map((load, i) => ({ cells: [String(i + 1), lengthText(report, load.length), forceText(report, load)] })),
  ];
}
