import type { Settings, SettingsKey } from '../core/settings/schema';
import { parseSettingsPatch, parseSettingsValue, settingsKeys } from '../core/settings/schema';
import { StoreError, invalid, success } from './errors';
import type { StoreResult } from './errors';
import type { Store } from './store';
import { inTransaction } from './store';
import { recordSettingsVersion } from './settings-versions';

/** One settings document; a key never saved reads as its default. */
export function readSetting<K extends SettingsKey>(store: Store, key: K): Settings[K] {
  const row = store.sql('SELECT value FROM settings WHERE key = ?').get(key) as { value: string } | undefined;
  const parsed = parseSettingsValue(key, row === undefined ? undefined : JSON.parse(row.value));
  if (!parsed.ok) {
    const first = parsed.errors[0]!;
    throw new StoreError('settings-invalid', `stored settings "${key}" do not pass validation: ${first.message}`, first.path);
  }
  return parsed.value;
}

/** The shop's time zone; UTC when the stored defaults do not read (the list and the documents still work). */
export function shopTimeZone(store: Store): string {
  try {
    return readSetting(store, 'defaults').timeZone;
  } catch {
    return 'UTC';
  }
}

export function readSettings(store: Store): Settings {
  const out: Partial<Record<SettingsKey, unknown>> = {};
  for (const key of settingsKeys) out[key] = readSetting(store, key);
  return out as Settings;
}

/** Writes one already-validated document (callers hold the transaction). */
export function writeSetting<K extends SettingsKey>(store: Store, key: K, value: Settings[K]): void {
  store.sql(`INSERT INTO settings (key, value, updated_at) VALUES (?, ?, ?)
             ON CONFLICT (key) DO UPDATE SET value = excluded.value, updated_at = excluded.updated_at`)
    .run(key, JSON.stringify(value), store.now().toISOString());
}

/** Validates every key given, then writes them all in one transaction; returns the full settings. */
export function saveSettings(store: Store, patch: unknown): StoreResult<Settings> {
  const parsed = parseSettingsPatch(patch);
  if (!parsed.ok) return invalid(parsed.errors);
  inTransaction(store, () => {
    for (const [key, value] of Object.entries(parsed.value)) {
      writeSetting(store, key as SettingsKey, value as Settings[SettingsKey]);
    }
    recordSettingsVersion(store);
  });
  return success(readSettings(store));
}

export function getSettings(store: Store): StoreResult<Settings> {
  try {
    return success(readSettings(store));
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
