import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { Agent, request } from 'node:http';
import type { AddressInfo, Socket } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../service/host/csp';
import { startWebServer } from '../../service/web/server';
import type { WebServer } from '../../service/web/server';
import { parseWebArgs } from '../../service/web/main';
import { valveSpringMetric } from '../fixtures/specs';

let dir: string;
let web: WebServer;
let small: WebServer;
let cookie: string;

/** A raw request: fetch would normalise "../" away and refuses to set Host, which these tests need. */
function raw(server: WebServer, options: { path: string; method?: string; headers?: Record<string, string>; body?: string | Buffer; chunked?: boolean }) {
  return new Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }>((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port: server.port, path: options.path, method: options.method ?? 'GET', headers: options.headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString('utf8') }));
    });
    req.on('error', reject);
    if (options.chunked && options.body) {
      const body = Buffer.from(options.body);
      for (let i = 0; i < body.length; i += 1000) req.write(body.subarray(i, i + 1000));
      req.end();
    } else {
      req.end(options.body);
    }
  });
}

const api = (method: string, body: unknown, headers: Record<string, string> = {}) =>
  fetch(`http://127.0.0.1:${web.port}/api/${method}`, {
    method: 'POST', headers: { 'content-type': 'application/json', cookie, ...headers }, body: JSON.stringify(body),
  });

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-web-'));
  const staticDir = path.join(dir, 'renderer');
  mkdirSync(path.join(staticDir, 'assets'), { recursive: true });
  writeFileSync(path.join(staticDir, 'index.html'), '<!doctype html><title>Coilwright</title>');
  writeFileSync(path.join(staticDir, 'assets', 'app.js'), 'console.log("ui")');
  writeFileSync(path.join(dir, 'secret.txt'), 'outside the UI');
  web = await startWebServer({ dbFile: path.join(dir, 'shop', 'coilwright.db'), staticDir });
  small = await startWebServer({ dbFile: path.join(dir, 'small.db'), staticDir, maxBodyBytes: 2000, token: 'fixed-token-for-this-test' });
  const res = await fetch(web.url, { redirect: 'manual' });
  cookie = (res.headers.get('set-cookie') ?? '').split(';')[0]!;
});

