/**
 * North-American trade ("commercial") extension-spring load tolerance: ± % of load by index, L/F (free
 * length over deflection) and wire size. Inch wire sizes as printed; input d in mm.
 */
import { MM_PER_IN } from '../units';
import type { Interpolation, Weighted } from './grid';
import { axisWeights, combine } from './grid';
import type { Lookup } from './lookup';
import { checkPositive, found, notFound } from './lookup';

const _ = null;

export const extensionLoadTable = {
  source: 'trade extension-spring load-tolerance table as reprinted by engineersedge.com ' +
    '("Extension spring normal load tolerance"); common trade practice',
  verified: false,
  /** The worked example at stock-springs-australia reads the nearest printed cell. */
  defaultInterpolation: 'nearest' as Interpolation,
  indexes: [4, 6, 8, 10],
  lengthOverDeflection: [0.5, 1.5, 2.5, 4.5, 6, 8, 12],
  wireInches: [0.015, 0.022, 0.032, 0.044, 0.062, 0.092, 0.125, 0.187, 0.250, 0.375, 0.437],
  /**
   * ± % of load: per index, one row per L/F (ascending, as in `lengthOverDeflection`), one column per wire.
   * null: cut off in the stored excerpt (and the whole index-6, L/F-4.5 row).
   */
  percent: [
    [
      [6.2, 5.4, 4.8, 4.6, 4.3, 4.1, 4.0, 3.8, 3.6, 3.3, 3.2],
      [10.2, 9.9, 9.3, 8.9, 8.0, 7.5, 7.0, 6.5, 6.1, 5.3, 4.8],
      [13.1, 12.4, 12.1, 11.8, 10.6, 10.0, 9.1, 8.5, 8.0, 6.8, 6.2],
      [15.0, 14.7, 14.1, 13.5, 12.6, 12.0, 11.5, 10.3, 9.7, 8.4, 7.9],
      [16.8, 16.1, 15.5, 14.7, 13.8, 13.2, 12.7, 11.8, 11.2, 9.9, 9.4],
      [18.5, 17.5, 16.7, 15.8, 15.0, 14.5, 14.0, 13.2, 12.5, 11.5, 11.0],
      [20.0, 18.5, 17.6, 16.9, 16.2, 15.5, 15.0, 14.3, 13.8, 13.0, 12.6],
    ],
    [
      [6.3, 5.5, 4.9, 4.7, 4.5, 4.3, _, _, _, _, _],
      [9.9, 9.0, 8.3, 7.7, 7.3, 7.0, _, _, _, _, _],
      [11.9, 10.8, 10.2, 9.8, 9.4, 9.0, _, _, _, _, _],
      [_, _, _, _, _, _, _, _, _, _, _],
      [15.2, 14.0, 12.9, 12.3, 11.6, 10.9, 10.7, 10.0, 9.4, 8.8, 8.3],
      [16.2, 14.7, 13.9, 13.4, 12.6, 12.2, 11.7, 11.0, 10.5, 10.0, 9.5],
      [17.0, 15.5, 14.6, 14.1, 13.5, 13.1, 12.7, 12.0, 11.5, 11.2, 10.7],
    ],
    [
      [6.3, 5.6, 5.0, 4.8, 4.5, 4.4, _, _, _, _, _],
      [9.5, 8.6, 7.8, 7.1, 6.9, 6.7, _, _, _, _, _],
      [11.2, 10.2, 9.5, 8.8, 8.3, 7.9, _, _, _, _, _],
      [12.8, 11.7, 10.7, 10.1, 9.7, 9.0, _, _, _, _, _],
      [14.2, 13.0, 11.7, 11.2, 10.6, 10.0, _, _, _, _, _],
      [15.0, 13.7, 12.5, 12.1, 11.4, 11.0, _, _, _, _, _],
      [15.8, 14.3, 13.1, 13.0, 12.1, 12.0, _, _, _, _, _],
    ],
    [
      [_, _, _, _, _, _, _, _, _, _, _],
      [_, _, _, _, _, _, _, _, _, _, _],
      [10.8, 9.6, 9.0, 8.4, 8.0, 7.7, _, _, _, _, _],
      [12.3, 10.8, 10.0, 9.5, 9.0, 8.5, _, _, _, _, _],
      [13.4, 12.1, 10.8, 10.5, 9.8, 9.3, _, _, _, _, _],
      [14.2, 12.8, 11.6, 11.2, 10.5, 10.2, _, _, _, _, _],
      [14.8, 13.3, 12.0, 11.9, 11.1, 10.9, _, _, _, _, _],
    ],
  ] as readonly (readonly (readonly (number | null)[])[])[],
} as const;

/** ± % of load for index w, L/F = free length over deflection, and wire d (mm). */
export function extensionLoadTolerance(input: {
  index: number; lengthOverDeflection: number; d: number; interpolation?: Interpolation;
}): Lookup<number> {
  const { index, lengthOverDeflection, d, interpolation = extensionLoadTable.defaultInterpolation } = input;
  const bad = checkPositive({ index, lengthOverDeflection, d });
  if (bad) return bad;
  const t = extensionLoadTable;
  const readings: [string, readonly number[], number][] = [
    ['index', t.indexes, index], ['lengthOverDeflection', t.lengthOverDeflection, lengthOverDeflection],
    ['d', t.wireInches, d / MM_PER_IN],
  ];
  const axes: Weighted[][] = [];
  for (const [name, nodes, x] of readings) {
    const w = axisWeights(nodes, x, interpolation);
    if (!w) {
      return notFound('outside-table', name,
        `${name} ${x} is outside the trade load table (${nodes[0]}–${nodes[nodes.length - 1]}): by agreement`);
    }
    axes.push(w);
  }
  let percent = 0;
  for (const c of combine(axes)) {
    const [i, r, w] = c.nodes as [number, number, number];
    const cell = t.percent[i]?.[r]?.[w];
    if (cell === null || cell === undefined) {
      return notFound('not-in-public-table', '', `the stored reprint lacks the cell index ${t.indexes[i]}, ` +
        `L/F ${t.lengthOverDeflection[r]}, d ${t.wireInches[w]} in: take it from the full table or agree the tolerance`);
    }
    percent += c.weight * cell;
  }
  return found(percent, t);
}
