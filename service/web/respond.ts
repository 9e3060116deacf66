import { createReadStream } from 'node:fs';
import type { ServerResponse } from 'node:http';
import { uiHeaders } from '../host/csp';
import { resolveStaticFile } from '../host/static-files';

export function sendJson(res: ServerResponse, status: number, value: unknown): void {
  const body = JSON.stringify(value);
  res.writeHead(status, {
    ...uiHeaders,
    'content-type': 'application/json; charset=utf-8',
    'content-length': Buffer.byteLength(body),
    'cache-control': 'no-store',
  });
  res.end(body);
}

export function sendText(res: ServerResponse, status: number, text: string): void {
  res.writeHead(status, { ...uiHeaders, 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store' });
  res.end(text);
}

/** A file of the built UI (GET or HEAD), under the same guard and CSP as the app:// protocol. */
export async function sendFile(res: ServerResponse, root: string, pathname: string, headOnly: boolean): Promise<void> {
  const found = await resolveStaticFile(root, pathname);
  if (!found.ok) return sendText(res, found.status, found.status === 404 ? 'not found' : 'refused');
  const html = found.contentType.startsWith('text/html');
  res.writeHead(200, { ...uiHeaders, 'content-type': found.contentType, 'cache-control': html ? 'no-cache' : 'max-age=300' });
  if (headOnly) {
    res.end();
    return;
  }
  await new Promise<void>((resolve, reject) => {
    const stream = createReadStream(found.file);
    stream.on('error', reject);
    stream.on('end', resolve);
    stream.pipe(res);
  });
}
