/** The data block beside the torsion spring views, with the symbols of ISO 2162-2 / EN 13906-3. */
import { materialRow } from './material-row';
import { formatQuantity } from '../format';
import type { LegForm } from '../spec/torsion';
import type { TorsionReport } from '../springs/torsion/report';
import { angleText, specifiedText, windText } from './common';
import type { LegLayout } from './torsion-legs';
import { plainNumber } from './svg';
import type { TableRow } from './table';
import { loadDirectionTerms, symbols as s } from '../vocabulary';

export function torsionLength(report: TorsionReport, value: number): string {
  return formatQuantity(value, 'length', report.units);
}

function legText(report: TorsionReport, length: number, form: LegForm): string {
  const value = torsionLength(report, length);
  return form === 'tangent' ? value : `${value}, ${form}`;
}

/** The drawing's own free angle with its tolerance; one the body coils give is a reference value. */
export function freeAngleText(layout: LegLayout, tolerance?: number): string {
  return layout.specified ? angleText(layout.freeAngle, tolerance) : `(${angleText(layout.freeAngle)})`;
}

export function torsionParameterRows(report: TorsionReport, layout: LegLayout, freeAngleTolerance?: number): TableRow[] {
  const r = report;
  const length = (v: number) => torsionLength(r, v);
  const rows: [string, string][] = [
    [s.wireDiameter, length(r.wireDiameter)],
    [s.outerDiameter, length(r.outerDiameter)],
    [s.innerDiameter, length(r.innerDiameter)],
    [s.bodyCoils, plainNumber(r.bodyCoils)],
    ['Leg 1', legText(r, r.legLengths[0], layout.legs[0].form)],
    ['Leg 2', legText(r, r.legLengths[1], layout.legs[1].form)],
    ['Free angle', freeAngleText(layout, freeAngleTolerance)],
    ['Wind', windText[r.windDirection]],
    ['Loading', loadDirectionTerms[r.loadDirection].short],
    [s.rate, formatQuantity(r.ratePerDegree, 'torqueRatePerDegree', r.units)],
  ];
  if (r.arborDiameter !== null) rows.push(['Arbor', length(r.arborDiameter)]);
  if (r.maximumAngle > 0) rows.push([`${s.innerDiameter} at ${angleText(r.maximumAngle)}`, length(r.insideDiameterAtLoad)]);
  return [materialRow(r.material), ...rows.map((cells) => ({ cells }))];
}

export function torsionLoadRows(report: TorsionReport): TableRow[] {
  if (report.loads.length === 0) return [];
  return [
    { cells: ['', 'Angle', 'M'], bold: true },
    ...report.loads.map((load, i) => ({
      cells: [String(i + 1), angleText(load.angle), specifiedText({
        actual: load.torque, specified: load.specifiedTorque, tolerancePercent: load.tolerancePercent,
      }, 'torque', report.units)],
    })),
  ];
}
