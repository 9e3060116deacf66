import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { FakeBrowserWindow, captured, electron } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

const listenersBefore = process.listeners('uncaughtException');

beforeAll(async () => {
  electron.app.requestSingleInstanceLock.mockReturnValue(false);
  await import('../../electron/main');
});
afterAll(() => {
  for (const l of process.listeners('uncaughtException')) if (!listenersBefore.includes(l)) process.off('uncaughtException', l);
});

describe('a second instance', () => {
  it('quits at once and leaves the running one alone', () => {
    expect(electron.app.quit).toHaveBeenCalledTimes(1);
    expect(electron.app.whenReady).not.toHaveBeenCalled();
    expect(FakeBrowserWindow.all).toHaveLength(0);
    expect(captured.ipcMain.size).toBe(0);
    expect(listenersBefore).toEqual(process.listeners('uncaughtException'));
  });
});
