/** One row of a request sheet → a draft job's fields and spec, with every problem named by its cell. */
import type { FieldError } from '../result';
import type { SpringKind } from '../spec';
import { parseSpec } from '../spec';
import { jobInputSchema } from '../api/store-schemas';
import type { JobInput } from '../api/store-schemas';
import { parseWith } from '../validation';
import { typedText } from '../typed-number';
import type { DecimalMark } from '../typed-number';
import type { UnitSystem } from '../units';
import { cellRef, rowRef } from './cells';
import { sheetError } from './row-errors';
import { requestFieldTable } from './fields';
import type { MappedColumn } from './mapping';
import type { CellContext } from './read-cell';
import { cellError, readLoadAtLengthCell, readNumberCell, readQuantityCell } from './read-cell';
import { readCompressionEnds, readExtensionEnds, readGrade, readKind } from './words';

export interface RowOptions {
  row: number;
  columns: readonly MappedColumn[];
  units: UnitSystem;
  decimalMark: DecimalMark;
}

/** What a row's cells said, each value in the sheet's unit system. */
interface RowDraft {
  text: Partial<Record<'partNumber' | 'drawingNumber' | 'drawingRevision' | 'notes' | 'ends', string>>;
  numbers: Partial<Record<'wireDiameter' | 'outerDiameter' | 'innerDiameter' | 'meanDiameter' | 'freeLength' | 'totalCoils' | 'activeCoils' | 'rate' | 'load' | 'loadLength', number>>;
  kind?: SpringKind;
  material?: string;
  quantities?: number[];
}

export interface RowReading {
  job: JobInput | null;
  errors: FieldError[];
  /** What was read differently from how it was written ("read "2 000" as 2000 pcs"), by cell. */
  understood: { path: string; message: string }[];
}

const TEXT_FIELDS = new Set(['partNumber', 'drawingNumber', 'drawingRevision', 'notes', 'ends']);
const COUNT_FIELDS = new Set(['totalCoils', 'activeCoils']);

function readCell(draft: RowDraft, text: string, ctx: CellContext): RowReading['errors'][number] | { understood: string } | null {
  const { field } = ctx;
  if (TEXT_FIELDS.has(field)) {
    if (text.trim() !== '') draft.text[field as keyof RowDraft['text']] = text.trim();
    return null;
  }
  if (field === 'kind') {
    if (text.trim() === '') return { understood: 'blank: read as a compression spring' };
    const kind = readKind(text);
    if (kind === null) return cellError(ctx, 'unknown-kind', `"${text.trim()}" is not a spring kind; write compression, extension or torsion`).error;
    draft.kind = kind;
    return null;
  }
  if (field === 'material') {
    if (text.trim() === '') return null;
    const grade = readGrade(text);
    if (grade === null) return cellError(ctx, 'unknown-material', `"${text.trim()}" is not a wire grade in the materials list (e.g. EN 10270-1 SH, ASTM A228, music wire)`).error;
    draft.material = grade;
    return null;
  }
  if (field === 'quantity') {
    const read = readQuantityCell(text, ctx);
    if (!read.ok) return read.error;
    if (read.value.length > 0) draft.quantities = read.value;
    return read.understood ? { understood: read.understood } : null;
  }
  if (field === 'loadAtLength') {
    const read = readLoadAtLengthCell(text, ctx);
    if (!read.ok) return read.error;
    if (read.value) Object.assign(draft.numbers, { load: read.value.force, loadLength: read.value.length });
    return read.understood ? { understood: read.understood } : null;
  }
  const measure = requestFieldTable[field].measure;
  const read = readNumberCell(text, ctx, COUNT_FIELDS.has(field) || measure === 'count' ? undefined : (measure as never));
  if (!read.ok) return read.error;
  if (read.value !== undefined) draft.numbers[field as keyof RowDraft['numbers']] = read.value;
  return read.understood ? { understood: read.understood } : null;
}

const defined = <T extends object>(o: T): Partial<T> =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;

function loadsOf(n: RowDraft['numbers']): { length: number; force?: number }[] {
  if (n.loadLength === undefined) return [];
  return [defined({ length: n.loadLength, force: n.load }) as { length: number; force?: number }];
}

function specOf(draft: RowDraft, units: UnitSystem): Record<string, unknown> {
  const n = draft.numbers;
  const body = defined({
    units, material: draft.material, wireDiameter: n.wireDiameter, outerDiameter: n.outerDiameter,
    innerDiameter: n.innerDiameter, meanDiameter: n.meanDiameter, freeLength: n.freeLength, quantities: draft.quantities,
    loads: loadsOf(n),
  });
  if (draft.kind === 'extension') {
    const end = draft.text.ends === undefined ? undefined : readExtensionEnds(draft.text.ends) ?? draft.text.ends;
    return { kind: 'extension', ...body, ...defined({ bodyCoils: n.totalCoils ?? n.activeCoils, ends: end === undefined ? undefined : [end, end] }) };
  }
  const ends = draft.text.ends === undefined ? undefined : readCompressionEnds(draft.text.ends) ?? draft.text.ends;
  return { kind: 'compression', ...body, ...defined({ totalCoils: n.totalCoils, activeCoils: n.activeCoils, ends }) };
}

