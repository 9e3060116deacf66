import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { listJobs, openStore, saveSettings, getSettings } from '../../db';
import { openShopStore } from '../../service/host/first-run';

let dir: string;
beforeEach(() => { dir = mkdtempSync(path.join(os.tmpdir(), 'cw-first-run-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('openShopStore', () => {
  it('creates the folder and fills a new store with the demo shop, once', () => {
    const file = path.join(dir, 'nested', 'coilwright.db');
    const first = openShopStore(file);
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    expect(first.value.demoJobs).toBeGreaterThan(0);
    const jobs = listJobs(first.value.store, { limit: 500 });
    expect(jobs.ok && jobs.value.total).toBe(first.value.demoJobs);
    first.value.store.close();
    const again = openShopStore(file);
    expect(again.ok && again.value.demoJobs).toBe(0);
    if (again.ok) again.value.store.close();
  });

  it('leaves a store alone once the shop saved its settings, even without jobs', () => {
    const file = path.join(dir, 'coilwright.db');
    const store = openStore(file);
    const settings = getSettings(store);
    expect(settings.ok).toBe(true);
    if (settings.ok) expect(saveSettings(store, settings.value as never).ok).toBe(true);
    store.close();
    const opened = openShopStore(file);
    expect(opened.ok && opened.value.demoJobs).toBe(0);
    if (opened.ok) opened.value.store.close();
  });

  it('returns a value, not an exception, for a file that is not a store', () => {
    const file = path.join(dir, 'notes.db');
    writeFileSync(file, 'these are not the jobs you are looking for');
    const opened = openShopStore(file);
    expect(opened).toMatchObject({ ok: false, error: { code: 'not-a-store' } });
  });

  it('dates a new shop\'s days in the time zone of the computer it starts on', { timeout: 60_000 }, () => {
    const file = path.join(dir, 'chicago', 'coilwright.db');
    const opened = spawnSync(process.execPath, ['--import', 'tsx', 'test/integration/db/fixtures/open-shop.ts', file],
      { cwd: path.resolve(__dirname, '../..'), encoding: 'utf8', env: { ...process.env, TZ: 'America/Chicago' } });
    expect(opened.status, opened.stderr).toBe(0);
    expect((JSON.parse(opened.stdout) as { demoJobs: number }).demoJobs).toBeGreaterThan(0);
    const store = openStore(file);
    const settings = getSettings(store);
    store.close();
    expect(settings.ok && settings.value.defaults.timeZone).toBe('America/Chicago');
    // The demo shop's own defaults are kept beside it.
    expect(settings.ok && settings.value.defaults.units).toBe('inch');
  });
});
