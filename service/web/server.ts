import { createServer } from 'node:http';
import type { IncomingMessage, Server, ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { ApiError } from '../../core/api';
import { dispatch } from '../api/dispatch';
import { createService } from '../api';
import type { Service } from '../api';
import type { OpenOptions } from '../../db';
import { openShopStoreAt } from '../host/first-run';
import { pendingLargeUpdate, updateNoticeText } from '../host/store-update';
import { openStartingStore } from '../host/store-choice';
import type { StoreChoiceKeeper } from '../host/store-choice';
import { isAuthorized, newToken, sameToken, sessionCookie } from './auth';
import { readJsonBody } from './body';
import { BACKUP_ROUTE, RESTORE_ROUTE, receiveRestore, sendBackup } from './files';
import { EXPORT_ROUTE, sendExport } from './export-download';
import { IMPORT_ROUTE, receiveImport } from './import-upload';
import { sendFile, sendJson, sendText } from './respond';

export const WEB_HOST = '127.0.0.1';

export interface WebServerOptions {
  dbFile: string;
  /** The built renderer (dist/renderer). */
  staticDir: string;
  port?: number;
  token?: string;
  maxBodyBytes?: number;
  /** Largest backup a restore may upload (2 GiB unless given). */
  maxUploadBytes?: number;
  /** Where a notice about the store goes (it opened read-only); stderr by default. */
  onNotice?: (text: string) => void;
  /** Where unexpected failures go; stderr by default. */
  onUnexpected?: (context: string, error: unknown) => void;
  /**
   * Where a server store opened on the Data screen is remembered for the next start (the program's settings
   * file; never its password). Without it nothing is remembered.
   */
  choice?: StoreChoiceKeeper;
  /**
   * false when `dbFile` is only the program's own file (no --db, --store or COILWRIGHT_STORE): then the store
   * remembered in `choice` is opened instead, falling back to `dbFile` with a notice. True unless given.
   */
  named?: boolean;
  /** How the store opens, over the app's defaults (tests lower the damage check's size rule). */
  openOptions?: OpenOptions;
}

export interface WebServer {
  /** http://127.0.0.1:PORT/?token=TOKEN: opening it sets the session cookie. */
  url: string;
  token: string;
  port: number;
  /** The store open: its file, or host/database of a server (never a password). */
  storeName: string;
  server: Server;
  close(): Promise<void>;
}

interface Context {
  service: Service;
  staticDir: string;
  token: string;
  maxBodyBytes: number;
  maxUploadBytes: number;
  port: () => number;
  onUnexpected: (context: string, error: unknown) => void;
}

const valueError = (code: string, message: string): { ok: false; error: ApiError } => ({ ok: false, error: { code, message, path: '' } });

/** Only our own host names: a page on another name that resolves to 127.0.0.1 (DNS rebinding) is refused. */
function knownHost(req: IncomingMessage, port: number): boolean {
  return req.headers.host === `${WEB_HOST}:${port}` || req.headers.host === `localhost:${port}`;
}

/** A browser names the page that sent a POST; anything but this server is refused. */
function foreignOrigin(req: IncomingMessage, port: number): boolean {
  const origin = req.headers.origin;
  return origin !== undefined && origin !== `http://${WEB_HOST}:${port}` && origin !== `http://localhost:${port}`;
}

/** Answers 413 and closes the connection once the answer is out: the rest of the body is never read. */
function refuseBody(req: IncomingMessage, res: ServerResponse, error: ApiError): void {
  res.setHeader('connection', 'close');
  res.once('finish', () => req.socket.destroy());
  sendJson(res, 413, { ok: false, error });
}

async function callApi(ctx: Context, req: IncomingMessage, res: ServerResponse, method: string): Promise<void> {
  if (!(req.headers['content-type'] ?? '').toLowerCase().startsWith('application/json')) {
    return sendJson(res, 415, valueError('unsupported-media-type', 'send the input as application/json'));
  }
  if (foreignOrigin(req, ctx.port())) return sendJson(res, 403, valueError('foreign-origin', 'calls from other sites are refused'));
  const body = await readJsonBody(req, ctx.maxBodyBytes);
  if (!body.ok && body.status === 413) return refuseBody(req, res, body.error);
  if (!body.ok) return sendJson(res, body.status, { ok: false, error: body.error });
  const result = await dispatch(ctx.service.handlers, method, body.value, { onUnexpected: (m, e) => ctx.onUnexpected(`api:${m}`, e) });
  const status = !result.ok && result.error.code === 'unknown-method' ? 404 : 200;
  sendJson(res, status, result);
}

async function routeApi(ctx: Context, req: IncomingMessage, res: ServerResponse, pathname: string): Promise<void> {
  if (pathname === '/api/health' && req.method === 'GET') return sendJson(res, 200, { ok: true, value: { status: 'ok' } });
  if (req.method !== 'POST') return sendJson(res, 405, valueError('method-not-allowed', 'API methods are called with POST'));
  let method: string;
  try {
    method = decodeURIComponent(pathname.slice('/api/'.length));
  } catch {
    return sendJson(res, 404, valueError('unknown-method', 'no such API method'));
  }
  return callApi(ctx, req, res, method);
}

/** `/?token=…` swaps the token in the address for the cookie, then shows the app without it. */
function acceptToken(ctx: Context, res: ServerResponse, given: string): void {
  if (!sameToken(given, ctx.token)) return sendText(res, 401, 'wrong token');
  res.writeHead(303, { location: '/', 'set-cookie': sessionCookie(ctx.token), 'cache-control': 'no-store' });
  res.end();
}

async function route(ctx: Context, req: IncomingMessage, res: ServerResponse): Promise<void> {
  if (!knownHost(req, ctx.port())) return sendText(res, 421, 'unknown host');
  const raw = req.url ?? '/';
  const query = raw.indexOf('?');
  const pathname = query < 0 ? raw : raw.slice(0, query);
  const given = new URLSearchParams(query < 0 ? '' : raw.slice(query + 1)).get('token');
  if (pathname === '/' && given !== null && req.method === 'GET') return acceptToken(ctx, res, given);
  const isApi = pathname.startsWith('/api/');
  if (!isAuthorized(req, ctx.token)) {
    return isApi ? sendJson(res, 401, valueError('unauthorized', 'open the address printed by "npm run web" first')) : sendText(res, 401, 'unauthorized');
  }
  if (isApi) return routeApi(ctx, req, res, pathname);
  if (pathname === BACKUP_ROUTE && req.method === 'GET') return sendBackup(ctx.service, res, new Date().toISOString().slice(0, 10));
  if (pathname === IMPORT_ROUTE) {
    if (req.method !== 'POST') return sendJson(res, 405, valueError('method-not-allowed', 'an import is sent with POST'));
    if (foreignOrigin(req, ctx.port())) return sendJson(res, 403, valueError('foreign-origin', 'calls from other sites are refused'));
    return receiveImport(ctx.service, req, res, ctx.maxUploadBytes);
  }
  if (pathname === EXPORT_ROUTE && req.method === 'GET') return sendExport(ctx.service, req, res, new Date().toISOString().slice(0, 10));
  if (pathname === RESTORE_ROUTE) {
    if (req.method !== 'POST') return sendJson(res, 405, valueError('method-not-allowed', 'a restore is sent with POST'));
    if (foreignOrigin(req, ctx.port())) return sendJson(res, 403, valueError('foreign-origin', 'calls from other sites are refused'));
    return receiveRestore(ctx.service, req, res, ctx.maxUploadBytes);
  }
  if (req.method !== 'GET' && req.method !== 'HEAD') return sendText(res, 405, 'method not allowed');
  return sendFile(res, ctx.staticDir, pathname, req.method === 'HEAD');
}

function listen(server: Server, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, WEB_HOST, () => {
      server.off('error', reject);
      resolve((server.address() as AddressInfo).port);
    });
  });
}

