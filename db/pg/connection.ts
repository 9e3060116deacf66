import { MessageChannel, Worker, receiveMessageOnPort } from 'node:worker_threads';
import type { MessagePort } from 'node:worker_threads';

/**
 * One PostgreSQL connection answered synchronously, so every store function (db/) runs unchanged on either
 * backend. The `pg` client lives in a worker thread; a call posts the statement, waits on a shared flag
 * (Atomics.wait) and takes the answer off the port. The calling thread waits for the server exactly as it
 * waits for a SQLite page read: statements of one store run one after another, as better-sqlite3's do.
 *
 * The worker is plain JavaScript loading `pg` by its resolved path, so it runs the same from the sources
 * (tests), the CLI bundle and the app bundle. Only this folder loads `pg` (eslint.config.mjs fences it).
 */
const WORKER_SOURCE = `
const { workerData } = require('node:worker_threads');
const pg = require(workerData.pgPath);
// bigint counts and ids, and numeric sums, read as numbers as SQLite gives them (ids stay far below 2^53).
pg.types.setTypeParser(20, (v) => Number(v));
pg.types.setTypeParser(1700, (v) => Number(v));
const flag = new Int32Array(workerData.flag);
const port = workerData.port;
let client;
const value = (v) => (v instanceof Uint8Array && !Buffer.isBuffer(v) ? Buffer.from(v) : v);
async function answer(m) {
  if (m.op === 'connect') {
    client = new pg.Client({ connectionString: workerData.url, application_name: 'coilwright' });
    client.on('error', () => {});
    client.on('notification', (n) => port.postMessage({ notification: { channel: n.channel, payload: n.payload } }));
    await client.connect();
    return {};
  }
  if (m.op === 'query') {
    const r = await client.query({ text: m.sql, values: m.params.map(value), rowMode: undefined });
    return { rows: r.rows, rowCount: r.rowCount ?? 0 };
  }
  if (m.op === 'close') { await client.end(); return {}; }
  throw new Error('unknown operation ' + m.op);
}
port.on('message', async (m) => {
  let reply;
  try {
    reply = { ok: true, ...(await answer(m)) };
  } catch (e) {
    reply = { ok: false, message: String(e && e.message), sqlState: e && e.code, detail: e && e.detail, constraint: e && e.constraint };
  }
  port.postMessage(reply);
  Atomics.store(flag, 0, 1);
  Atomics.notify(flag, 0);
});
`;

/** A server error as the store sees it: the message, and the SQLSTATE that says what kind of failure it is. */
export class PgError extends Error {
  constructor(message: string, readonly sqlState: string | undefined, readonly detail?: string) {
    super(message);
    this.name = 'PgError';
  }
}

interface Reply { ok: boolean; rows?: Record<string, unknown>[]; rowCount?: number; message?: string; sqlState?: string; detail?: string }

/** How long one statement may take before the store gives up on the server (it is not answering). */
const ANSWER_TIMEOUT_MS = 120_000;

export interface Notification { channel: string; payload: string }

export class SyncConnection {
  private readonly worker: Worker;
  private readonly port: MessagePort;
  private readonly flag = new Int32Array(new SharedArrayBuffer(4));
  private readonly notifications: Notification[] = [];
  private closed = false;

  constructor(url: string) {
    const channel = new MessageChannel();
    this.port = channel.port1;
    this.worker = new Worker(WORKER_SOURCE, {
      eval: true,
      workerData: { url, pgPath: require.resolve('pg'), flag: this.flag.buffer, port: channel.port2 },
      transferList: [channel.port2],
    });
    this.worker.unref();
    this.call({ op: 'connect' });
  }

  query(sql: string, params: readonly unknown[]): { rows: Record<string, unknown>[]; rowCount: number } {
    const reply = this.call({ op: 'query', sql, params });
    return { rows: (reply.rows ?? []).map(withBuffers), rowCount: reply.rowCount ?? 0 };
  }

  /** NOTIFY payloads received since the last call (LISTEN first). */
  takeNotifications(): Notification[] {
    this.drain();
    return this.notifications.splice(0);
  }

  close(): void {
    if (this.closed) return;
    try {
      this.call({ op: 'close' });
    } finally {
      this.closed = true;
      this.port.close();
      void this.worker.terminate();
    }
  }

  private drain(): Reply | undefined {
    for (;;) {
      const m = receiveMessageOnPort(this.port)?.message as (Reply & { notification?: Notification }) | undefined;
      if (m === undefined) return undefined;
      if (m.notification) this.notifications.push(m.notification);
      else return m;
    }
  }

  private call(message: Record<string, unknown>): Reply {
    if (this.closed) throw new PgError('the store is closed', '08003');
    Atomics.store(this.flag, 0, 0);
    this.port.postMessage(message);
    const waited = Atomics.wait(this.flag, 0, 0, ANSWER_TIMEOUT_MS);
    const reply = this.drain();
    if (waited === 'timed-out' || reply === undefined) throw new PgError('the PostgreSQL server did not answer in time', '08006');
    if (!reply.ok) throw new PgError(reply.message ?? 'PostgreSQL failed', reply.sqlState, reply.detail);
    return reply;
  }
}

/** bytea values cross the thread as Uint8Array; the store hands out Buffers as better-sqlite3 does. */
function withBuffers(row: Record<string, unknown>): Record<string, unknown> {
  for (const [k, v] of Object.entries(row)) {
    if (v instanceof Uint8Array && !Buffer.isBuffer(v)) row[k] = Buffer.from(v.buffer, v.byteOffset, v.byteLength);
  }
  return row;
}
