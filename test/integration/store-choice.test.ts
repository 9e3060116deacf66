import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path, { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fileStoreChoice } from '../../service/host/store-choice';
import { parseWebArgs } from '../../service/web/main';
import { startWebServer } from '../../service/web/server';
import { usePgCluster } from '../support/pg-stores';
import { tempDir } from './db/helpers';

const pg = usePgCluster();
const root = resolve(__dirname, '../..');
const withPassword = (url: string) => url.replace('postgres@', 'postgres:hunter2-not-shown@');

describe('choosing the store', () => {
  it('npm run web takes --store, --db or COILWRIGHT_STORE; a connection string is kept as given', () => {
    const defaults = { home: '/home/shop', cwd: '/src/coilwright' };
    const url = 'postgres://estimator@db.shop.example:5432/springs';
    expect(parseWebArgs(['--store', url], defaults)).toMatchObject({ dbFile: url });
    expect(parseWebArgs(['--store', 'rel/shop.db'], defaults)).toMatchObject({ dbFile: path.resolve('rel/shop.db') });
    expect(parseWebArgs([], { ...defaults, env: { COILWRIGHT_STORE: url } })).toMatchObject({ dbFile: url });
    expect(parseWebArgs(['--db', '/data/a.db'], { ...defaults, env: { COILWRIGHT_STORE: url } })).toMatchObject({ dbFile: '/data/a.db' });
    expect(parseWebArgs([], { ...defaults, env: { COILWRIGHT_STORE: url } })).toMatchObject({ named: true });
    expect(parseWebArgs([], defaults)).toMatchObject({ named: false, dbFile: path.join('/home/shop', '.coilwright', 'coilwright.db') });
  });

  it('npm run web with no store named opens the server store chosen last time; one that cannot be opened falls back to its own file and says why', async () => {
    const dir = tempDir();
    const staticDir = join(dir, 'renderer');
    mkdirSync(staticDir, { recursive: true });
    writeFileSync(join(staticDir, 'index.html'), '<!doctype html><title>Coilwright</title>');
    const ownFile = join(dir, 'coilwright.db');
    const choice = fileStoreChoice(join(dir, 'app-settings.json'));
    const chosen = pg.freshDatabase();
    choice.remember(withPassword(chosen));
    const notices: string[] = [];
    const onServer = await startWebServer({ dbFile: ownFile, named: false, choice, staticDir, onNotice: (t) => notices.push(t) });
    await onServer.close();
    expect(onServer.storeName).toMatch(/^127\.0\.0\.1:\d+\/shop_\d+_\d+$/);
    expect(notices).toEqual([]);
    // Named on the command line: the remembered store is not opened.
    const named = await startWebServer({ dbFile: ownFile, named: true, choice, staticDir });
    await named.close();
    expect(named.storeName).toBe(ownFile);

    choice.remember(chosen.replace(/shop_\d+_\d+$/, 'no_such_database'));
    const fallback = await startWebServer({ dbFile: ownFile, named: false, choice, staticDir, onNotice: (t) => notices.push(t) });
    await fallback.close();
    expect(fallback.storeName).toBe(ownFile);
    expect(notices).toHaveLength(1);
    expect(notices[0]).toMatch(/no_such_database chosen on the Data screen could not be opened .*works in .*coilwright\.db instead.*PGPASSWORD or ~\/\.pgpass/s);
    expect(notices[0]).not.toContain('hunter2');
  });

  it('the web transport serves a PostgreSQL store and names it by host and database only', async () => {
    const url = withPassword(pg.freshDatabase());
    const staticDir = join(tempDir(), 'renderer');
    mkdirSync(staticDir, { recursive: true });
    writeFileSync(join(staticDir, 'index.html'), '<!doctype html><title>Coilwright</title>');
    const web = await startWebServer({ dbFile: url, staticDir });
    try {
      expect(web.storeName).toMatch(/^127\.0\.0\.1:\d+\/shop_\d+_\d+$/);
      const cookie = ((await fetch(web.url, { redirect: 'manual' })).headers.get('set-cookie') ?? '').split(';')[0]!;
      const call = async (method: string, body: unknown) => (await fetch(`http://127.0.0.1:${web.port}/api/${method}`, {
        method: 'POST', headers: { 'content-type': 'application/json', cookie }, body: JSON.stringify(body),
      })).json() as Promise<{ ok: boolean; value: Record<string, unknown> }>;
      const info = await call('storeInfo', {});
      expect(info.value).toMatchObject({ backend: 'postgres', name: web.storeName, author: 'postgres', readOnly: null });
      // The demo shop went into the empty database, as into a new file.
      expect(((await call('listJobs', {})).value as { total: number }).total).toBeGreaterThan(3);
      expect((await call('signIn', { name: 'Evan (inspector)' })).value).toMatchObject({ author: 'Evan (inspector)' });
      const exportAnswer = await call('exportJobs', { format: 'json' });
      expect(exportAnswer.ok).toBe(true);
      expect(exportAnswer.value.count).toBeGreaterThan(3);
      const exported = JSON.stringify(exportAnswer);
      expect(exported).not.toContain('hunter2');
      // The export is a server store's portable copy: it goes back in, all of it, with new numbers.
      const reimported = await call('importJobs', { text: exportAnswer.value.text, renumber: true });
      expect(reimported.ok).toBe(true);
      expect((reimported.value as unknown as { imported: unknown[] }).imported).toHaveLength(exportAnswer.value.count as number);
      const refused = await call('openServerStore', { connection: '/etc/passwd' });
      expect(refused).toMatchObject({ ok: false, error: { path: 'connection' } });
    } finally {
      await web.close();
    }
  });

  it('the command line opens the store named by COILWRIGHT_STORE', () => {
    const url = withPassword(pg.freshDatabase());
    const env = { ...process.env, COILWRIGHT_STORE: url };
    const demo = spawnSync(process.execPath, ['scripts/cli.mjs', 'demo'], { cwd: root, encoding: 'utf8', env });
    expect(demo.status, demo.stderr).toBe(0);
    expect(demo.stdout).not.toContain('hunter2');
    const list = spawnSync(process.execPath, ['scripts/cli.mjs', 'jobs', 'list'], { cwd: root, encoding: 'utf8', env });
    expect(list.status, list.stderr).toBe(0);
    expect((JSON.parse(list.stdout) as { total: number }).total).toBeGreaterThan(3);
    const none = spawnSync(process.execPath, ['scripts/cli.mjs', 'jobs', 'list'], { cwd: root, encoding: 'utf8', env: { ...process.env, COILWRIGHT_STORE: '' } });
    expect(none.status).toBe(2);
    expect(none.stderr).toMatch(/--store LOCATION/);
  }, 120_000);
});
