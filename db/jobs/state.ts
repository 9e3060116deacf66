import type { JobDetails, JobShape, RevisionFields } from '../../core/api/store';
import type { Store } from '../store';
import type { JobRow } from './rows';
import { jobDetailsOfRow, shapeOf, storedSpecOf } from './rows';
import { carriedSpec } from './stored-spec';
import { searchWords } from './search-words';

/** Everything one save of a job holds: what a revision keeps and what the jobs row shows. */
export interface JobState extends JobDetails {
  customerId: number | null;
  /** A checked spec whenever it is new; carried over as stored when a save leaves it alone and it no longer reads. */
  spec: unknown;
  shape: JobShape;
  /** The engine version that computed the shape columns; null for rows indexed before it was recorded. */
  shapeEngine: number | null;
}

export function stateOfRow(row: JobRow): JobState {
  return {
    customerId: row.customer_id,
    ...jobDetailsOfRow(row),
    spec: carriedSpec(storedSpecOf(row)),
    shape: shapeOf(row),
    shapeEngine: row.shape_engine,
  };
}

/** `customerName`: the customer's name when the caller holds it already (undefined: read it). */
export function revisionFields(store: Store, state: JobState, customerName?: string | null): RevisionFields {
  const name = state.customerId === null ? null : customerName !== undefined ? customerName
    : (store.sql('SELECT name FROM customers WHERE id = ?').get(state.customerId) as { name: string } | undefined)?.name ?? null;
  return {
    customerId: state.customerId,
    customerName: name,
    partNumber: state.partNumber,
    drawingNumber: state.drawingNumber,
    drawingRevision: state.drawingRevision,
    status: state.status,
    notes: state.notes,
    dueDate: state.dueDate,
    orderQuantity: state.orderQuantity,
    leadTimeDays: state.leadTimeDays,
    judgement: state.judgement,
  };
}

/**
 * The row values in column order shared by INSERT and UPDATE below. `specText`: the spec as stored, when
 * the caller made it already (a new job writes the same text into its first revision).
 */
export function rowValues(state: JobState, specText = JSON.stringify(state.spec)): unknown[] {
  const s = state.shape;
  return [
    state.customerId, state.partNumber, state.drawingNumber, state.drawingRevision, state.status,
    specText, state.notes, state.dueDate, state.orderQuantity, state.leadTimeDays, JSON.stringify(state.judgement),
    s.kind, s.material, s.materialFamily, s.units, s.wireDiameter, s.meanDiameter, s.freeLength, s.activeCoils, s.rate,
    state.shapeEngine, searchWords(state.spec, s),
  ];
}

export const ROW_COLUMNS = `customer_id, part_number, drawing_number, drawing_revision, status, spec, notes, due_date,
  order_quantity, lead_time_days, judgement, kind, material, material_family, units, d, mean_diameter, free_length, active_coils, rate,
  shape_engine, search_words`;

export const ROW_PLACEHOLDERS = ROW_COLUMNS.split(',').map(() => '?').join(', ');
