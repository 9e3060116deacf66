import { BrowserWindow } from 'electron';
import type { PendingUpdate } from '../../service/host/store-update';
import { updateNoticeText } from '../../service/host/store-update';
import { secureWindowOptions } from './security';

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The notice as a page of its own: no script, no request, nothing but the words. */
export function updateNoticePage(pending: PendingUpdate): string {
  const { headline, detail } = updateNoticeText(pending);
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">
<title>Coilwright: updating the job store</title>
<style>body{font:15px system-ui,sans-serif;margin:24px;color:#222;background:#f5f5f2}h1{font-size:17px;margin:0 0 10px}p{margin:6px 0}</style>
</head><body><h1>${escapeHtml(headline)}</h1>
${detail.map((line) => `<p>${escapeHtml(line)}</p>`).join('\n')}
<p>The main window opens when it is done.</p>
</body></html>`;
}

/** How long the notice may take to show before the update starts anyway. */
const SHOW_WAIT_MS = 3000;

/**
 * Shows the notice in a small window of its own and resolves once it is on screen (or after SHOW_WAIT_MS),
 * so it is painted before the update starts (in a worker thread, or on the main process when that cannot run);
 * close() takes it away.
 */
export async function showUpdateNotice(pending: PendingUpdate): Promise<{ close(): void }> {
  const window = new BrowserWindow(secureWindowOptions({
    width: 540, height: 270, resizable: false, minimizable: false, maximizable: false, fullscreenable: false,
    title: 'Coilwright: updating the job store', backgroundColor: '#f5f5f2',
  }));
  window.setMenu(null);
  const loaded = window.loadURL(`data:text/html;charset=utf-8,${encodeURIComponent(updateNoticePage(pending))}`).catch(() => undefined);
  await Promise.race([loaded, new Promise((resolve) => setTimeout(resolve, SHOW_WAIT_MS))]);
  return { close: () => { if (!window.isDestroyed()) window.close(); } };
}
