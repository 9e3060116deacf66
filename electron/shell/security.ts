import type { BrowserWindowConstructorOptions, Session, WebContents, WebPreferences } from 'electron';
import { openExternalLink } from './external-links';
import { isAppUrl } from './origin';

export interface WindowExtras {
  /** Absolute path of the bundled preload; only the main window has one. */
  preload?: string;
  /** Chromium's built-in PDF viewer, for PDF preview windows only. */
  pdfViewer?: boolean;
}

/** The renderer is untrusted: every preference the security checklist names, written out so a test can pin it. */
export function secureWebPreferences(extras: WindowExtras = {}): WebPreferences {
  return {
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
    // Chromium's spellchecker fetches dictionaries from the network; the app works offline.
    spellcheck: false,
    ...(extras.preload === undefined ? {} : { preload: extras.preload }),
    ...(extras.pdfViewer ? { plugins: true } : {}),
  };
}

/** The only way a window is made: caller's size and title, and always the secure preferences. */
export function secureWindowOptions(
  window: Omit<BrowserWindowConstructorOptions, 'webPreferences'> = {},
  extras: WindowExtras = {},
): BrowserWindowConstructorOptions {
  return { ...window, webPreferences: secureWebPreferences(extras) };
}

export type ContentsLike = Pick<WebContents, 'on' | 'setWindowOpenHandler'>;

export interface HardenOptions {
  openExternal: (url: string) => Promise<void> | void;
  onError?: (error: unknown) => void;
}

/**
 * Navigation stays on app://coilwright; new windows are always denied, and http(s) links they carried
 * go to the system browser through the link policy.
 */
export function hardenWebContents(contents: ContentsLike, options: HardenOptions): void {
  const stayHome = (event: { preventDefault(): void }, url: string) => {
    if (!isAppUrl(url)) event.preventDefault();
  };
  contents.on('will-navigate', (event) => stayHome(event, event.url));
  contents.on('will-redirect', (event) => stayHome(event, event.url));
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(({ url }) => {
    openExternalLink(url, options.openExternal, options.onError);
    return { action: 'deny' };
  });
}

export type SessionLike = Pick<Session, 'setPermissionRequestHandler' | 'setPermissionCheckHandler'>;

/** The app needs no browser permission (camera, notifications, clipboard reads …): every request is refused. */
export function denyPermissions(session: SessionLike): void {
  session.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  session.setPermissionCheckHandler(() => false);
}
