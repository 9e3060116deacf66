import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../service/host/csp';
import { createPdfShelf } from '../../electron/shell/pdf-shelf';
import { pdfUrl } from '../../electron/shell/pdf-shelf';
import { appProtocolHandler, registerAppScheme } from '../../electron/shell/protocol';
import { resolveStaticFile } from '../../service/host/static-files';

let base: string;
let root: string;
const shelf = createPdfShelf();
let handle: (request: Request) => Promise<Response>;
const get = (url: string, method = 'GET') => handle(new Request(url, { method }));

beforeAll(() => {
  base = mkdtempSync(path.join(os.tmpdir(), 'cw-protocol-'));
  root = path.join(base, 'renderer');
  mkdirSync(path.join(root, 'assets'), { recursive: true });
  writeFileSync(path.join(root, 'index.html'), '<!doctype html><title>Coilwright</title>');
  writeFileSync(path.join(root, 'assets', 'app.js'), 'console.log("ui")');
  writeFileSync(path.join(base, 'secret.txt'), 'outside the UI');
  symlinkSync(path.join(base, 'secret.txt'), path.join(root, 'assets', 'link.txt'));
  handle = appProtocolHandler({ root, pdfs: shelf });
});
afterAll(() => rmSync(base, { recursive: true, force: true }));

describe('registerAppScheme', () => {
  it('registers app: as a standard, secure scheme with fetch', () => {
    const protocol = { registerSchemesAsPrivileged: vi.fn() };
    registerAppScheme(protocol);
    expect(protocol.registerSchemesAsPrivileged).toHaveBeenCalledWith([
      { scheme: 'app', privileges: expect.objectContaining({ standard: true, secure: true, supportFetchAPI: true }) },
    ]);
  });
});

describe('the app:// handler', () => {
  it('serves a file with its type and the CSP header', async () => {
    const res = await get('app://coilwright/assets/app.js');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(await res.text()).toBe('console.log("ui")');
  });

  it('uses the strict policy from the design', () => {
    expect(CONTENT_SECURITY_POLICY).toBe("default-src 'self'; script-src 'self'; img-src 'self' data:; object-src 'none'; base-uri 'none'; frame-ancestors 'none'");
  });

  it('serves index.html for the root and for routes of the UI', async () => {
    for (const url of ['app://coilwright/', 'app://coilwright/index.html', 'app://coilwright/jobs/12']) {
      const res = await get(url);
      expect(res.status, url).toBe(200);
      expect(await res.text()).toContain('<title>Coilwright</title>');
      expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    }
  });

  it('answers 404 for a missing asset rather than the page', async () => {
    expect((await get('app://coilwright/assets/missing.js')).status).toBe(404);
  });

  it('never serves a file outside the UI folder', async () => {
    for (const url of ['app://coilwright/../secret.txt', 'app://coilwright/%2e%2e/secret.txt', 'app://coilwright/..%2fsecret.txt',
      'app://coilwright/%2e%2e%2fsecret.txt', 'app://coilwright/assets/..%2f..%2fsecret.txt', 'app://coilwright/%2E%2E%5Csecret.txt',
      'app://coilwright/assets/link.txt', 'app://coilwright/%00index.html']) {
      const res = await get(url);
      const text = await res.text();
      expect(res.status, url).not.toBe(200);
      expect(text, url).not.toContain('outside the UI');
    }
  });

  it('refuses encoded traversal outright', async () => {
    expect((await get('app://coilwright/..%2fsecret.txt')).status).toBe(403);
    expect((await get('app://coilwright/assets/link.txt')).status).toBe(403);
  });

  it('refuses other hosts', async () => {
    for (const url of ['app://evil/index.html', 'app://coilwright.evil/index.html', 'app://localhost/index.html']) {
      expect((await get(url)).status, url).toBe(404);
    }
  });

  it('refuses every method but GET', async () => {
    for (const method of ['POST', 'PUT', 'DELETE', 'PATCH']) {
      expect((await get('app://coilwright/index.html', method)).status, method).toBe(405);
    }
  });

  it('serves a shelved PDF from memory and nothing for an unknown id', async () => {
    const bytes = new TextEncoder().encode('%PDF-1.7 test');
    const id = shelf.put({ bytes, fileName: 'Q-1.pdf' });
    const res = await get(pdfUrl(id, 'Q-1.pdf'));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-security-policy')).toBe("frame-ancestors 'none'");
    expect(new Uint8Array(await res.arrayBuffer())).toEqual(bytes);
    shelf.drop(id);
    expect((await get(pdfUrl(id, 'Q-1.pdf'))).status).toBe(404);
    expect((await get('app://coilwright/pdf/not-an-id/x.pdf')).status).toBe(404);
  });
});

describe('resolveStaticFile on raw (unnormalised) paths, as the web server sees them', () => {
  it('refuses ../ and its encodings', async () => {
    for (const raw of ['/../secret.txt', '/assets/../../secret.txt', '/%2e%2e/secret.txt', '/..%2fsecret.txt', '/%2E%2E/secret.txt']) {
      expect(await resolveStaticFile(root, raw), raw).toEqual({ ok: false, status: 403 });
    }
  });

  it('refuses malformed encodings and backslashes', async () => {
    expect(await resolveStaticFile(root, '/%E0%A4%A')).toEqual({ ok: false, status: 400 });
    expect(await resolveStaticFile(root, '/..\\secret.txt')).toEqual({ ok: false, status: 400 });
  });

  it('keeps harmless dot segments inside the folder working', async () => {
    const found = await resolveStaticFile(root, '/assets/../assets/app.js');
    expect(found).toMatchObject({ ok: true, contentType: 'text/javascript; charset=utf-8' });
  });
});
