import { join } from 'node:path';
import { afterEach } from 'vitest';
import type { Store } from '../../db';
import { openPgStore, openStore } from '../../db';
import { tempDir } from '../integration/db/helpers';
import type { usePgCluster } from './pg-stores';

/** Two desks on one store: each opens its own connection and signs in with its own name. */
export interface DeskBackend { name: string; desks(a: string, b: string): [Store, Store] }

/**
 * The same store on SQLite (one file, two connections) and on PostgreSQL (one fresh database of the
 * file's cluster, two connections); every store opened is closed after each test.
 */
export function deskBackends(pg: ReturnType<typeof usePgCluster>): DeskBackend[] {
  const opened: Store[] = [];
  const keep = (s: Store) => (opened.push(s), s);
  afterEach(() => {
    for (const s of opened.splice(0)) s.close();
  });
  return [
    {
      name: 'SQLite',
      desks: (a, b) => {
        const file = join(tempDir(), 'shop.db');
        return [keep(openStore(file, { author: a })), keep(openStore(file, { author: b }))];
      },
    },
    {
      name: 'PostgreSQL',
      desks: (a, b) => {
        const url = pg.freshDatabase();
        return [keep(openPgStore(url, { author: a })), keep(openPgStore(url, { author: b }))];
      },
    },
  ];
}
