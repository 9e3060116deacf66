import { beforeAll, describe, expect, it, vi } from 'vitest';
import { contract } from '../../core/api';
import type { CoilwrightBridge } from '../../core/api/method-names';
import { captured, electron } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let bridge: CoilwrightBridge;

beforeAll(async () => {
  await import('../../electron/preload');
  bridge = captured.exposed.get('coilwright') as CoilwrightBridge;
});

describe('the preload bridge', () => {
  it('exposes only window.coilwright, with exactly the api, menu and PDF functions', () => {
    expect([...captured.exposed.keys()]).toEqual(['coilwright']);
    expect(Object.keys(bridge).sort()).toEqual(['api', 'cancelDataAction', 'onDataProgress', 'onMenuCommand', 'openRequestSheet', 'previewPdf', 'runDataAction', 'savePdf']);
    expect(Object.keys(bridge.api)).toEqual(Object.keys(contract));
  });

  it('never hands out ipcRenderer or any of its methods', () => {
    const values = [...Object.values(bridge), ...Object.values(bridge.api)];
    for (const v of values) {
      expect(v).not.toBe(electron.ipcRenderer);
      expect(Object.values(electron.ipcRenderer)).not.toContain(v);
    }
  });

  it('invokes one channel per method with the input as given', async () => {
    electron.ipcRenderer.invoke.mockResolvedValueOnce({ ok: true, value: [] } as never);
    await expect(bridge.api.listGrades({})).resolves.toEqual({ ok: true, value: [] });
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('api:listGrades', {});
    await bridge.api.calculate({ spec: { kind: 'compression' } });
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('api:calculate', { spec: { kind: 'compression' } });
  });

  it('sends PDFs on their own channels', async () => {
    const file = { base64: 'JVBERi0=', fileName: 'Q-1.pdf' };
    await bridge.previewPdf(file);
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('pdf:preview', file);
    await bridge.savePdf(file);
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('pdf:save', file);
  });

  it('passes menu commands without the IPC event, ignores unknown ones and can stop listening', () => {
    const seen: unknown[] = [];
    const stop = bridge.onMenuCommand((...args) => seen.push(args));
    const [channel, listener] = electron.ipcRenderer.on.mock.calls.at(-1) as unknown as [string, (e: unknown, c: unknown) => void];
    expect(channel).toBe('menu-command');
    listener({ sender: electron.ipcRenderer }, 'new-job');
    listener({ sender: electron.ipcRenderer }, 'format-disk');
    listener({ sender: electron.ipcRenderer }, { command: 'save' });
    expect(seen).toEqual([['new-job']]);
    stop();
    expect(electron.ipcRenderer.removeListener).toHaveBeenCalledWith('menu-command', listener);
  });

  it('asks main for a data action by name with the screen\'s choices, and cancels it by name', async () => {
    await bridge.runDataAction('exportJobs', { format: 'csv', status: 'quoted' });
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('data:action', 'exportJobs', { format: 'csv', status: 'quoted' });
    await bridge.cancelDataAction('exportJobs');
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith('data:cancel', 'exportJobs');
  });

  it('passes data-action progress as a fresh plain copy, drops anything malformed and can stop listening', () => {
    const seen: unknown[] = [];
    const stop = bridge.onDataProgress((...args) => seen.push(args));
    const [channel, listener] = electron.ipcRenderer.on.mock.calls.at(-1) as unknown as [string, (e: unknown, m: unknown) => void];
    expect(channel).toBe('data:progress');
    const running = { action: 'backup', from: 'window', state: 'running', done: 40, total: 400, cancellable: true, sender: electron.ipcRenderer };
    listener({ sender: electron.ipcRenderer }, running);
    listener({}, { action: 'importJobs', from: 'menu', state: 'ended', outcome: 'cancelled', message: 'Import cancelled: nothing was imported.' });
    for (const bad of [null, 'backup', { ...running, done: Number.NaN }, { ...running, total: -1 }, { ...running, action: 'wipe' },
      { ...running, from: 'elsewhere' }, { ...running, state: 'ended', outcome: 'exploded', message: 'x' }]) listener({}, bad);
    expect(seen).toEqual([
      [{ action: 'backup', from: 'window', state: 'running', done: 40, total: 400, cancellable: true }],
      [{ action: 'importJobs', from: 'menu', state: 'ended', outcome: 'cancelled', message: 'Import cancelled: nothing was imported.' }],
    ]);
    stop();
    expect(electron.ipcRenderer.removeListener).toHaveBeenCalledWith('data:progress', listener);
  });
});
