import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DEFAULT_WINDOW_STATE, readWindowState, sanitizeWindowState, windowStateOf, writeWindowState } from '../../electron/shell/window-state';

const screens = [{ x: 0, y: 0, width: 1920, height: 1080 }];
let dir: string;
beforeEach(() => { dir = mkdtempSync(path.join(os.tmpdir(), 'cw-window-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('window state', () => {
  it('round-trips through its file', () => {
    const file = path.join(dir, 'window-state.json');
    const state = { x: 100, y: 80, width: 1400, height: 900, maximized: true };
    writeWindowState(file, state);
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual(state);
    expect(readWindowState(file, screens)).toEqual(state);
  });

  it('falls back to the default for a missing or damaged file', () => {
    expect(readWindowState(path.join(dir, 'none.json'), screens)).toEqual(DEFAULT_WINDOW_STATE);
    const bad = path.join(dir, 'bad.json');
    writeFileSync(bad, '{"width": 12');
    expect(readWindowState(bad, screens)).toEqual(DEFAULT_WINDOW_STATE);
    for (const raw of [null, 42, [], { width: 'wide', height: 800 }, { width: 1e9, height: 800 }, { width: 1.5, height: 800 }]) {
      expect(sanitizeWindowState(raw, screens)).toEqual(DEFAULT_WINDOW_STATE);
    }
  });

  it('drops the position of a window that would open off every screen (an unplugged monitor)', () => {
    expect(sanitizeWindowState({ x: 3000, y: 100, width: 1200, height: 800, maximized: false }, screens))
      .toEqual({ width: 1200, height: 800, maximized: false });
    expect(sanitizeWindowState({ x: 1850, y: 100, width: 1200, height: 800 }, screens)).not.toHaveProperty('x');
    expect(sanitizeWindowState({ x: 1700, y: 100, width: 1200, height: 800 }, screens)).toMatchObject({ x: 1700 });
    const two = [...screens, { x: 1920, y: 0, width: 2560, height: 1440 }];
    expect(sanitizeWindowState({ x: 3000, y: 100, width: 1200, height: 800 }, two)).toMatchObject({ x: 3000, y: 100 });
  });

  it('keeps a usable minimum size', () => {
    expect(sanitizeWindowState({ width: 200, height: 100 }, screens)).toEqual({ width: 800, height: 560, maximized: false });
  });

  it('reads the normal (unmaximised) bounds of a window', () => {
    const window = { getNormalBounds: () => ({ x: 1, y: 2, width: 1000, height: 700 }), isMaximized: () => true };
    expect(windowStateOf(window)).toEqual({ x: 1, y: 2, width: 1000, height: 700, maximized: true });
  });
});
