import { readFile } from 'node:fs/promises';
import type { Protocol } from 'electron';
import { pdfHeaders, uiHeaders } from '../../service/host/csp';
import { APP_HOST, APP_SCHEME } from './origin';
import type { PdfShelf } from './pdf-shelf';
import { PDF_PATH_PREFIX, pdfIdOf } from './pdf-shelf';
import { resolveStaticFile } from '../../service/host/static-files';

/** Must run before the app is ready: app:// behaves like https (relative URLs, fetch, a secure context). */
export function registerAppScheme(protocol: Pick<Protocol, 'registerSchemesAsPrivileged'>): void {
  protocol.registerSchemesAsPrivileged([
    { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, stream: true } },
  ]);
}

export interface AppProtocolOptions {
  /** The built renderer (dist/renderer). */
  root: string;
  pdfs: PdfShelf;
}

const refusal = (status: number, text: string): Response =>
  new Response(text, { status, headers: { ...uiHeaders, 'content-type': 'text/plain; charset=utf-8' } });

function servePdf(pdfs: PdfShelf, pathname: string): Response {
  const id = pdfIdOf(pathname);
  const pdf = id === null ? undefined : pdfs.get(id);
  if (!pdf) return refusal(404, 'no such document');
  return new Response(new Uint8Array(pdf.bytes), { status: 200, headers: { ...pdfHeaders, 'content-type': 'application/pdf' } });
}

async function serveFile(root: string, pathname: string): Promise<Response> {
  const found = await resolveStaticFile(root, pathname);
  if (!found.ok) return refusal(found.status, found.status === 404 ? 'not found' : 'refused');
  const body = await readFile(found.file);
  return new Response(new Uint8Array(body), { status: 200, headers: { ...uiHeaders, 'content-type': found.contentType } });
}

/** The handler for protocol.handle('app', …): GET only, host coilwright only, files under root only. */
export function appProtocolHandler(options: AppProtocolOptions): (request: Request) => Promise<Response> {
  return async (request) => {
    if (request.method !== 'GET') return refusal(405, 'method not allowed');
    const url = new URL(request.url);
    if (url.protocol !== `${APP_SCHEME}:` || url.host !== APP_HOST) return refusal(404, 'unknown host');
    if (url.pathname.startsWith(PDF_PATH_PREFIX)) return servePdf(options.pdfs, url.pathname);
    return serveFile(options.root, url.pathname);
  };
}