afterAll(async () => {
  await web?.close();
  await small?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the loopback web transport', () => {
  it('listens on 127.0.0.1 only and prints the token URL', () => {
    const address = web.server.address() as AddressInfo;
    expect(address.address).toBe('127.0.0.1');
    expect(address.family).toBe('IPv4');
    expect(address.port).toBe(web.port);
    expect(web.port).toBeGreaterThan(0);
    expect(web.url).toBe(`http://127.0.0.1:${web.port}/?token=${web.token}`);
    expect(web.token).toMatch(/^[0-9a-f]{48}$/);
  });

  it('makes a new token per run unless one is given', () => {
    expect(web.token).not.toBe(small.token);
    expect(small.token).toBe('fixed-token-for-this-test');
  });

  it('answers 401 to static files and the API without the token', async () => {
    for (const p of ['/', '/index.html', '/assets/app.js', '/jobs/3']) {
      expect((await fetch(`http://127.0.0.1:${web.port}${p}`)).status, p).toBe(401);
    }
    const res = await fetch(`http://127.0.0.1:${web.port}/api/calculate`, {
      method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ spec: valveSpringMetric }),
    });
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ ok: false, error: { code: 'unauthorized' } });
    expect((await fetch(`http://127.0.0.1:${web.port}/api/health`)).status).toBe(401);
  });

  it('refuses a wrong token, in the URL, the cookie or the header', async () => {
    expect((await fetch(`http://127.0.0.1:${web.port}/?token=nope`, { redirect: 'manual' })).status).toBe(401);
    expect((await fetch(`http://127.0.0.1:${web.port}/`, { headers: { cookie: 'cw_token=nope' } })).status).toBe(401);
    expect((await fetch(`http://127.0.0.1:${web.port}/`, { headers: { 'x-coilwright-token': web.token.slice(1) } })).status).toBe(401);
  });

  it('swaps the token in the URL for an HttpOnly, SameSite=Strict cookie', async () => {
    const res = await fetch(web.url, { redirect: 'manual' });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe('/');
    expect(res.headers.get('set-cookie')).toBe(`cw_token=${web.token}; HttpOnly; SameSite=Strict; Path=/`);
    const page = await fetch(`http://127.0.0.1:${web.port}/`, { headers: { cookie } });
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<title>Coilwright</title>');
  });

  it('serves the UI with the app’s CSP, and index.html for routes', async () => {
    const js = await fetch(`http://127.0.0.1:${web.port}/assets/app.js`, { headers: { cookie } });
    expect(js.status).toBe(200);
    expect(js.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(js.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    const route = await fetch(`http://127.0.0.1:${web.port}/jobs/3`, { headers: { cookie } });
    expect(await route.text()).toContain('<title>Coilwright</title>');
    expect(route.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect((await fetch(`http://127.0.0.1:${web.port}/assets/missing.js`, { headers: { cookie } })).status).toBe(404);
  });

  it('never serves a file outside the UI folder', async () => {
    for (const p of ['/../secret.txt', '/assets/../../secret.txt', '/%2e%2e/secret.txt', '/..%2fsecret.txt', '/assets/..%2f..%2fsecret.txt']) {
      const res = await raw(web, { path: p, headers: { cookie } });
      expect(res.status, p).toBe(403);
      expect(res.body).not.toContain('outside the UI');
    }
  });

  it('serves static files to GET and HEAD only', async () => {
    expect((await raw(web, { path: '/index.html', method: 'HEAD', headers: { cookie } })).status).toBe(200);
    expect((await raw(web, { path: '/index.html', method: 'POST', headers: { cookie } })).status).toBe(405);
    expect((await raw(web, { path: '/index.html', method: 'DELETE', headers: { cookie } })).status).toBe(405);
  });

  it('refuses host names other than its own (DNS rebinding)', async () => {
    const res = await raw(web, { path: '/', headers: { cookie, host: 'attacker.example' } });
    expect(res.status).toBe(421);
    expect((await raw(web, { path: '/', headers: { cookie, host: `localhost:${web.port}` } })).status).toBe(200);
  });

  it('answers GET /api/health with the token', async () => {
    const res = await fetch(`http://127.0.0.1:${web.port}/api/health`, { headers: { 'x-coilwright-token': web.token } });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true, value: { status: 'ok' } });
  });

  it('runs POST /api/calculate with the cookie, exactly as the renderer calls it', async () => {
    const res = await api('calculate', { spec: valveSpringMetric });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/json; charset=utf-8');
    const body = await res.json() as { ok: boolean; value: { kind: string; wireDiameter: number } };
    expect(body.ok).toBe(true);
    expect(body.value.kind).toBe('compression');
    expect(body.value.wireDiameter).toBe(2);
  });

  it('accepts the header token instead of the cookie', async () => {
    const res = await fetch(`http://127.0.0.1:${web.port}/api/listGrades`, {
      method: 'POST', headers: { 'content-type': 'application/json', 'x-coilwright-token': web.token }, body: '{}',
    });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ ok: true });
  });

  it('opens the store once, with the demo shop on first run', async () => {
    const body = await (await api('listJobs', {})).json() as { ok: boolean; value: { total: number } };
    expect(body.ok).toBe(true);
    expect(body.value.total).toBeGreaterThan(0);
  });

  it('gives invalid input back as a value with HTTP 200 and the field path', async () => {
    const res = await api('manufacturingPlan', { spec: valveSpringMetric, orderQuantity: -5 });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ ok: false, error: { path: 'orderQuantity', code: 'invalid-too-small' } });
    const badSpec = await (await api('calculate', { spec: { ...valveSpringMetric, wireDiameter: -1 } })).json() as { ok: boolean; error: { path: string } };
    expect(badSpec.ok).toBe(false);
    expect(badSpec.error.path).toContain('wireDiameter');
  });

  it('answers bad JSON with 400 and an invalid-json value', async () => {
    const res = await fetch(`http://127.0.0.1:${web.port}/api/calculate`, {
      method: 'POST', headers: { 'content-type': 'application/json', cookie }, body: '{"spec": ',
    });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ ok: false, error: { code: 'invalid-json', path: '' } });
  });

  it('answers bodies over the limit with 413, whether declared or streamed', async () => {
    const big = JSON.stringify({ spec: { notes: 'x'.repeat(5000) } });
    const declared = await raw(small, { path: '/api/calculate', method: 'POST', body: big,
      headers: { 'content-type': 'application/json', 'x-coilwright-token': small.token } });
    expect(declared.status).toBe(413);
    expect(JSON.parse(declared.body)).toMatchObject({ ok: false, error: { code: 'body-too-large' } });
    const streamed = await raw(small, { path: '/api/calculate', method: 'POST', body: big, chunked: true,
      headers: { 'content-type': 'application/json', 'x-coilwright-token': small.token, 'transfer-encoding': 'chunked' } });
    expect(streamed.status).toBe(413);
    const fine = await raw(small, { path: '/api/listGrades', method: 'POST', body: '{}',
      headers: { 'content-type': 'application/json', 'x-coilwright-token': small.token } });
    expect(fine.status).toBe(200);
  });

  it('stops reading a body as soon as it answers 413, closing the connection', async () => {
    let serverSide: Socket | undefined;
    small.server.once('connection', (socket: Socket) => { serverSide = socket; });
    const status = await new Promise<number>((resolve) => {
      let answered = 0;
      const chunk = Buffer.alloc(16 * 1024, 0x20);
      const req = request({ host: '127.0.0.1', port: small.port, path: '/api/calculate', method: 'POST', agent: new Agent({ keepAlive: true }),
        headers: { 'content-type': 'application/json', 'x-coilwright-token': small.token, 'transfer-encoding': 'chunked' } }, (res) => {
        answered = res.statusCode ?? 0;
        res.resume();
      });
      req.on('error', () => undefined);
      const pump = (): void => {
        if (req.destroyed) return;
        if (req.write(chunk)) setImmediate(pump);
        else req.once('drain', pump);
      };
      req.on('socket', (socket) => {
        socket.on('close', () => resolve(answered));
        pump();
      });
    });
    expect(status).toBe(413);
    // The limit is 2000 bytes; a server that drains the rest of an endless body reads megabytes before it
    // gives up. One socket buffer past the limit is all a server that stops at once can have taken in.
    expect(serverSide!.bytesRead).toBeLessThan(512 * 1024);
  });

  it('answers 3 KB of deep nesting with a field error, not HTTP 500', async () => {
    const body = `{"jobId":1,"quantityBreaks":[],"document":{},"prices":${'['.repeat(1400)}1${']'.repeat(1400)}}`;
    expect(body.length).toBeLessThan(3100);
    const res = await fetch(`http://127.0.0.1:${web.port}/api/issueQuote`, { method: 'POST', headers: { 'content-type': 'application/json', cookie }, body });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ ok: false, error: { code: 'input-too-deep', path: 'prices' } });
  });

  it('downloads a backup and restores an uploaded one; no request names a path', async () => {
    const created = await (await api('createJob', { partNumber: 'BACKED-UP', spec: valveSpringMetric })).json();
    expect(created.ok).toBe(true);
    const download = await fetch(`http://127.0.0.1:${web.port}/files/backup`, { headers: { cookie } });
    expect(download.status).toBe(200);
    expect(download.headers.get('content-disposition')).toMatch(/^attachment; filename="coilwright-backup-\d{4}-\d{2}-\d{2}\.db"$/);
    const bytes = Buffer.from(await download.arrayBuffer());
    expect(bytes.subarray(0, 15).toString()).toBe('SQLite format 3');
    await api('createJob', { partNumber: 'AFTER-BACKUP', spec: valveSpringMetric });
    const restored = await fetch(`http://127.0.0.1:${web.port}/files/restore`, {
      method: 'POST', headers: { cookie, 'content-type': 'application/octet-stream', 'x-file-name': 'shop%20backup.db' }, body: bytes,
    });
    expect(await restored.json()).toMatchObject({ ok: true, value: { restoredFrom: 'shop backup.db' } });
    const list = await (await api('findJobs', { text: 'AFTER-BACKUP' })).json();
    expect(list).toEqual({ ok: true, value: [] });
    const notStore = await fetch(`http://127.0.0.1:${web.port}/files/restore`, {
      method: 'POST', headers: { cookie, 'content-type': 'application/octet-stream' }, body: '/etc/passwd',
    });
    expect((await notStore.json()).ok).toBe(false);
    const foreign = await fetch(`http://127.0.0.1:${web.port}/files/restore`, {
      method: 'POST', headers: { cookie, origin: 'https://evil.example', 'content-type': 'application/octet-stream' }, body: bytes,
    });
    expect(foreign.status).toBe(403);
    expect((await fetch(`http://127.0.0.1:${web.port}/files/backup`)).status).toBe(401);
  });

  it('streams the job export as a download with the job count, and refuses a bad format', async () => {
    const jobs = (await (await api('listJobs', { limit: 200 })).json()).value.jobs.length as number;
    const csv = await fetch(`http://127.0.0.1:${web.port}/files/export?format=csv`, { headers: { cookie } });
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-disposition')).toMatch(/^attachment; filename="coilwright-jobs-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(Number(csv.headers.get('x-job-count'))).toBeGreaterThanOrEqual(jobs);
    const text = await csv.text();
    expect(text.startsWith('number,customer,')).toBe(true);
    const json = await (await fetch(`http://127.0.0.1:${web.port}/files/export?format=json&status=draft`, { headers: { cookie } })).json();
    expect(json.format).toBe('coilwright-jobs');
    expect(json.jobs.every((j: { status: string }) => j.status === 'draft')).toBe(true);
    expect((await fetch(`http://127.0.0.1:${web.port}/files/export?format=xls`, { headers: { cookie } })).status).toBe(400);
    expect((await fetch(`http://127.0.0.1:${web.port}/files/export?format=csv`)).status).toBe(401);
  });

  it('imports an uploaded file streamed, answering progress lines and then the result; all or nothing', async () => {
    const exported = await (await fetch(`http://127.0.0.1:${web.port}/files/export?format=json`, { headers: { cookie } })).text();
    const send = (body: string, query: string) => fetch(`http://127.0.0.1:${web.port}/files/import?${query}`, {
      method: 'POST', headers: { cookie, 'content-type': 'application/octet-stream', 'x-file-name': 'jobs%20from%20shop.json' }, body,
    });
    const answer = await send(exported, 'format=json&renumber=1');
    expect(answer.headers.get('content-type')).toMatch(/^application\/x-ndjson/);
    const lines = (await answer.text()).trim().split('\n').map((l) => JSON.parse(l));
    const result = lines.pop();
    expect(lines.every((l) => Array.isArray(l.progress))).toBe(true);
    expect(result).toMatchObject({ ok: true, value: { importedFrom: 'jobs from shop.json' } });
    expect(result.value.imported.length).toBe(JSON.parse(exported).jobs.length);
    const refused = (await (await send(exported, 'format=json')).text()).trim().split('\n').map((l) => JSON.parse(l)).pop();
    expect(refused).toMatchObject({ ok: false, error: { code: 'duplicate-number' } });
    expect((await send(exported, 'format=xml')).status).toBe(400);
  });

  it('answers an unknown method with 404 and dispatch’s value', async () => {
    for (const name of ['launchRocket', '__proto__', 'constructor', 'toString']) {
      const res = await api(name, {});
      expect(res.status, name).toBe(404);
      expect(await res.json()).toMatchObject({ ok: false, error: { code: 'unknown-method' } });
    }
  });

  it('calls methods with POST only', async () => {
    const res = await fetch(`http://127.0.0.1:${web.port}/api/listGrades`, { headers: { cookie } });
    expect(res.status).toBe(405);
    expect(await res.json()).toMatchObject({ ok: false, error: { code: 'method-not-allowed' } });
  });

  it('refuses what a form on another site could send', async () => {
    const form = await api('listGrades', {}, { 'content-type': 'text/plain' });
    expect(form.status).toBe(415);
    const foreign = await raw(web, { path: '/api/listGrades', method: 'POST', body: '{}',
      headers: { 'content-type': 'application/json', cookie, origin: 'https://attacker.example' } });
    expect(foreign.status).toBe(403);
    const own = await api('listGrades', {}, { origin: `http://127.0.0.1:${web.port}` });
    expect(own.status).toBe(200);
  });
});

