import { join } from 'node:path';
import { readdirSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';
import type { StoreInfo } from '../../../core/api';
import { backupStore, createJob, inTransaction, openStore, tryOpenStore } from '../../../db';
import type { OpenOptions, SqliteStore } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { openShopStore } from '../../../service/host/first-run';
import { parseArgs } from '../../../service/cli/io';
import { runCli } from '../../../service/cli/main';
import { cliOpenOptions } from '../../../service/cli/store-session';
import { damageIndexPage } from '../../support/damage';
import { job, sha256, tempDir, track, value } from './helpers';

/** The size rule lowered to one byte, so a small test store counts as a large one. */
const overTheRule: OpenOptions = { check: 'by-size', checkBeforeOpenMaxBytes: 1 };

function storeWithJobs(file: string, count = 120): void {
  const store = openStore(file);
  inTransaction(store, () => {
    for (let i = 0; i < count; i++) value(createJob(store, job({ partNumber: `DC-${i}` }, { freeLength: 40 + i / 10 })));
  });
  store.close();
}

/** A store with jobs, then one index page of its jobs table overwritten with junk, as the damage tests do. */
function damagedFile(): string {
  const file = join(tempDir(), 'shop.db');
  storeWithJobs(file);
  damageIndexPage(openStore(file));
  return file;
}

async function storeInfoOf(store: SqliteStore): Promise<StoreInfo> {
  const service = createService(store);
  return value(await dispatch(service.handlers, 'storeInfo', {})) as StoreInfo;
}

describe('the size rule of the damage check', () => {
  it('still refuses a damaged store within the rule before opening it, leaving the file as it was', () => {
    const file = damagedFile();
    const before = sha256(file);
    const opened = tryOpenStore(file, { check: 'by-size' });
    expect(opened).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
    if (!opened.ok) expect(opened.error.message).toMatch(/is damaged \(quick_check: [\s\S]+\) and was not opened\. Restore your latest backup/);
    expect(sha256(file)).toBe(before);
  });

  it('reports a store within the rule as passed at the open', async () => {
    const file = join(tempDir(), 'shop.db');
    storeWithJobs(file, 3);
    const at = new Date('2026-05-04T07:30:00Z');
    const store = track(openStore(file, { check: 'by-size', clock: () => at }));
    expect((await storeInfoOf(store)).damageCheck).toEqual({ state: 'passed', at: at.toISOString() });
  });

  it('opens a damaged store over the rule at once; the background check fails it and saves are refused with the way back', async () => {
    const file = damagedFile();
    const store = track(openStore(file, overTheRule));
    expect(store.damageCheck.state().state).toBe('running');
    const outcome = await store.damageCheck.settled();
    expect(outcome).toMatchObject({ state: 'failed', problem: expect.stringMatching(/^quick_check: [^\n]+$/) });
    if (outcome.state === 'failed') expect(outcome.problem.split('; ').length).toBeLessThanOrEqual(3);
    const info = await storeInfoOf(store);
    expect(info.damageCheck).toEqual(outcome);
    expect(info.readOnly).toMatch(/damaged \(quick_check: /);
    const service = createService(store);
    const saved = await dispatch(service.handlers, 'createJob', job({ partNumber: 'DC-NEW' }));
    expect(saved).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
    if (!saved.ok) {
      expect(saved.error.message).toMatch(/shop\.db is damaged \(quick_check: .+\): nothing was saved, and it stays read-only while it is open/);
      expect(saved.error.message).toMatch(/restore your latest backup over it with db restore --db ".+shop\.db" --from BACKUP-FILE/);
    }
    const count = store.db.prepare("SELECT count(*) AS n FROM jobs WHERE part_number = 'DC-NEW'").get() as { n: number };
    expect(count.n).toBe(0);
  });

  it('reports a healthy store over the rule as passed, and saves go on', async () => {
    const file = join(tempDir(), 'shop.db');
    storeWithJobs(file, 20);
    const store = track(openStore(file, overTheRule));
    expect(await store.damageCheck.settled()).toMatchObject({ state: 'passed', at: expect.any(String) });
    expect((await storeInfoOf(store)).readOnly).toBeNull();
    value(createJob(store, job({ partNumber: 'DC-AFTER' })));
  });

  it('lets a save during the background check through, then reports the check', async () => {
    const file = join(tempDir(), 'shop.db');
    storeWithJobs(file, 20);
    const store = track(openStore(file, overTheRule));
    value(createJob(store, job({ partNumber: 'DC-DURING' })));
    expect((await store.damageCheck.settled()).state).toBe('passed');
  });

  it('with the check deferred to the first save, reads need no check and the first save runs it and is refused', () => {
    const file = damagedFile();
    const events: string[] = [];
    const store = track(openStore(file, { ...overTheRule, deferredCheck: 'first-save', onCheck: (event, bytes) => events.push(`${event} ${bytes > 0}`) }));
    const jobs = store.db.prepare('SELECT count(*) AS n FROM jobs').get() as { n: number };
    expect(jobs.n).toBe(120);
    expect(store.damageCheck.state()).toEqual({ state: 'not-checked', reason: 'it runs before the first save' });
    expect(events).toEqual([]);
    const saved = createJob(store, job({ partNumber: 'DC-NEW' }));
    expect(saved).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
    expect(events).toEqual(['start true', 'end true']);
    expect(createJob(store, job({ partNumber: 'DC-AGAIN' }))).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
    expect(events).toHaveLength(2);
  });

  it('restores a backup over a store its background check failed: the damaged file is kept beside, and saves go on', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    storeWithJobs(file, 30);
    const backup = join(dir, 'monday.db');
    const seed = openStore(file);
    value(await backupStore(seed, backup));
    damageIndexPage(seed);
    const service = createService(track(openStore(file, { ...overTheRule, author: 'Desk 2 (demo)' })), overTheRule);
    const info = async () => value(await dispatch(service.handlers, 'storeInfo', {})) as StoreInfo;
    await vi.waitFor(async () => expect((await info()).damageCheck?.state).toBe('failed'));
    const restored = await service.files.run('restore', { file: backup });
    expect(restored).toMatchObject({ ok: true, value: { restoredFrom: backup, previousKeptAs: expect.stringMatching(/shop\.db\.damaged-/) } });
    expect(readdirSync(dir).some((name) => /^shop\.db\.damaged-.*Z$/.test(name))).toBe(true);
    await vi.waitFor(async () => expect((await info()).damageCheck?.state).toBe('passed'));
    expect((await info()).readOnly).toBeNull();
    const saved = await dispatch(service.handlers, 'createJob', job({ partNumber: 'DC-AFTER-RESTORE' }));
    expect(saved).toMatchObject({ ok: true });
    const page = value(await dispatch(service.handlers, 'listJobs', {})) as { total: number };
    expect(page.total).toBe(31);
  });

  it('opens the app\'s store over the rule without waiting, and the check reports through storeInfo', async () => {
    const file = damagedFile();
    const opened = openShopStore(file, { checkBeforeOpenMaxBytes: 1 });
    if (!opened.ok) throw new Error(opened.error.message);
    const store = track(opened.value.store);
    expect(opened.value.demoJobs).toBe(0);
    await store.damageCheck.settled();
    expect((await storeInfoOf(store)).damageCheck).toMatchObject({ state: 'failed' });
  });
});

describe('the command line and the damage check', () => {
  const cliStore = (file: string, ...argv: string[]) =>
    track(openStore(file, { ...cliOpenOptions(parseArgs(['jobs', 'list', '--db', file, ...argv])), checkBeforeOpenMaxBytes: 1 }));

  it('opens a large store for reading without the check, and --no-check never runs it', () => {
    const file = damagedFile();
    const store = cliStore(file);
    expect(store.damageCheck.state().state).toBe('not-checked');
    expect(cliOpenOptions(parseArgs(['jobs', 'add', 'job.json', '--no-check', '--db', file]))).toEqual({ check: 'none' });
    const unchecked = cliStore(file, '--no-check');
    expect(unchecked.damageCheck.state()).toEqual({ state: 'not-checked', reason: 'not asked for' });
  });

  it('refuses a restore into a large damaged store as damaged, which db restore answers by putting the backup in its place', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    storeWithJobs(file);
    const backup = join(dir, 'monday.db');
    const seed = openStore(file);
    value(await backupStore(seed, backup));
    damageIndexPage(seed);
    const service = createService(cliStore(file));
    const restored = await service.files.run('restore', { file: backup });
    expect(restored).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
  });

  it('db check runs the full check: a healthy store passes, a damaged one exits 2 with the way to restore', async () => {
    const healthy = join(tempDir(), 'shop.db');
    storeWithJobs(healthy, 5);
    const out: string[] = [];
    const err: string[] = [];
    expect(await runCli(['db', 'check', '--db', healthy], (t) => out.push(t), (t) => err.push(t))).toBe(0);
    expect(JSON.parse(out[0]!)).toMatchObject({ file: healthy, check: 'integrity_check', result: 'ok' });
    const damaged = damagedFile();
    expect(await runCli(['db', 'check', '--db', damaged], (t) => out.push(t), (t) => err.push(t))).toBe(2);
    expect(JSON.parse(err.at(-1)!).errors[0]).toMatchObject({
      code: 'store-corrupt', path: '--db', message: expect.stringMatching(/is damaged \([\s\S]+\) and was not opened\. Restore your latest backup/),
    });
    expect(await runCli(['db', 'check', '--db', join(tempDir(), 'none.db')], (t) => out.push(t), (t) => err.push(t))).toBe(2);
    expect(JSON.parse(err.at(-1)!).errors[0]).toMatchObject({ code: 'store-missing' });
  });
});
