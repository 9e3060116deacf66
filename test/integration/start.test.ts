import { spawn, spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { electronRuntime } from '../../scripts/electron-runtime.mjs';

const root = resolve(__dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'coilwright-start-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('where Electron\'s runtime is looked for', () => {
  it('finds the binary path.txt names under dist/ or the override, and never reports one that is not there', () => {
    const pkg = mkdtempSync(join(dir, 'electron-'));
    expect(electronRuntime({ packageDir: null, env: {} })).toMatchObject({ available: false, reason: 'the electron package is not installed' });
    expect(electronRuntime({ packageDir: pkg, env: {} })).toEqual({ available: false, reason: 'its binary was never downloaded' });
    writeFileSync(join(pkg, 'path.txt'), 'electron');
    expect(electronRuntime({ packageDir: pkg, env: {} })).toEqual({ available: false, reason: `no Electron binary at ${join(pkg, 'dist', 'electron')}` });
    mkdirSync(join(pkg, 'dist'));
    writeFileSync(join(pkg, 'dist', 'electron'), '');
    expect(electronRuntime({ packageDir: pkg, env: {} })).toEqual({ available: true, executable: join(pkg, 'dist', 'electron') });
    const elsewhere = join(dir, 'elsewhere');
    expect(electronRuntime({ packageDir: pkg, env: { ELECTRON_OVERRIDE_DIST_PATH: elsewhere } }))
      .toEqual({ available: false, reason: `no Electron binary at ${join(elsewhere, 'electron')}` });
  });
});

describe('npm start without Electron\'s runtime', () => {
  it('says so in one line, serves the app on loopback and hands its address to the browser', async () => {
    const opened = join(dir, 'opened.txt');
    const browser = join(dir, 'browser.sh');
    writeFileSync(browser, `#!/bin/sh\necho "$1" > "${opened}"\n`);
    chmodSync(browser, 0o755);
    // The override points at an empty folder: no Electron binary, whatever this machine has installed.
    const env = { ...process.env, ELECTRON_OVERRIDE_DIST_PATH: join(dir, 'no-electron'), BROWSER: browser };
    const child = spawn(process.execPath, ['scripts/start.mjs', '--db', join(dir, 'shop.db'), '--port', '0'],
      { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'], detached: true });
    let out = '';
    child.stdout.setEncoding('utf8').on('data', (t: string) => { out += t; });
    child.stderr.setEncoding('utf8').on('data', (t: string) => { out += t; });
    try {
      const url = await new Promise<string>((done, fail) => {
        const timer = setInterval(() => {
          const m = /Open (http:\/\/127\.0\.0\.1:\d+\/\?token=\S+)/.exec(out);
          if (m) { clearInterval(timer); done(m[1]!); }
        }, 100);
        child.on('exit', () => { clearInterval(timer); fail(new Error(`start ended early:\n${out}`)); });
      });
      expect(out.split('\n')[0]).toMatch(/^Electron's runtime is not available on this machine \(no Electron binary at .*\), so Coilwright opens in your web browser instead\.$/);
      const entry = await fetch(url, { redirect: 'manual' });
      expect(entry.status).toBe(303);
      const cookie = entry.headers.get('set-cookie')!.split(';')[0]!;
      const page = await fetch(new URL('/', url), { headers: { cookie } });
      expect(page.status).toBe(200);
      expect(await page.text()).toMatch(/<title>Coilwright<\/title>[\s\S]*<div id="root">/);
      for (let waited = 0; !existsSync(opened) && waited < 5000; waited += 100) await new Promise((r) => setTimeout(r, 100));
      expect(readFileSync(opened, 'utf8').trim()).toBe(url);
    } finally {
      process.kill(-child.pid!, 'SIGTERM');
    }
  }, 240_000);
});

describe('npm start with Electron\'s runtime present', () => {
  it('builds and hands the app folder to the runtime, as `electron .` always did (a stand-in binary, never Electron)', () => {
    const dist = mkdtempSync(join(dir, 'runtime-'));
    const pathTxt = join(root, 'node_modules', 'electron', 'path.txt');
    const name = existsSync(pathTxt) ? readFileSync(pathTxt, 'utf8').trim() : 'electron';
    const marker = join(dir, 'launched.txt');
    mkdirSync(dirname(join(dist, name)), { recursive: true });
    writeFileSync(join(dist, name), `#!/bin/sh\necho "$PWD $@" > "${marker}"\n`);
    chmodSync(join(dist, name), 0o755);
    const run = spawnSync(process.execPath, ['scripts/start.mjs'], {
      cwd: root, encoding: 'utf8', env: { ...process.env, ELECTRON_OVERRIDE_DIST_PATH: dist, BROWSER: 'none' },
    });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).not.toMatch(/not available/);
    expect(readFileSync(marker, 'utf8').trim()).toBe(`${root} .`);
    expect(existsSync(join(root, 'dist', 'electron', 'main.cjs'))).toBe(true);
  }, 240_000);
});
