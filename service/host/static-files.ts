import { realpath, stat } from 'node:fs/promises';
import path from 'node:path';

const contentTypes: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.ttf': 'font/ttf',
  '.txt': 'text/plain; charset=utf-8',
};

export function contentTypeOf(file: string): string {
  return contentTypes[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
}

export type StaticLookup =
  | { ok: true; file: string; contentType: string }
  | { ok: false; status: 400 | 403 | 404 };

function decode(pathname: string): string | null {
  try {
    const decoded = decodeURIComponent(pathname);
    // A backslash or NUL has no business in a UI path; on Windows a backslash would be a separator.
    return /[\\\0]/.test(decoded) ? null : decoded;
  } catch {
    return null;
  }
}

const isInside = (root: string, file: string): boolean => file === root || file.startsWith(root + path.sep);

async function existingFile(file: string): Promise<boolean> {
  try {
    return (await stat(file)).isFile();
  } catch {
    return false;
  }
}

/** The real path of an existing file, if it (after symlinks) is still inside root. */
async function contained(root: string, file: string): Promise<StaticLookup> {
  if (!(await existingFile(file))) return { ok: false, status: 404 };
  const [realRoot, realFile] = await Promise.all([realpath(root), realpath(file)]);
  if (!isInside(realRoot, realFile)) return { ok: false, status: 403 };
  return { ok: true, file: realFile, contentType: contentTypeOf(realFile) };
}

/**
 * Maps a URL path (still percent-encoded) to a file under root. Anything resolving outside root is 403,
 * whether written as "../", "%2e%2e/" or "..%2f". A missing path without a file extension is a route
 * of the single-page UI and gets index.html.
 */
export async function resolveStaticFile(root: string, pathname: string): Promise<StaticLookup> {
  const decoded = decode(pathname);
  if (decoded === null) return { ok: false, status: 400 };
  const base = path.resolve(root);
  const relative = decoded.replace(/^\/+/, '') || 'index.html';
  const file = path.resolve(base, relative);
  if (!isInside(base, file)) return { ok: false, status: 403 };
  const found = await contained(base, file);
  if (found.ok || found.status === 403) return found;
  if (path.extname(relative) !== '') return found;
  return contained(base, path.join(base, 'index.html'));
}
