/**
 * ISO 2859-1 (= ANSI/ASQ Z1.4, successor of MIL-STD-105E): sample-size code letters for general
 * inspection level II, and the single-sampling master table for normal inspection.
 */
export const codeLetters = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'J', 'K', 'L', 'M', 'N', 'P', 'Q'] as const;
export type CodeLetter = (typeof codeLetters)[number];

export interface LotBand {
  /** Lot sizes from … to …, both inclusive, as printed. */
  from: number;
  to: number;
  code: CodeLetter;
}

const lotTo = [8, 15, 25, 50, 90, 150, 280, 500, 1200, 3200, 10000, 35000, 150000, 500000, Infinity];

export const levelIICodeLetters = {
  source: 'ISO 2859-1 / ANSI/ASQ Z1.4 Table I, general inspection level II, as reprinted in the AQL chart at ' +
    'pdfcoffee.com and in the MIL-STD-105E-based table at nibs.org (AC-TABLE.ASC)',
  verified: false,
  bands: codeLetters.map((code, i): LotBand => ({ from: i === 0 ? 2 : (lotTo[i - 1] as number) + 1, to: lotTo[i] as number, code })),
} as const;

export const sampleSizes: Readonly<Record<CodeLetter, number>> = {
  A: 2, B: 3, C: 5, D: 8, E: 13, F: 20, G: 32, H: 50, J: 80, K: 125, L: 200, M: 315, N: 500, P: 800, Q: 1250,
};

/** AQL columns (percent nonconforming) carried here. */
export const aqls = [0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10] as const;

const NIBS = 'ISO 2859-1 Table 2-A = ANSI/ASQ Z1.4 Table II-A, normal single sampling, as reprinted at nibs.org ' +
  '(AC-TABLE.ASC, general level II; it prints Re, Ac = Re − 1)';
const LOW_AQL = 'ISO 2859-1 Table 2-A, AQL 0.065–0.40, from memory: the same diagonal of plans as the ' +
  'nibs.org columns, shifted one code letter per column; not read in any reprint';

export const columnSources: Readonly<Record<number, { source: string; verified: boolean }>> = Object.fromEntries(
  aqls.map((aql) => [aql, { source: aql < 0.65 ? LOW_AQL : NIBS, verified: false }]),
);

/**
 * One string per code letter, one cell per AQL column: "Ac/Re", "v" (use the first plan below the
 * arrow) or "^" (use the first plan above). Columns as in `aqls`.
 */
export const normalSingleTable: Readonly<Record<CodeLetter, string>> = {
  A: 'v    v    v    v    v    v    v    v    v    v    0/1  ^',
  B: 'v    v    v    v    v    v    v    v    v    0/1  ^    v',
  C: 'v    v    v    v    v    v    v    v    0/1  ^    v    1/2',
  D: 'v    v    v    v    v    v    v    0/1  ^    v    1/2  2/3',
  E: 'v    v    v    v    v    v    0/1  ^    v    1/2  2/3  3/4',
  F: 'v    v    v    v    v    0/1  ^    v    1/2  2/3  3/4  5/6',
  G: 'v    v    v    v    0/1  ^    v    1/2  2/3  3/4  5/6  7/8',
  H: 'v    v    v    0/1  ^    v    1/2  2/3  3/4  5/6  7/8  10/11',
  J: 'v    v    0/1  ^    v    1/2  2/3  3/4  5/6  7/8  10/11 14/15',
  K: 'v    0/1  ^    v    1/2  2/3  3/4  5/6  7/8  10/11 14/15 21/22',
  L: '0/1  ^    v    1/2  2/3  3/4  5/6  7/8  10/11 14/15 21/22 ^',
  M: '^    v    1/2  2/3  3/4  5/6  7/8  10/11 14/15 21/22 ^    ^',
  N: 'v    1/2  2/3  3/4  5/6  7/8  10/11 14/15 21/22 ^    ^    ^',
  P: '1/2  2/3  3/4  5/6  7/8  10/11 14/15 21/22 ^    ^    ^    ^',
  Q: '2/3  3/4  5/6  7/8  10/11 14/15 21/22 ^    ^    ^    ^    ^',
};

export type Cell = { accept: number; reject: number } | 'down' | 'up';

export function parseCell(text: string): Cell {
  if (text === 'v') return 'down';
  if (text === '^') return 'up';
  const [accept, reject] = text.split('/').map(Number);
  return { accept: accept as number, reject: reject as number };
}

export function cellAt(code: CodeLetter, column: number): Cell | undefined {
  const text = normalSingleTable[code].trim().split(/\s+/)[column];
  return text === undefined ? undefined : parseCell(text);
}
