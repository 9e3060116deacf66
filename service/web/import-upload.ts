import type { IncomingMessage, ServerResponse } from 'node:http';
import path from 'node:path';
import type { Service } from '../api';
import { receive, tempFolder, uploadedName } from './files';
import { sendJson } from './respond';

/**
 * POST /files/import?format=json|csv[&renumber=1] with the picked file as the body: the file is kept in a
 * temporary folder, then imported streamed, all or nothing. The answer is JSON lines: `{"progress":[done,
 * total]}` (bytes of the file imported) as the import goes, then the result `{"ok":…}`. The page cancels by
 * dropping the request; the import then rolls back and nothing is imported.
 */
export const IMPORT_ROUTE = '/files/import';

const PROGRESS_MS = 100;

export async function receiveImport(service: Service, req: IncomingMessage, res: ServerResponse, limit: number): Promise<void> {
  const query = new URLSearchParams((req.url ?? '').split('?')[1] ?? '');
  const format = query.get('format');
  if (format !== 'json' && format !== 'csv') {
    return sendJson(res, 400, { ok: false, error: { code: 'invalid-input', message: 'format must be json or csv', path: 'format' } });
  }
  const temp = tempFolder();
  const stop = new AbortController();
  res.once('close', () => stop.abort());
  try {
    const file = path.join(temp.dir, `upload.${format}`);
    if (!(await receive(req, file, limit))) {
      res.setHeader('connection', 'close');
      return sendJson(res, 413, { ok: false, error: { code: 'body-too-large', message: `a file over ${limit} bytes cannot be uploaded here; import it with "db import" on this computer`, path: '' } });
    }
    res.writeHead(200, { 'content-type': 'application/x-ndjson; charset=utf-8', 'cache-control': 'no-store', 'x-content-type-options': 'nosniff' });
    let last = 0;
    const result = await service.files.run('importJobs', { file, format, renumber: query.get('renumber') === '1' }, {
      signal: stop.signal,
      onProgress: (done, total) => {
        const now = Date.now();
        if (now - last < PROGRESS_MS && done < total) return;
        last = now;
        res.write(`${JSON.stringify({ progress: [done, total] })}\n`);
      },
    });
    const from = uploadedName(req.headers['x-file-name']);
    res.end(`${JSON.stringify(result.ok ? { ok: true, value: { ...result.value, importedFrom: from } } : result)}\n`);
  } finally {
    temp.done();
  }
}
