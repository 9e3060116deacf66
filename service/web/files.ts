import { createReadStream, createWriteStream, mkdtempSync, rmSync, statSync } from 'node:fs';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { ApiError } from '../../core/api';
import type { Service } from '../api';
import { sendJson } from './respond';

/**
 * Backup and restore in the web transport, as a browser does files: the backup is a download and a
 * restore is an upload of the file the user picked. No request names a path on this computer.
 */
export const BACKUP_ROUTE = '/files/backup';
export const RESTORE_ROUTE = '/files/restore';

const fail = (code: string, message: string): { ok: false; error: ApiError } => ({ ok: false, error: { code, message, path: '' } });

export function tempFolder(): { dir: string; done(): void } {
  const dir = mkdtempSync(path.join(tmpdir(), 'coilwright-web-'));
  return { dir, done: () => rmSync(dir, { recursive: true, force: true }) };
}

/** GET /files/backup: a consistent backup of the store, sent as a file to keep. */
export async function sendBackup(service: Service, res: ServerResponse, today: string): Promise<void> {
  const temp = tempFolder();
  const name = `coilwright-backup-${today}.db`;
  const file = path.join(temp.dir, name);
  const made = await service.files.run('backup', { file });
  if (!made.ok) {
    temp.done();
    return sendJson(res, 409, made);
  }
  res.writeHead(200, {
    'content-type': 'application/vnd.sqlite3', 'content-length': statSync(file).size,
    'content-disposition': `attachment; filename="${name}"`, 'cache-control': 'no-store', 'x-content-type-options': 'nosniff',
  });
  await new Promise<void>((resolve) => {
    const stream = createReadStream(file);
    stream.on('close', resolve);
    stream.on('error', () => { res.destroy(); resolve(); });
    stream.pipe(res);
  }).finally(() => temp.done());
}

/** Streams the body into `file`, at most `limit` bytes; false (and reading stopped) when it is larger. */
export function receive(req: IncomingMessage, file: string, limit: number): Promise<boolean> {
  return new Promise((resolve, reject) => {
    const out = createWriteStream(file);
    let size = 0;
    const onData = (chunk: Buffer) => {
      size += chunk.length;
      if (size <= limit) return;
      req.off('data', onData);
      req.unpipe(out);
      req.pause();
      out.destroy();
      resolve(false);
    };
    req.on('data', onData);
    req.pipe(out);
    out.on('finish', () => resolve(true));
    out.on('error', reject);
    req.on('error', reject);
  });
}

/** The picked file's name, as the page sent it (URI-encoded), for the answer only; never used as a path. */
export function uploadedName(header: string | string[] | undefined): string {
  if (typeof header !== 'string') return 'the uploaded backup';
  try {
    return decodeURIComponent(header).slice(0, 255);
  } catch {
    return 'the uploaded backup';
  }
}

/**
 * POST /files/restore with the backup file as the body (application/octet-stream). The browser's file
 * picker is where the user chose it; the Data screen asks before it sends. Over the limit: 413, no more read.
 */
export async function receiveRestore(service: Service, req: IncomingMessage, res: ServerResponse, limit: number): Promise<void> {
  if (!(req.headers['content-type'] ?? '').toLowerCase().startsWith('application/octet-stream')) {
    return sendJson(res, 415, fail('unsupported-media-type', 'send the backup file as application/octet-stream'));
  }
  const temp = tempFolder();
  try {
    const file = path.join(temp.dir, 'uploaded-backup.db');
    const declared = Number(req.headers['content-length']);
    if ((Number.isFinite(declared) && declared > limit) || !(await receive(req, file, limit))) {
      res.setHeader('connection', 'close');
      res.once('finish', () => req.socket.destroy());
      return sendJson(res, 413, fail('body-too-large', `a backup over ${limit} bytes cannot be uploaded here; restore it with "db restore" on this computer`));
    }
    const name = uploadedName(req.headers['x-file-name']);
    const restored = await service.files.run('restore', { file });
    sendJson(res, 200, restored.ok ? { ok: true, value: { ...restored.value, restoredFrom: name } } : restored);
  } finally {
    temp.done();
  }
}
