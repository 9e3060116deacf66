import { afterAll, beforeAll } from 'vitest';
import type { PgStore } from '../../db';
import { openPgStore } from '../../db';
import { SyncConnection } from '../../db/pg';
import type { PgCluster } from './pg-cluster';
import { startPgCluster } from './pg-cluster';

/**
 * One throwaway cluster for the test file (started before its tests, stopped and removed after), and a fresh
 * empty database for each store a test asks for. Every store opened here is closed before the cluster stops.
 */
export function usePgCluster(): { freshDatabase(): string; freshStore(options?: { clock?: () => Date; author?: string }): PgStore; cluster(): PgCluster } {
  let cluster: PgCluster | undefined;
  let admin: SyncConnection | undefined;
  let counter = 0;
  const stores: PgStore[] = [];
  beforeAll(async () => {
    cluster = await startPgCluster();
    admin = new SyncConnection(cluster.url('postgres'));
  });
  afterAll(() => {
    for (const s of stores.splice(0)) s.close();
    admin?.close();
    cluster?.stop();
  });
  const freshDatabase = () => {
    if (!cluster || !admin) throw new Error('the PostgreSQL cluster is not started (call usePgCluster at the top of the file)');
    counter += 1;
    const name = `shop_${process.pid}_${counter}`;
    admin.query(`CREATE DATABASE ${name}`, []);
    return cluster.url(name);
  };
  return {
    freshDatabase,
    freshStore(options = {}) {
      const store = openPgStore(freshDatabase(), options);
      stores.push(store);
      return store;
    },
    cluster: () => {
      if (!cluster) throw new Error('the PostgreSQL cluster is not started');
      return cluster;
    },
  };
}
