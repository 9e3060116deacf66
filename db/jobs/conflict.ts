import type { FieldError } from '../../core/result';
import { StoreError } from '../errors';
import type { Store } from '../store';
import type { JobRow } from './rows';
import type { WorkingRow } from './working';
import { stateOfRow } from './state';

const shown = (v: unknown): string => (v === undefined ? '(not given)' : JSON.stringify(v));

/** Each field the save gives that differs from the saved revision: both values, side by side. */
function differences(row: JobRow, patch: Record<string, unknown>): FieldError[] {
  const saved = stateOfRow(row) as unknown as Record<string, unknown>;
  const out: FieldError[] = [];
  for (const [key, mine] of Object.entries(patch)) {
    if (mine === undefined || ['id', 'expectedRevision', 'change', 'customer', 'customerId', 'working', 'desk'].includes(key)) continue;
    if (key === 'spec' && mine && typeof mine === 'object' && saved.spec && typeof saved.spec === 'object') {
      const theirs = saved.spec as Record<string, unknown>;
      for (const [field, value] of Object.entries(mine as Record<string, unknown>)) {
        if (JSON.stringify(value) !== JSON.stringify(theirs[field])) out.push(detail(`spec.${field}`, theirs[field], value));
      }
    } else if (JSON.stringify(mine) !== JSON.stringify(saved[key])) {
      out.push(detail(key, saved[key], mine));
    }
  }
  return out;
}

const detail = (path: string, theirs: unknown, mine: unknown): FieldError =>
  ({ code: 'changed-since', path, message: `saved: ${shown(theirs)}; yours: ${shown(mine)}` });

/**
 * A save based on an older revision than the one stored: refused, with who saved the newer one and every
 * field where the two versions differ. Nothing is lost: the caller still holds its version and can save it
 * again on top (as the next revision) or reload the saved one.
 */
export function staleSave(store: Store, row: JobRow, expected: number, patch: Record<string, unknown>): StoreError {
  const by = store.sql('SELECT made_by, saved_at FROM job_revisions WHERE job_id = ? AND revision = ?').get(row.id, row.revision) as
    { made_by: string; saved_at: string } | undefined;
  const who = by?.made_by ? ` by ${by.made_by}` : '';
  const when = by ? ` at ${by.saved_at}` : '';
  return new StoreError('stale-revision',
    `job ${row.number} was saved again${who}${when} as revision ${row.revision} since your revision ${expected}: nothing was saved. `
    + `Both versions differ as listed; save again to keep yours as revision ${row.revision + 1}, or reload to take the saved one`,
    'expectedRevision', differences(row, patch));
}

/**
 * An autosave or save from one desk while another desk holds the job's working copy: refused, naming who is
 * typing there and since when, with every field where their working copy and this desk's version differ.
 * Nothing is lost: this desk still holds its version; keeping it first keeps their working copy as their
 * revision, then saves this one on top.
 */
export function editedElsewhere(row: JobRow, open: WorkingRow, patch: Record<string, unknown>): StoreError {
  const who = open.made_by ? open.made_by : 'someone (name not recorded)';
  return new StoreError('edited-elsewhere',
    `job ${row.number} is being edited at another desk by ${who} (working copy since ${clock(open.opened_at)}, last autosaved ${clock(open.saved_at)}): `
    + `nothing was saved. Both versions differ as listed; save yours to keep their working copy as revision ${row.revision + 1} `
    + `and yours as revision ${row.revision + 2}, or take theirs`,
    'expectedRevision', differences(row, patch));
}

/** "2026-03-02 14:05 UTC" of a stored ISO time. */
const clock = (iso: string): string => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
