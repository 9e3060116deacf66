import type { z } from 'zod';
import type { Job, JobStatus } from '../../core/api/store';
import { jobPatchSchema } from '../../core/api/store';
import { StoreError, failure, invalid } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { parseWith } from '../../core/validation';
import type { CustomerOnFile } from './customers';
import { customerKey, customerOnFile, fileCustomer, resolveCustomer } from './customers';
import type { CheckedJob } from './input';
import { checkNewJob, checkSpec } from './input';
import type { NumberSequence } from './numbering';
import { numberSequence } from './numbering';
import { jobOfRead, jobRead, jobRow, revisionRow } from './read';
import type { JobRead } from './read';
import type { JobRow } from './rows';
import { storedSpecOf } from './rows';
import type { JobState } from './state';
import { ROW_COLUMNS, ROW_PLACEHOLDERS, rowValues, stateOfRow } from './state';
import { addRevision, closeWorking, dropWorking, markWorkingSave, workingRow } from './working';
import { judgementOf } from './rows';
import { editedElsewhere, staleSave } from './conflict';

export interface NewJobOptions {
  /** Keep this number (import) instead of taking the next from the sequence. */
  number?: string | undefined;
  reason?: string;
  /** Keep these stamps (import); otherwise the store's clock. */
  createdAt?: string | undefined;
  updatedAt?: string | undefined;
  /** Written archived (import); new jobs are listed. */
  archivedAt?: string | null | undefined;
}

/** Writes a checked job and its first revision. Call inside a transaction. */
export function writeNewJob(store: Store, checked: CheckedJob, options: NewJobOptions = {}, path = ''): number {
  const writer = new NewJobWriter(store);
  const { id } = writer.write(checked, options, path);
  writer.finish();
  return id;
}

const INSERT_JOB = `INSERT INTO jobs (number, ${ROW_COLUMNS}, customer_key, revision, created_at, updated_at, archived_at)
                    VALUES (?, ${ROW_PLACEHOLDERS}, ?, 1, ?, ?, ?)`;

/**
 * New jobs written one after another inside one transaction (an import of many): the customers named and
 * the job number sequence are read once and kept, and finish() writes where the sequence stands.
 */
export class NewJobWriter {
  private readonly byName = new Map<string, CustomerOnFile>();
  private readonly byKey = new Map<string, CustomerOnFile>();
  private readonly byId = new Map<number, CustomerOnFile>();
  private numbers: NumberSequence | undefined;

  constructor(private readonly store: Store) {}

  /** A customer named in the import (an enquiry's): found or added once, as the jobs' customers are. */
  customerNamed(ref: { name: string }): CustomerOnFile {
    const known = this.byName.get(ref.name) ?? this.byKey.get(customerKey(ref.name)) ?? fileCustomer(this.store, ref);
    this.byName.set(ref.name, known);
    this.byKey.set(known.key, known);
    return known;
  }

  /** The job's customer: by id, by name (found or added), or none. */
  private customerOf(fields: CheckedJob['fields'], path: string): CustomerOnFile | null {
    if (fields.customerId !== undefined) {
      const known = this.byId.get(fields.customerId) ?? customerOnFile(this.store, fields.customerId, path);
      this.byId.set(known.id, known);
      return known;
    }
    return fields.customer ? this.customerNamed(fields.customer) : null;
  }

  private nextNumber(): string {
    this.numbers ??= numberSequence(this.store, 'jobs');
    return this.numbers.take();
  }

  write(checked: CheckedJob, options: NewJobOptions = {}, path = ''): { id: number; number: string } {
    const { store } = this;
    const { fields } = checked;
    const customer = this.customerOf(fields, path === '' ? 'customerId' : `${path}.customerId`);
    const state: JobState = { ...fields, customerId: customer?.id ?? null, spec: checked.spec, shape: checked.shape, shapeEngine: checked.shapeEngine };
    const number = options.number ?? this.nextNumber();
    if (options.number !== undefined && store.sql('SELECT 1 FROM jobs WHERE number = ?').get(number) !== undefined) {
      throw new StoreError('duplicate-number', `job number ${number} is already in this store`, path === '' ? 'number' : `${path}.number`);
    }
    const now = store.now().toISOString();
    const created = options.createdAt ?? now;
    const specText = JSON.stringify(checked.spec);
    const result = store.sql(INSERT_JOB).run(number, ...rowValues(state, specText), customer?.key ?? '', created, options.updatedAt ?? created, options.archivedAt ?? null);
    const id = Number(result.lastInsertRowid);
    addRevision(store, id, 1, options.reason ?? 'created', state, now, store.author, { customerName: customer?.name ?? null, specText });
    return { id, number };
  }

  /** Writes where the job number sequence stands; call before the transaction commits. */
  finish(): void {
    this.numbers?.keep();
  }
}

/**
 * The job as the save left it: its row is read inside the save's transaction (so another desk's later save
 * cannot answer for this one) and turned into a Job after the commit, keeping the write lock short.
 */