describe('starting the web transport', () => {
  it('refuses a file that is not a store, leaving it as it was', async () => {
    const file = path.join(dir, 'notes.db');
    writeFileSync(file, 'not a database');
    await expect(startWebServer({ dbFile: file, staticDir: dir })).rejects.toThrow(/not a Coilwright store/);
  });

  it('reads --port, --db and --static, defaulting to ~/.coilwright/coilwright.db and dist/renderer', () => {
    const defaults = { home: '/home/shop', cwd: '/src/coilwright' };
    expect(parseWebArgs([], defaults)).toEqual({
      port: 0, dbFile: path.join('/home/shop', '.coilwright', 'coilwright.db'), named: false, appDir: path.join('/home/shop', '.coilwright'),
      staticDir: path.join('/src/coilwright', 'dist', 'renderer'),
    });
    expect(parseWebArgs(['--app-dir', '/srv/desk'], defaults)).toMatchObject({ dbFile: path.resolve('/srv/desk/coilwright.db'), named: false });
    expect(parseWebArgs(['--port', '8123', '--db', '/data/shop.db'], defaults)).toMatchObject({ port: 8123, dbFile: path.resolve('/data/shop.db') });
    expect(parseWebArgs(['--port', '99999'], defaults)).toMatch(/bad option --port/);
    expect(parseWebArgs(['--port'], defaults)).toMatch(/--port needs a value/);
    expect(parseWebArgs(['--host', '0.0.0.0'], defaults)).toMatch(/unknown or bad option --host/);
  });
});
