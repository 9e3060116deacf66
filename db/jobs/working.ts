import type { Store } from '../store';
import type { JobState } from './state';
import { revisionFields } from './state';

/** A job's open working session: autosaves since the last permanent revision, not yet kept as one. */
export interface WorkingRow {
  job_id: number;
  base_revision: number;
  opened_at: string;
  saved_at: string;
  saves: number;
  /** The editor that owns the session ('' for a session opened before desks were recorded, or by a caller naming none). */
  desk: string;
  /** Who is typing there (the store's author at that desk). */
  made_by: string;
}

export function workingRow(store: Store, jobId: number): WorkingRow | undefined {
  return store.sql('SELECT * FROM job_working_revisions WHERE job_id = ?').get(jobId) as WorkingRow | undefined;
}

/**
 * Records one autosave of the session (opening it for `desk` when none is open). The caller has refused an
 * autosave from another desk than the owner's. Inside a transaction.
 */
export function markWorkingSave(store: Store, jobId: number, baseRevision: number, at: string, desk: string): void {
  store.sql(`INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at, saves, desk, made_by) VALUES (?, ?, ?, ?, 1, ?, ?)
             ON CONFLICT (job_id) DO UPDATE SET saved_at = excluded.saved_at, saves = job_working_revisions.saves + 1`)
    .run(jobId, baseRevision, at, at, desk, store.author);
}

/** What the caller of addRevision may hold already: the customer's name, the spec as stored. */
export interface RevisionKnown {
  customerName?: string | null;
  specText?: string;
}

/** Writes one permanent revision; revisions are immutable (triggers), so this only ever inserts. */
export function addRevision(store: Store, jobId: number, revision: number, reason: string, state: JobState, at: string,
  author = store.author, known: RevisionKnown = {}): void {
  store.sql('INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec, made_by) VALUES (?, ?, ?, ?, ?, ?, ?)')
    .run(jobId, revision, at, reason, JSON.stringify(revisionFields(store, state, known.customerName)),
      known.specText ?? JSON.stringify(state.spec), author);
}

/** Ends the session without a revision of its own: the save under way records its state. */
export function dropWorking(store: Store, jobId: number): void {
  store.sql('DELETE FROM job_working_revisions WHERE job_id = ?').run(jobId);
}

/**
 * Closes the job's open session: the state the autosaves left in the jobs row becomes one permanent revision,
 * made by whoever typed it (another desk's name when this desk keeps their working copy before saving on top;
 * the closer's for a session from before names were recorded). Returns whether there was a session to close.
 * Inside a transaction.
 */
export function closeWorking(store: Store, jobId: number, reason: string, stateOf: () => { revision: number; state: JobState }): boolean {
  const open = workingRow(store, jobId);
  if (!open) return false;
  const { revision, state } = stateOf();
  const now = store.now().toISOString();
  addRevision(store, jobId, revision + 1, reason, state, now, open.made_by || store.author);
  store.sql('UPDATE jobs SET revision = ? WHERE id = ?').run(revision + 1, jobId);
  dropWorking(store, jobId);
  return true;
}