function savedJob(read: JobRead | undefined): StoreResult<Job> {
  if (!read) throw new StoreError('not-found', 'the saved job could not be read back');
  return jobOfRead(read);
}

/** Runs a write; a StoreError thrown inside (after its transaction rolled back) becomes a value. */
export function attempt<T>(fn: () => StoreResult<T>): StoreResult<T> {
  try {
    return fn();
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}

export function createJob(store: Store, raw: unknown, options: NewJobOptions = {}): StoreResult<Job> {
  const checked = checkNewJob(raw);
  if (!checked.ok) return invalid(checked.errors);
  return attempt(() => savedJob(inTransaction(store, () => jobRead(store, writeNewJob(store, checked.value, options)))));
}

const SETTERS = ROW_COLUMNS.split(',').map((c) => `${c.trim()} = ?`).join(', ');

/**
 * Replaces the job's current state with `next` and adds it as a new revision; an open working session ends in
 * it (its edits are part of `next`). Inside a transaction.
 */
function saveState(store: Store, id: number, current: number, next: JobState, reason: string): void {
  const now = store.now().toISOString();
  store.sql(`UPDATE jobs SET ${SETTERS}, revision = ?, updated_at = ? WHERE id = ?`).run(...rowValues(next), current + 1, now, id);
  addRevision(store, id, current + 1, reason, next, now);
  dropWorking(store, id);
}

/** An autosave: the job's current state is replaced in place and the working session notes it; no revision yet. */
function saveWorking(store: Store, id: number, current: number, next: JobState, desk: string): void {
  const now = store.now().toISOString();
  store.sql(`UPDATE jobs SET ${SETTERS}, updated_at = ? WHERE id = ?`).run(...rowValues(next), now, id);
  markWorkingSave(store, id, current, now, desk);
}

/** Closes an open working session as one permanent revision (reason: what closed it). Inside a transaction. */
function closeSession(store: Store, id: number, reason: string): boolean {
  return closeWorking(store, id, reason, () => {
    const row = jobRow(store, id)!;
    return { revision: row.revision, state: stateOfRow(row) };
  });
}

/**
 * Ends the job's working session: what its autosaves left becomes one permanent revision. Nothing is written
 * when no session is open. `reason` says what closed it (a deliberate save, leaving the job, an issue).
 */
export function keepWorkingRevision(store: Store, input: { id: number; reason?: string; desk?: string | undefined }): StoreResult<Job> {
  return attempt(() => savedJob(inTransaction(store, () => {
    if (!jobRow(store, input.id)) throw new StoreError('not-found', `no job with id ${input.id}`, 'id');
    const open = workingRow(store, input.id);
    // A desk leaving the job closes its own working copy only: another desk may still be typing in theirs.
    if (input.desk === undefined || open?.desk === input.desk) closeSession(store, input.id, input.reason ?? 'saved');
    return jobRead(store, input.id);
  })));
}

function loadForSave(store: Store, id: number, expectedRevision: number | undefined, patch: Record<string, unknown> = {}) {
  const row = jobRow(store, id);
  if (!row) throw new StoreError('not-found', `no job with id ${id}`, 'id');
  if (expectedRevision !== undefined && expectedRevision !== row.revision) throw staleSave(store, row, expectedRevision, patch);
  return row;
}

/** States in which the job has gone to the customer or the floor: an edit says what kind it is. */
const COMMITTED: ReadonlySet<JobStatus> = new Set(['quoted', 'ordered', 'in-production']);

/** Whether a save changes what the part is (anything but its status, notes and the estimator's pricing judgement). */
const editsContent = (patch: Record<string, unknown>): boolean =>
  Object.entries(patch).some(([k, v]) => v !== undefined && !['id', 'expectedRevision', 'status', 'notes', 'judgement', 'change', 'working', 'desk'].includes(k));

/**
 * A done job is never edited in place; a quoted, ordered or in-production one only as a new drawing revision
 * (which needs the new revision, and sends a quoted job back to draft for a new quote) or as a correction.
 * Returns the reason the revision records.
 */
function changeReason(row: { number: string; status: JobStatus; drawing_revision: string }, patch: JobPatchValue, reason: string): string {
  if (!editsContent(patch as Record<string, unknown>)) return reason;
  if (row.status === 'done') {
    throw new StoreError('job-done', `job ${row.number} is done and is not edited in place: copy it to a new job for a repeat or a change`, 'status');
  }
  if (!COMMITTED.has(row.status)) return reason;
  if (patch.change === undefined) {
    throw new StoreError('change-kind-needed',
      `job ${row.number} is ${row.status}: say whether this edit is a new drawing revision or a correction`, 'change');
  }
  if (patch.change === 'correction') return 'correction';
  const next = patch.drawingRevision;
  if (next === undefined || next === row.drawing_revision) {
    throw new StoreError('drawing-revision-needed', `a new drawing revision needs its revision letter or number (now "${row.drawing_revision}")`, 'drawingRevision');
  }
  return `drawing revision ${next}`;
}

type JobPatchValue = z.output<typeof jobPatchSchema>;

/** A save that keeps the spec needs it to read; one that brings a new spec is how such a job is put right. */
function refuseUnreadable(row: JobRow): void {
  const stored = storedSpecOf(row);
  if (!stored.ok) {
    throw new StoreError(stored.problem.code, `${stored.problem.message}; save the job with a corrected spec`, stored.problem.path);
  }
}

/**
 * Who may write while a job has an open working copy. The rule: one working copy per job, owned by the desk
 * whose autosave opened it, until it closes (a deliberate save there, leaving the job, an issue, a restore).
 * - The owner's autosaves and saves go on as before.
 * - Another desk's autosave or save (it names its desk) is refused with `edited-elsewhere`, naming who is typing
 *   and listing both versions: two estimators never type over each other, and the second to start is told
 *   who the first is. That desk keeps what it typed; to save it anyway, it keeps their working copy first
 *   (keepWorkingRevision without a desk: their revision, by their name) and saves on top as the next one; the
 *   owner's next autosave is then refused as stale, with both versions, so neither side is lost.
 * - A save naming no desk (the command line, a status change from the job list) changes only the fields it
 *   gives, so it does not type over anyone: the working copy is kept first as its author's revision and the
 *   save goes on top.
 * There is no lock timeout: a working copy left open by a desk that stopped is closed by the next desk that
 * chooses to save on top, and says whose it was. Returns the row to save on (re-read when a copy was kept).
 */
function heldRow(store: Store, row: JobRow, patch: JobPatchValue, rawSpec: unknown): JobRow {
  const open = workingRow(store, row.id);
  const desk = patch.desk ?? '';
  if (!open || open.desk === desk) return row;
  if (patch.desk !== undefined || patch.working === true) throw editedElsewhere(row, open, { ...patch, spec: rawSpec });
  closeSession(store, row.id, 'saved');
  return jobRow(store, row.id)!;
}

/** A save: the fields given replace the current ones; a new revision records the result. */
export function updateJob(store: Store, raw: unknown, reason = 'saved'): StoreResult<Job> {
  const patch = parseWith(jobPatchSchema, raw);
  if (!patch.ok) return invalid(patch.errors);
  const { id, expectedRevision, spec: rawSpec, customer, customerId, change, working, desk, ...fields } = patch.value;
  const checked = rawSpec === undefined ? undefined : checkSpec(rawSpec, ['spec']);
  if (checked && !checked.ok) return invalid(checked.errors);
  if (customer && customerId !== undefined) {
    return failure('customer-twice', 'give the customer by name or by id, not both', 'customerId');
  }
  return attempt(() => {
    return savedJob(inTransaction(store, () => {
      const row = heldRow(store, loadForSave(store, id, expectedRevision, { ...patch.value, spec: rawSpec }), patch.value, rawSpec);
      const why = changeReason(row, patch.value, reason);
      const current = stateOfRow(row);
      if (checked === undefined) refuseUnreadable(row);
      const defined = Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined));
      const next: JobState = { ...current, ...defined, ...(checked?.ok ? checked.value : {}) };
      if (change === 'drawing-revision' && row.status === 'quoted' && fields.status === undefined) next.status = 'draft';
      const resolved = resolveCustomer(store, { customer, customerId });
      if (resolved !== undefined) next.customerId = resolved;
      // A correction or a drawing revision is never folded into a working session: it is its own revision.
      if (working === true && why === reason) saveWorking(store, id, row.revision, next, desk ?? '');
      else saveState(store, id, row.revision, next, why);
      return jobRead(store, id);
    }));
  });
}

