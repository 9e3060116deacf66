import { execFileSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * A throwaway PostgreSQL cluster for tests: initdb into a temporary folder owned by the `postgres` user
 * (tests run as root, and the server refuses to run as root), trust authentication on a free loopback port,
 * stopped with `pg_ctl stop -m immediate` and removed at the end. Never depends on a server already running.
 * Missing binaries are an error, not a skip: CI installs postgresql (.ci/run).
 */
export interface PgCluster {
  /** A connection string for a database of this cluster (created by createDatabase). */
  url(database: string): string;
  /** Creates an empty database and returns its connection string. */
  createDatabase(name: string): string;
  port: number;
  stop(): void;
}

const ROOT = '/usr/lib/postgresql';

/** The newest installed server version's bin folder (Debian keeps one folder per major version). */
export function pgBinaries(): string {
  const versions = existsSync(ROOT) ? readdirSync(ROOT).filter((v) => /^\d+$/.test(v)).sort((a, b) => Number(b) - Number(a)) : [];
  const found = versions.map((v) => join(ROOT, v, 'bin')).find((bin) => existsSync(join(bin, 'initdb')));
  if (!found) {
    throw new Error(`PostgreSQL server binaries not found under ${ROOT}/<version>/bin: install the postgresql package (CI does, see .ci/run)`);
  }
  return found;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

const asRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Runs a server binary as the postgres user when running as root. */
function runAsPostgres(bin: string, args: string[]): string {
  const [file, all] = asRoot ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
  return execFileSync(file as string, all as string[], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
}

/**
 * Starts the server on a free loopback port and checks that the port answers with this cluster: a server that
 * cannot bind its TCP port still starts on its Unix socket, so two test files picking the same port at once
 * would otherwise share one server, and the first to finish would stop the other's. Retries on a new port.
 */
async function listeningOn(bin: string, folder: string, data: string): Promise<number> {
  for (let attempt = 1; ; attempt++) {
    const port = await freePort();
    const options = `-c listen_addresses=127.0.0.1 -c port=${port} -c unix_socket_directories=${folder} -c fsync=off -c full_page_writes=off -c max_connections=60`;
    runAsPostgres(join(bin, 'pg_ctl'), ['-D', data, '-o', options, '-l', join(folder, 'server.log'), '-w', 'start']);
    let answered = '';
    try {
      answered = runAsPostgres(join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-Atc', 'SHOW data_directory', 'postgres']).trim();
    } catch {
      answered = '';
    }
    if (answered === data) return port;
    runAsPostgres(join(bin, 'pg_ctl'), ['-D', data, '-m', 'immediate', 'stop']);
    if (attempt >= 5) throw new Error(`the throwaway PostgreSQL cluster could not get a loopback port of its own (last tried ${port})`);
  }
}

export async function startPgCluster(): Promise<PgCluster> {
  const bin = pgBinaries();
  const folder = mkdtempSync(join(tmpdir(), 'cw-pg-'));
  chmodSync(folder, 0o777);
  if (asRoot) execFileSync('chown', ['postgres:postgres', folder]);
  const data = join(folder, 'data');
  runAsPostgres(join(bin, 'initdb'), ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8', '--no-sync']);
  const port = await listeningOn(bin, folder, data);
  const url = (database: string) => `postgres://postgres@127.0.0.1:${port}/${database}`;
  let stopped = false;
  return {
    port,
    url,
    createDatabase(name) {
      runAsPostgres(join(bin, 'createdb'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', name]);
      return url(name);
    },
    stop() {
      if (stopped) return;
      stopped = true;
      try {
        runAsPostgres(join(bin, 'pg_ctl'), ['-D', data, '-m', 'immediate', 'stop']);
      } finally {
        rmSync(folder, { recursive: true, force: true });
      }
    },
  };
}