function openService(options: WebServerOptions, onNotice: (text: string) => void): Service {
  const pending = pendingLargeUpdate(options.choice && options.named === false
    ? options.choice.remembered()?.location ?? options.dbFile : options.dbFile);
  if (pending) {
    const { headline, detail } = updateNoticeText(pending);
    onNotice(`${headline}: ${detail.join(' ')}`);
  }
  const opened = options.choice && options.named === false
    ? openStartingStore(undefined, options.choice, options.dbFile, options.openOptions)
    : openShopStoreAt(options.dbFile, options.openOptions);
  if (!opened.ok) throw Object.assign(new Error(opened.error.message), { code: opened.error.code });
  if (opened.value.notice) onNotice(opened.value.notice);
  return createService(opened.value.store, {}, options.choice);
}

/**
 * The loopback web transport: the built UI and `POST /api/<method>` on 127.0.0.1 only, behind a
 * per-run token. Every API outcome is an ApiResult value, as over IPC.
 */
export async function startWebServer(options: WebServerOptions): Promise<WebServer> {
  const service = openService(options, options.onNotice ?? ((text) => console.warn(text)));
  let port = 0;
  const ctx: Context = {
    service,
    staticDir: options.staticDir,
    token: options.token ?? newToken(),
    maxBodyBytes: options.maxBodyBytes ?? 5_000_000,
    maxUploadBytes: options.maxUploadBytes ?? 2 * 1024 ** 3,
    port: () => port,
    onUnexpected: options.onUnexpected ?? ((context, e) => console.error(`[${context}]`, e)),
  };
  const server = createServer((req, res) => {
    route(ctx, req, res).catch((e: unknown) => {
      ctx.onUnexpected('web', e);
      if (!res.headersSent) sendJson(res, 500, valueError('unexpected', 'the server failed to answer'));
      else res.destroy();
    });
  });
  try {
    port = await listen(server, options.port ?? 0);
  } catch (e) {
    service.close();
    throw e;
  }
  return {
    url: `http://${WEB_HOST}:${port}/?token=${ctx.token}`,
    storeName: service.store().file,
    token: ctx.token,
    port,
    server,
    close: () => new Promise<void>((resolve) => {
      server.closeAllConnections();
      server.close(() => {
        service.close();
        resolve();
      });
    }),
  };
}