export function setJobStatus(store: Store, input: { id: number; status: JobStatus; expectedRevision?: number }): StoreResult<Job> {
  return updateJob(store, input, 'status');
}

/** Restoring never rewrites history: the old revision's content is saved again as a new revision. */
export function restoreRevision(store: Store, input: { id: number; revision: number }): StoreResult<Job> {
  const old = revisionRow(store, input.id, input.revision);
  if (!old) {
    return failure('not-found', `job ${input.id} has no revision ${input.revision}`, jobRow(store, input.id) ? 'revision' : 'id');
  }
  if (old.problem) return failure(old.problem.code, old.problem.message, old.problem.path);
  const checked = checkSpec(old.spec, ['spec']);
  if (!checked.ok) return invalid(checked.errors);
  return attempt(() => {
    return savedJob(inTransaction(store, () => {
      // What the session typed stays in the history before the older state comes back.
      closeSession(store, input.id, 'saved');
      const row = loadForSave(store, input.id, undefined);
      if (row.status === 'done') {
        throw new StoreError('job-done', `job ${row.number} is done and is not edited in place: copy it to a new job for a repeat or a change`, 'status');
      }
      const { customerName: _name, ...fields } = old.fields;
      const exists = fields.customerId !== null && store.sql('SELECT 1 FROM customers WHERE id = ?').get(fields.customerId);
      const next: JobState = { ...fields, judgement: judgementOf(fields.judgement), customerId: exists ? fields.customerId : null, ...checked.value };
      saveState(store, input.id, row.revision, next, `restored revision ${input.revision}`);
      return jobRead(store, input.id);
    }));
  });
}
