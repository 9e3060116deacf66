import type { Settings } from '../core/settings/schema';
import { settingsSchema } from '../core/settings/schema';
import { failure, success } from './errors';
import type { StoreResult } from './errors';
import { jobRow } from './jobs/read';
import { readSettings } from './settings';
import type { Store } from './store';
import { inTransaction } from './store';

interface VersionRow { id: number; saved_at: string; settings: string }

/** Adds the settings as they stand now as a new version, unless the latest version is the same. Inside a transaction. */
export function recordSettingsVersion(store: Store): number {
  const text = JSON.stringify(readSettings(store));
  const latest = store.sql('SELECT id, settings FROM settings_versions ORDER BY id DESC LIMIT 1').get() as VersionRow | undefined;
  if (latest?.settings === text) return latest.id;
  const r = store.sql('INSERT INTO settings_versions (saved_at, settings) VALUES (?, ?)').run(store.now().toISOString(), text);
  return Number(r.lastInsertRowid);
}

/** The settings a job's price was last accepted under, with when; null when the store has no earlier version. */
export interface AcceptedSettings {
  version: number;
  settings: Settings;
  /** When the estimator accepted it; null when it is the version in force at the job's last save. */
  acceptedAt: string | null;
  savedAt: string;
}

function versionRow(store: Store, jobId: number, updatedAt: string): { row: VersionRow; acceptedAt: string | null } | null {
  const accepted = store.sql(`SELECT v.id, v.saved_at, v.settings, a.accepted_at FROM job_cost_acceptance a
                               JOIN settings_versions v ON v.id = a.settings_version WHERE a.job_id = ?`).get(jobId) as
    (VersionRow & { accepted_at: string }) | undefined;
  if (accepted) return { row: accepted, acceptedAt: accepted.accepted_at };
  const atSave = (store.sql('SELECT id, saved_at, settings FROM settings_versions WHERE saved_at <= ? ORDER BY saved_at DESC, id DESC LIMIT 1').get(updatedAt)
    ?? store.sql('SELECT id, saved_at, settings FROM settings_versions ORDER BY id LIMIT 1').get()) as VersionRow | undefined;
  return atSave ? { row: atSave, acceptedAt: null } : null;
}

export function acceptedSettings(store: Store, jobId: number): AcceptedSettings | null {
  const job = jobRow(store, jobId);
  if (!job) return null;
  const found = versionRow(store, jobId, job.updated_at);
  if (!found) return null;
  const parsed = settingsSchema.safeParse(JSON.parse(found.row.settings));
  if (!parsed.success) return null;
  return { version: found.row.id, settings: parsed.data, acceptedAt: found.acceptedAt, savedAt: found.row.saved_at };
}

/** The estimator accepts the job's price under today's settings: later comparisons start from these. */
export function acceptJobCost(store: Store, jobId: number): StoreResult<{ version: number; acceptedAt: string }> {
  if (!jobRow(store, jobId)) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  return success(inTransaction(store, () => {
    const version = recordSettingsVersion(store);
    const at = store.now().toISOString();
    store.sql(`INSERT INTO job_cost_acceptance (job_id, settings_version, accepted_at) VALUES (?, ?, ?)
               ON CONFLICT (job_id) DO UPDATE SET settings_version = excluded.settings_version, accepted_at = excluded.accepted_at`)
      .run(jobId, version, at);
    return { version, acceptedAt: at };
  }));
}
