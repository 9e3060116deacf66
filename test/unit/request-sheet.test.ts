import { describe, expect, it } from 'vitest';
import { cellRef, columnLetter, findHeaderRow, guessColumns, guessDecimalMark, parseCellRef, previewRequestSheet } from '../../core/request-sheet';
import type { RequestSheet } from '../../core/request-sheet';

const sheet = (rows: string[][]): RequestSheet => ({ name: 'demo.csv', rows });

// Demo data: an invented customer's request sheet (Fernbrook Pumps is not a real company).
const HEADERS = ['Part No', 'Kind', 'Material', 'Wire dia (mm)', 'OD', 'L0', 'Total coils', 'Ends', 'Load @ length', 'Qty', 'Rate'];
/** The same headers without units, for sheets whose numbers are in the job's own units. */
const BARE = HEADERS.map((h) => h.replace(' (mm)', ''));
const GOOD = ['FP-100', 'compression', 'EN 10270-1 SH', '1,6', '12', '40', '8,5', 'closed & ground', '20 N @ 30 mm', '2 000', '2,5'];

describe('request-sheet cell references', () => {
  it('names columns as a spreadsheet does', () => {
    expect([0, 25, 26, 51, 52, 701, 702].map(columnLetter)).toEqual(['A', 'Z', 'AA', 'AZ', 'BA', 'ZZ', 'AAA']);
    expect(cellRef(2, 7)).toBe('C7');
    expect(parseCellRef('ab12')).toEqual({ column: 27, row: 12 });
    expect(parseCellRef('7C')).toBeNull();
  });
});

describe('guessing columns from headers', () => {
  it('reads the trade words and abbreviations of both unit systems', () => {
    expect(guessColumns(['Wire dia', 'd', 'OD', 'L0', 'free length', 'rate', 'load @ length', 'coils', 'quantity', 'grade', 'ends', 'drawing', 'kind']))
      .toEqual(['wireDiameter', 'ignore', 'outerDiameter', 'freeLength', 'ignore', 'rate', 'loadAtLength', 'totalCoils', 'quantity', 'material', 'ends', 'drawingNumber', 'kind']);
  });
  it('tells d (wire) from D (mean coil diameter), the EN 13906-1 symbols', () => {
    expect(guessColumns(['d (in)', 'D (in)', 'n', 'Free Length (in)', 'Spring Rate (lbf/in)', 'P/N'])).toEqual(
      ['wireDiameter', 'meanDiameter', 'activeCoils', 'freeLength', 'rate', 'partNumber']);
  });
  it('gives a field to the column that names it best, not the first that mentions it', () => {
    expect(guessColumns(['Item', 'Part No.', 'Wire Ø (mm)', 'O.D.', 'Free len.'])).toEqual(
      ['ignore', 'partNumber', 'wireDiameter', 'outerDiameter', 'freeLength']);
    expect(guessColumns(['Item', 'Wire dia'])).toEqual(['partNumber', 'wireDiameter']);
  });
  it('reads the decimal mark from the cells that can only be read one way', () => {
    expect(guessDecimalMark([['1,6', '12,5', '2 000'], ['2.0', '45,5', '500']])).toBe(',');
    expect(guessDecimalMark([['1.6', '1,600'], ['0.375', 12]])).toBe('.');
    expect(guessDecimalMark([['1,600', '2 000', 3]])).toBeNull();
    const preview = previewRequestSheet(sheet([['d', 'OD', 'L0'], ['1,6', '12,5', '38']]));
    expect(preview.mapping.decimalMark).toBe(',');
    expect(preview.rows[0]?.errors.filter((e) => e.code === 'bad-grouping')).toEqual([]);
  });
  it('finds the header row below a title block', () => {
    expect(findHeaderRow([['Enquiry 4471'], ['', ''], HEADERS, GOOD])).toBe(2);
  });
});

