import { coilDiameterTable, commercialOdTable, din2097LengthTable, indexBands } from '../../core/tolerances';

/** A published table as rows of text for a read-only view beside the shop's own tables. */
export interface SourcedTableView {
  id: string;
  title: string;
  source: string;
  verified: boolean;
  head: string[];
  rows: string[][];
}

const band = (over: number, upTo: number, unit: string) => `over ${over} up to ${Number.isFinite(upTo) ? upTo : '…'} ${unit}`;
const cell = (v: number | null | undefined) => (v === null || v === undefined ? 'by agreement' : `±${v}`);

const coilDiameter: SourcedTableView = {
  id: 'en15800-coil-diameter', title: 'EN 15800 coil diameter A_D (± mm)', source: coilDiameterTable.source, verified: coilDiameterTable.verified,
  head: ['D', ...[1, 2, 3].flatMap((g) => indexBands.map((b) => `grade ${g}, w ${b.over}–${b.upTo}`))],
  rows: coilDiameterTable.rows.map((r) => [band(r.over, r.upTo, 'mm'),
    ...([1, 2, 3] as const).flatMap((g) => indexBands.map((_b, i) => cell(r.grades[g]?.[i])))]),
};

const din2097: SourcedTableView = {
  id: 'din2097-length', title: 'DIN 2097 extension free length L0 (grade 2)', source: din2097LengthTable.source, verified: din2097LengthTable.verified,
  head: ['L0', ...din2097LengthTable.indexBands.map((b) => `w ${b.over}–${b.upTo} (± mm)`)],
  rows: din2097LengthTable.rows.map((r) => [band(r.over, r.upTo, 'mm'),
    ...(r.plusMinus ? r.plusMinus.map((v) => cell(v)) : [`±${r.percentOfL0} % of L0`, `±${r.percentOfL0} % of L0`])]),
};

const commercialOd: SourcedTableView = {
  id: 'trade-od', title: 'Trade OD tolerance (± in, inch jobs)', source: commercialOdTable.source, verified: commercialOdTable.verified,
  head: ['d (in)', ...commercialOdTable.indexes.map((w) => `index ${w}`)],
  rows: commercialOdTable.wireInches.map((d, i) => [String(d), ...commercialOdTable.plusMinusInches[i]!.map((v) => cell(v))]),
};

/** The published tables the plan reads beside the shop's own; they are data with their sources, not settings. */
export const sourcedTables: readonly SourcedTableView[] = [coilDiameter, din2097, commercialOd];
