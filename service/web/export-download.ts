import type { IncomingMessage, ServerResponse } from 'node:http';
import { exportJobsSchema } from '../../core/api/store';
import { zodErrors } from '../../core/validation';
import type { Service } from '../api';
import { writeExport } from '../../db';
import { sendJson } from './respond';

/**
 * GET /files/export?format=json|csv[&status=…]: the job export as a download, written into the response
 * a chunk of jobs at a time (the server never holds the whole file). `x-job-count` tells the page how many
 * jobs are coming, so it can show how far the download is; the page cancels by dropping the request,
 * which stops the export at its next chunk.
 */
export const EXPORT_ROUTE = '/files/export';

function queryOf(url: string): Record<string, string> {
  const at = url.indexOf('?');
  return Object.fromEntries(new URLSearchParams(at < 0 ? '' : url.slice(at + 1)));
}

export async function sendExport(service: Service, req: IncomingMessage, res: ServerResponse, today: string): Promise<void> {
  const parsed = exportJobsSchema.safeParse(queryOf(req.url ?? ''));
  if (!parsed.success) return sendJson(res, 400, { ok: false, error: { code: 'invalid-input', message: 'format must be json or csv', path: 'format', details: zodErrors(parsed.error) } });
  const { format, status } = parsed.data;
  const stop = new AbortController();
  res.once('close', () => stop.abort());
  let total = 0;
  const start = () => {
    if (res.headersSent) return;
    res.writeHead(200, {
      'content-type': format === 'csv' ? 'text/csv; charset=utf-8' : 'application/json; charset=utf-8',
      'content-disposition': `attachment; filename="coilwright-jobs-${today}.${format}"`,
      'x-job-count': String(total), 'cache-control': 'no-store', 'x-content-type-options': 'nosniff',
    });
  };
  const sink = {
    write: (text: string) => new Promise<void>((resolve) => {
      start();
      if (stop.signal.aborted || res.write(text)) return resolve();
      const done = () => { res.off('drain', done); res.off('close', done); resolve(); };
      res.on('drain', done);
      res.on('close', done);
    }),
  };
  try {
    await writeExport(service.store(), { format, status }, sink, { signal: stop.signal, onProgress: (_done, all) => { total = all; } });
    res.end();
  } catch (e) {
    if (!res.headersSent) return sendJson(res, 500, { ok: false, error: { code: 'export-failed', message: (e as Error).message, path: '' } });
    res.destroy();
  }
}