describe('previewing a request sheet', () => {
  it('turns a good row into a draft job in the chosen units, with what it read', () => {
    const preview = previewRequestSheet(sheet([HEADERS, GOOD]), { decimalMark: ',' });
    const [row] = preview.rows;
    expect(row?.status).toBe('ready');
    expect(row?.errors).toEqual([]);
    expect(row?.job?.spec).toMatchObject({
      kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, outerDiameter: 12, freeLength: 40,
      totalCoils: 8.5, ends: 'closed-ground', loads: [{ force: 20, length: 30 }], quantities: [2000],
    });
    expect(row?.job?.orderQuantity).toBe(2000);
    expect(row?.job?.notes).toMatch(/Rate asked on the request sheet: 2,5 N\/mm/);
    expect(row?.understood.map((u) => u.path)).toContain('J2');
  });

  it('converts a value written in the other unit system into the job\'s (1 in = 25.4 mm exactly, NIST SP 811 B.8)', () => {
    const inch = previewRequestSheet(sheet([BARE, [...GOOD.slice(0, 4), '12.7 mm', ...GOOD.slice(5)].map((c) => c.replace('1,6', '0.063').replace('8,5', '8.5').replace('2,5', '14'))]),
      { units: 'inch', decimalMark: '.' });
    const spec = inch.rows[0]?.job?.spec as { outerDiameter: number; wireDiameter: number } | undefined;
    expect(spec?.outerDiameter).toBeCloseTo(0.5, 12);
    expect(spec?.wireDiameter).toBe(0.063);
  });

  it('marks each cell that does not read with its reference and the reason', () => {
    const bad = [...GOOD];
    bad[3] = 'l,6';
    bad[7] = 'squashed';
    const preview = previewRequestSheet(sheet([HEADERS, GOOD, bad]), { decimalMark: ',' });
    const row = preview.rows[1]!;
    expect(row.status).toBe('error');
    expect(row.errors.map((e) => [e.path, e.code])).toEqual([['D3', 'not-a-number'], ['H3', 'unknown-ends']]);
    expect(row.errors[0]?.message).toMatch(/^Wire diameter:/);
    expect(preview.counts).toEqual({ ready: 1, error: 1, skipped: 0, blank: 0 });
  });

  it('puts a spec error on the cell it came from', () => {
    const solid = [...GOOD];
    solid[5] = '10'; // 8.5 coils of 1.6 mm wire are 13.6 mm solid (EN 13906-1 eq. for closed and ground ends, n_t·d): not below 10
    const preview = previewRequestSheet(sheet([HEADERS, solid]), { decimalMark: ',' });
    expect(preview.rows[0]?.errors.map((e) => e.path)).toContain('F2');
  });

  it('reads a fixed cell and leaves a skipped row out', () => {
    const bad = [...GOOD];
    bad[3] = 'abc';
    const fixed = previewRequestSheet(sheet([HEADERS, bad, bad]), { decimalMark: ',', fixes: { D2: '1,6' }, skip: [3] });
    expect(fixed.rows.map((r) => r.status)).toEqual(['ready', 'skipped']);
    expect(fixed.rows[0]?.fixed).toEqual(['D2']);
  });

  it('keeps a saved mapping over the guess, and says where each field came from', () => {
    const saved = { columns: [{ header: 'Rate', field: 'ignore' as const }], units: 'metric' as const, decimalMark: ',' as const };
    const preview = previewRequestSheet(sheet([HEADERS, GOOD]), { saved });
    const rate = preview.mapping.columns.find((c) => c.header === 'Rate');
    expect(rate).toMatchObject({ field: 'ignore', origin: 'saved' });
    expect(preview.mapping.decimalMark).toBe(',');
    expect(preview.rows[0]?.job?.notes).toBe('');
  });

  it('says when a needed column is not mapped', () => {
    const preview = previewRequestSheet(sheet([HEADERS.slice(0, 5), GOOD.slice(0, 5)]), { decimalMark: ',' });
    expect(preview.rows[0]?.errors.map((e) => e.code)).toContain('column-missing');
    expect(preview.rows[0]?.errors[0]?.path).toBe('A2:E2');
  });

  it('refuses a field mapped to two columns at the header cell', () => {
    const given = { columns: [{ header: 'OD', field: 'freeLength' as const }], units: 'metric' as const, decimalMark: ',' as const };
    const preview = previewRequestSheet(sheet([HEADERS, GOOD]), { given });
    expect(preview.mappingErrors).toEqual([expect.objectContaining({ code: 'field-mapped-twice', path: 'F1' })]);
  });
});