function notesOf(draft: RowDraft, units: UnitSystem, decimalMark: DecimalMark): string {
  const rate = draft.numbers.rate === undefined ? []
    : [`Rate asked on the request sheet: ${typedText(draft.numbers.rate, { decimalMark, units, measure: 'rate', withUnit: true })}`];
  return [draft.text.notes, ...rate].filter((t) => t !== undefined && t !== '').join('\n');
}

/** Ends the row's kind does not have, named in the kind's own words. */
function endsError(draft: RowDraft, options: RowOptions): FieldError | null {
  const text = draft.text.ends;
  if (text === undefined || draft.kind === 'torsion') return null;
  const known = draft.kind === 'extension' ? readExtensionEnds(text) : readCompressionEnds(text);
  if (known !== null) return null;
  const column = options.columns.find((c) => c.field === 'ends')!;
  const ctx: CellContext = { ref: cellRef(column.index, options.row), field: 'ends', units: options.units, decimalMark: options.decimalMark };
  const words = draft.kind === 'extension' ? 'machine loop, full loop, crossover loop, side loop or extended hook' : 'closed and ground, closed, open and ground or open';
  return cellError(ctx, 'unknown-ends', `"${text}" is not an end form of a ${draft.kind ?? 'compression'} spring; write ${words}`).error;
}

/** A load given with no length to ask it at would be lost: it is an error on the load's cell. */
function loadWithoutLength(draft: RowDraft, options: RowOptions): FieldError | null {
  if (draft.numbers.load === undefined || draft.numbers.loadLength !== undefined) return null;
  const column = options.columns.find((c) => c.field === 'load')!;
  const lengthColumn = options.columns.find((c) => c.field === 'loadLength');
  return { code: 'load-without-length', path: cellRef(column.index, options.row),
    message: `Load: a load needs the length it is asked at; ${lengthColumn ? `fill ${cellRef(lengthColumn.index, options.row)}` : 'map the column that holds it (Length at load)'}` };
}

/** Reads a row; `cells` are its texts with any fixes already applied. */
export function readRequestRow(cells: readonly string[], options: RowOptions): RowReading {
  const draft: RowDraft = { text: {}, numbers: {} };
  const errors: FieldError[] = [];
  const understood: RowReading['understood'] = [];
  for (const column of options.columns) {
    if (column.field === 'ignore') continue;
    const ctx: CellContext = { ref: cellRef(column.index, options.row), field: column.field, units: options.units, decimalMark: options.decimalMark, unit: column.unit };
    const out = readCell(draft, cells[column.index] ?? '', ctx);
    if (out === null) continue;
    if ('understood' in out) understood.push({ path: ctx.ref, message: out.understood });
    else errors.push(out);
  }
  const endsProblem = endsError(draft, options);
  if (endsProblem) errors.push(endsProblem);
  const loadProblem = loadWithoutLength(draft, options);
  if (loadProblem) errors.push(loadProblem);
  if (errors.length > 0) return { job: null, errors, understood };
  if (draft.kind === 'torsion') {
    const column = options.columns.find((c) => c.field === 'kind');
    return { job: null, understood, errors: [{ code: 'kind-not-in-sheets', path: column ? cellRef(column.index, options.row) : rowRef(options.row, options.columns.length),
      message: 'Kind: a torsion spring needs its legs and wind direction, which a request-sheet row does not carry; skip the row and enter it as a job' }] };
  }
  const spec = specOf(draft, options.units);
  const parsed = parseSpec(spec);
  if (!parsed.ok) return { job: null, errors: parsed.errors.map((e) => sheetError(e, { ...options, given: spec })), understood };
  const quantities = draft.quantities ?? [];
  const job = {
    partNumber: draft.text.partNumber ?? '', drawingNumber: draft.text.drawingNumber ?? '',
    drawingRevision: draft.text.drawingRevision ?? '', notes: notesOf(draft, options.units, options.decimalMark),
    orderQuantity: quantities.length === 1 ? quantities[0]! : null, spec: parsed.value,
  };
  const checked = parseWith(jobInputSchema, job);
  if (!checked.ok) return { job: null, errors: checked.errors.map((e) => sheetError(e, options)), understood };
  return { job, errors: [], understood };
}
