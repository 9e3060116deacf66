import type { IncomingMessage } from 'node:http';
import type { ApiError } from '../../core/api';

export type BodyResult = { ok: true; value: unknown } | { ok: false; status: 400 | 413; error: ApiError };

const tooLarge = (limit: number): BodyResult => ({
  ok: false, status: 413, error: { code: 'body-too-large', message: `the request body is over ${limit} bytes`, path: '' },
});

function collect(req: IncomingMessage, limit: number): Promise<Buffer | null> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    const onData = (chunk: Buffer) => {
      size += chunk.length;
      if (size > limit) {
        chunks.length = 0;
        req.off('data', onData);
        req.pause();
        resolve(null);
      } else {
        chunks.push(chunk);
      }
    };
    req.on('data', onData);
    req.on('end', () => resolve(Buffer.concat(chunks)));
    req.on('error', reject);
  });
}

/** Reads a JSON body of at most `limit` bytes; an empty body is `undefined` (the method's schema decides). */
export async function readJsonBody(req: IncomingMessage, limit: number): Promise<BodyResult> {
  const declared = Number(req.headers['content-length']);
  if (Number.isFinite(declared) && declared > limit) return tooLarge(limit);
  const bytes = await collect(req, limit);
  if (bytes === null) return tooLarge(limit);
  if (bytes.length === 0) return { ok: true, value: undefined };
  try {
    return { ok: true, value: JSON.parse(bytes.toString('utf8')) };
  } catch (e) {
    return { ok: false, status: 400, error: { code: 'invalid-json', message: `the body is not JSON: ${(e as Error).message}`, path: '' } };
  }
}
