import { describe, expect, it, vi } from 'vitest';
import { denyPermissions, hardenWebContents, secureWebPreferences, secureWindowOptions } from '../../electron/shell/security';
import type { ContentsLike, SessionLike } from '../../electron/shell/security';
import { FakeWebContents, navigationEvent } from './electron-mock';

const securePrefs = {
  sandbox: true,
  contextIsolation: true,
  nodeIntegration: false,
  nodeIntegrationInWorker: false,
  nodeIntegrationInSubFrames: false,
  webviewTag: false,
  webSecurity: true,
  allowRunningInsecureContent: false,
  experimentalFeatures: false,
  navigateOnDragDrop: false,
  spellcheck: false,
};

describe('secureWindowOptions', () => {
  it('has exactly the secure preferences', () => {
    expect(secureWindowOptions()).toEqual({ webPreferences: securePrefs });
  });

  it('keeps the caller’s window options and adds only the preload path', () => {
    expect(secureWindowOptions({ width: 900, title: 'x' }, { preload: '/app/preload.cjs' })).toEqual({
      width: 900, title: 'x', webPreferences: { ...securePrefs, preload: '/app/preload.cjs' },
    });
  });

  it('enables the PDF viewer only when asked, and nothing else changes', () => {
    expect(secureWebPreferences({ pdfViewer: true })).toEqual({ ...securePrefs, plugins: true });
    expect(secureWebPreferences()).not.toHaveProperty('plugins');
  });

  it('cannot be loosened through the window options', () => {
    const sneaky = { webPreferences: { nodeIntegration: true } } as unknown as Parameters<typeof secureWindowOptions>[0];
    expect(secureWindowOptions(sneaky).webPreferences).toEqual(securePrefs);
  });
});

function hardened() {
  const contents = new FakeWebContents();
  const openExternal = vi.fn(async (_url: string) => undefined);
  hardenWebContents(contents as unknown as ContentsLike, { openExternal });
  const fire = (event: string, url: string) => {
    const e = navigationEvent(url);
    contents.emit(event, e);
    return e.preventDefault.mock.calls.length > 0;
  };
  return { contents, openExternal, fire };
}

describe('navigation', () => {
  it('blocks will-navigate to any other origin', () => {
    const { fire } = hardened();
    for (const url of ['https://example.com/', 'file:///etc/passwd', 'app://coilwright.evil/', 'app://other/index.html',
      'javascript:alert(1)', 'http://127.0.0.1:5173/', 'not a url']) {
      expect(fire('will-navigate', url), url).toBe(true);
    }
  });

  it('allows will-navigate within app://coilwright', () => {
    const { fire } = hardened();
    expect(fire('will-navigate', 'app://coilwright/index.html')).toBe(false);
    expect(fire('will-navigate', 'app://coilwright/jobs/12?tab=plan')).toBe(false);
  });

  it('blocks redirects away from the app and any webview', () => {
    const { fire } = hardened();
    expect(fire('will-redirect', 'https://example.com/')).toBe(true);
    expect(fire('will-redirect', 'app://coilwright/index.html')).toBe(false);
    expect(fire('will-attach-webview', 'app://coilwright/')).toBe(true);
  });
});

describe('new windows', () => {
  it('are always denied; http(s) links go to the system browser', async () => {
    const { contents, openExternal } = hardened();
    expect(contents.windowOpenHandler!({ url: 'https://example.com/datasheet' })).toEqual({ action: 'deny' });
    expect(openExternal).toHaveBeenCalledWith('https://example.com/datasheet');
  });

  it('never hand other schemes or our own pages to the browser', () => {
    const { contents, openExternal } = hardened();
    for (const url of ['file:///etc/passwd', 'javascript:alert(1)', 'app://coilwright/index.html', 'smb://share/x', '']) {
      expect(contents.windowOpenHandler!({ url })).toEqual({ action: 'deny' });
    }
    expect(openExternal).not.toHaveBeenCalled();
  });
});

describe('permissions', () => {
  it('refuses every request and every check', () => {
    const session = { setPermissionRequestHandler: vi.fn(), setPermissionCheckHandler: vi.fn() };
    denyPermissions(session as unknown as SessionLike);
    const request = session.setPermissionRequestHandler.mock.calls[0]![0] as (c: unknown, p: string, cb: (ok: boolean) => void) => void;
    const check = session.setPermissionCheckHandler.mock.calls[0]![0] as (c: unknown, p: string) => boolean;
    for (const permission of ['media', 'notifications', 'geolocation', 'clipboard-read', 'openExternal']) {
      const callback = vi.fn();
      request({}, permission, callback);
      expect(callback).toHaveBeenCalledWith(false);
      expect(check({}, permission)).toBe(false);
    }
  });
});