describe('reading the words of a request sheet', () => {
  // Grade designations as the standards print them (EN 10270-1:2011 Table 1 grades SL…DH; ASTM A228, A313);
  // the trade names "music wire" and "chrome silicon" are common trade practice for A228 and A401.
  it.each([
    ['EN 10270-1 SH', 'en10270-1-sh'], ['SH', 'en10270-1-sh'], ['dh en 10270-1', 'en10270-1-dh'], ['ASTM A228', 'astm-a228'],
    ['Music Wire', 'astm-a228'], ['A313 302', 'astm-a313-302'], ['1.4310', 'en10270-3-1.4310'], ['Chrome silicon', 'astm-a401'],
  ])('reads the grade "%s" as %s', (text, id) => {
    const row = [...GOOD];
    row[2] = text;
    expect(previewRequestSheet(sheet([HEADERS, row]), { decimalMark: ',' }).rows[0]?.job?.spec).toMatchObject({ material: id });
  });

  it('names the cell of a grade it does not know and of an A313 without its type (two grades share the standard)', () => {
    const rows = [[...GOOD], [...GOOD]];
    rows[0]![2] = 'unobtainium';
    rows[1]![2] = 'ASTM A313';
    const preview = previewRequestSheet(sheet([HEADERS, ...rows]), { decimalMark: ',' });
    expect(preview.rows.map((r) => r.errors[0]?.path)).toEqual(['C2', 'C3']);
    expect(preview.rows[0]?.errors[0]?.code).toBe('unknown-material');
  });

  it('reads an extension spring with its loops, and refuses a torsion spring row with the reason', () => {
    const ext = [...GOOD];
    ext[1] = 'tension';
    ext[7] = 'machine loops';
    ext[8] = '20 N @ 50 mm';
    const tor = [...GOOD];
    tor[1] = 'torsion';
    const preview = previewRequestSheet(sheet([HEADERS, ext, tor]), { decimalMark: ',' });
    expect(preview.rows[0]?.job?.spec).toMatchObject({ kind: 'extension', ends: ['machine-loop', 'machine-loop'], bodyCoils: 8.5 });
    expect(preview.rows[1]?.errors[0]).toMatchObject({ code: 'kind-not-in-sheets', path: 'B3' });
  });

  it('reads inch fractions in an inch sheet (3/8 in = 0.375 in, exact arithmetic)', () => {
    const inch = ['IN-1', 'compression', 'A228', '0.045', '3/8', '1-1/4', '10', 'closed and ground', '', '500', ''];
    const spec = previewRequestSheet(sheet([BARE, inch]), { units: 'inch' }).rows[0]?.job?.spec;
    expect(spec).toMatchObject({ units: 'inch', outerDiameter: 0.375, freeLength: 1.25, wireDiameter: 0.045 });
  });
});

describe('loads on separate columns', () => {
  const headers = ['Part', 'Grade', 'd', 'OD', 'Free length', 'Coils', 'Ends', 'Load (N)', 'L1 (mm)'];
  it('pairs the load with its length, and refuses a load with no length rather than drop it', () => {
    const rows = [['P-1', 'SH', '1.6', '12', '40', '8', 'closed', '20', '30'], ['P-2', 'SH', '1.6', '12', '40', '8', 'closed', '20', '']];
    const preview = previewRequestSheet(sheet([headers, ...rows]));
    expect(preview.rows[0]?.job?.spec).toMatchObject({ loads: [{ force: 20, length: 30 }] });
    expect(preview.rows[1]?.errors).toEqual([expect.objectContaining({ code: 'load-without-length', path: 'H3', message: expect.stringMatching(/fill I3/) })]);
  });
});

describe('numbers a spreadsheet stored as numbers', () => {
  it('read back exactly whatever decimal mark the sheet\'s text uses, and show with that mark', () => {
    const row: (string | number)[] = ['FP-1', 'compression', 'SH', 1.6, 12.25, 40, 8.5, 'closed', '', 1000, ''];
    const preview = previewRequestSheet({ name: 'x.xlsx', rows: [HEADERS, row] }, { decimalMark: ',' });
    expect(preview.rows[0]?.job?.spec).toMatchObject({ wireDiameter: 1.6, outerDiameter: 12.25, totalCoils: 8.5, quantities: [1000] });
    expect(preview.rows[0]?.cells.slice(3, 5)).toEqual(['1,6', '12,25']);
  });
});

describe('units named in the headers', () => {
  it('reads bare numbers in the header\'s unit and proposes the system most headers use (1 in = 25.4 mm exactly, NIST SP 811 B.8, from memory)', () => {
    const headers = ['Part', 'Grade', 'Wire (in)', 'OD (in)', 'Free length (mm)', 'Total coils', 'Ends'];
    const preview = previewRequestSheet(sheet([headers, ['P-1', 'A228', '0.05', '0.5', '25.4', '8', 'closed']]));
    expect(preview.mapping.units).toBe('inch');
    expect(preview.mapping.columns.map((c) => c.unit)).toEqual([null, null, 'in', 'in', 'mm', null, null]);
    const spec = preview.rows[0]?.job?.spec as { wireDiameter: number; outerDiameter: number; freeLength: number };
    expect(spec.wireDiameter).toBe(0.05);
    expect(spec.freeLength).toBeCloseTo(1, 12);
    const metric = previewRequestSheet(sheet([headers, ['P-1', 'A228', '0.05', '0.5', '25.4', '8', 'closed']]), { units: 'metric' });
    expect((metric.rows[0]?.job?.spec as { outerDiameter: number }).outerDiameter).toBeCloseTo(12.7, 12);
  });
});
