/** The desktop shell's start opens the server store chosen last time on the Data screen; its password is never saved. */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { FakeBrowserWindow, captured, ipcEvent, paths } from './electron-mock';
import { usePgCluster } from '../support/pg-stores';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

const pg = usePgCluster();
let dir: string;
let chosenLastTime: string;
const settingsFile = () => path.join(paths.userData, 'app-settings.json');
const storeVariable = process.env.COILWRIGHT_STORE;
type ProcessEvent = 'uncaughtException' | 'unhandledRejection';
const processEvents: ProcessEvent[] = ['uncaughtException', 'unhandledRejection'];
const before = new Map(processEvents.map((e) => [e, process.listeners(e as 'uncaughtException')]));

beforeAll(async () => {
  delete process.env.COILWRIGHT_STORE;
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-main-choice-'));
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Coilwright</title>');
  mkdirSync(paths.userData, { recursive: true });
  // What an earlier run saved after the estimator opened a server store on the Data screen.
  chosenLastTime = pg.freshDatabase();
  writeFileSync(settingsFile(), JSON.stringify({ store: { location: chosenLastTime, passwordLeftOut: false, savedAt: '2026-03-01T08:00:00.000Z' } }));
  await import('../../electron/main');
  await vi.waitFor(() => expect(FakeBrowserWindow.all).toHaveLength(1));
});

afterAll(() => {
  captured.app.emit('will-quit');
  for (const event of processEvents) {
    for (const l of process.listeners(event as 'uncaughtException')) if (!before.get(event)!.includes(l)) process.off(event as 'uncaughtException', l);
  }
  if (storeVariable === undefined) delete process.env.COILWRIGHT_STORE;
  else process.env.COILWRIGHT_STORE = storeVariable;
  rmSync(dir, { recursive: true, force: true });
});

const trusted = ipcEvent('app://coilwright/index.html');
const call = async (method: string, input: unknown) =>
  await captured.ipcMain.get(`api:${method}`)!(trusted, input) as { ok: boolean; value: Record<string, unknown>; error?: { code: string } };

describe('the store the desktop app starts in', () => {
  it('is the server store chosen last time, not the file in userData', async () => {
    const info = await call('storeInfo', {});
    expect(info.value).toMatchObject({ backend: 'postgres', name: expect.stringMatching(/^127\.0\.0\.1:\d+\/shop_\d+_\d+$/) });
    expect(info.value.nextStart).toEqual({ location: chosenLastTime, passwordLeftOut: false });
    expect(existsSync(path.join(paths.userData, 'coilwright.db'))).toBe(false);
    // The empty database got the demo shop, as a new file would.
    expect(((await call('listJobs', {})).value as { total: number }).total).toBeGreaterThan(0);
  });

  it('opening another server store on the Data screen keeps it for the next start without its password', async () => {
    const next = pg.freshDatabase();
    const withPassword = next.replace('postgres@', 'postgres:Fernhill-pw-7731@');
    expect(withPassword).not.toBe(next);
    const opened = await call('openServerStore', { connection: withPassword });
    expect(opened.ok).toBe(true);
    expect(opened.value.nextStart).toEqual({ location: next, passwordLeftOut: true });
    const saved = readFileSync(settingsFile(), 'utf8');
    expect(saved).not.toContain('Fernhill-pw-7731');
    expect(JSON.parse(saved)).toMatchObject({ store: { location: next, passwordLeftOut: true } });
  });

  it('forgetting it sends the next start back to the file in userData', async () => {
    const forgot = await call('forgetServerStore', {});
    expect(forgot.value).toMatchObject({ backend: 'postgres', nextStart: null });
    expect(JSON.parse(readFileSync(settingsFile(), 'utf8'))).toEqual({});
  });
});
