import type Database from 'better-sqlite3';
import { StoreError } from '../errors';
import { updateToVersion0001 } from './0001-jobs';
import { updateToVersion0002 } from './0002-search';
import { updateToVersion0003 } from './0003-quotes';
import { updateToVersion0004 } from './0004-first-off-records';
import { updateToVersion0005 } from './0005-shape-engine';
import { updateToVersion0006 } from './0006-keep-issued-rows';
import { updateToVersion0007 } from './0007-estimating';
import { updateToVersion0008 } from './0008-job-requirements';
import { updateToVersion0009 } from './0009-list-and-shape-indexes';
import { updateToVersion0010 } from './0010-quotation-lines';
import { updateToVersion0011 } from './0011-customer-details';
import { updateToVersion0012 } from './0012-enquiries';
import { updateToVersion0013 } from './0013-working-revisions';
import { updateToVersion0014 } from './0014-job-lineage-and-archive';
import { updateToVersion0015 } from './0015-who-made-it';
import { updateToVersion0016 } from './0016-search-at-scale';
import { updateToVersion0017 } from './0017-working-copy-desk';
import { updateToVersion0018 } from './0018-text-prefixes';
import { updateToVersion0019 } from './0019-dated-list-indexes';
import { updateToVersion0020 } from './0020-mixed-shape-coordinates';
import { updateToVersion0021 } from './0021-job-change-notice-per-statement';
import { updateToVersion0022 } from './0022-drop-wire-size-index';

export interface Migration {
  version: number;
  name: string;
  update(db: Database.Database): void;
}

/** The schema history, oldest first. Append only: a released migration is never edited. */
export const migrations: readonly Migration[] = [
  { version: 1, name: 'jobs', update: updateToVersion0001 },
  { version: 2, name: 'search', update: updateToVersion0002 },
  { version: 3, name: 'quotes', update: updateToVersion0003 },
  { version: 4, name: 'first-off records', update: updateToVersion0004 },
  { version: 5, name: 'shape-engine', update: updateToVersion0005 },
  { version: 6, name: 'keep issued rows', update: updateToVersion0006 },
  { version: 7, name: 'estimating', update: updateToVersion0007 },
  { version: 8, name: 'job requirements', update: updateToVersion0008 },
  { version: 9, name: 'list and shape indexes', update: updateToVersion0009 },
  { version: 10, name: 'quotation lines', update: updateToVersion0010 },
  { version: 11, name: 'customer details', update: updateToVersion0011 },
  { version: 12, name: 'enquiries', update: updateToVersion0012 },
  { version: 13, name: 'working revisions', update: updateToVersion0013 },
  { version: 14, name: 'job lineage, archive and spring words', update: updateToVersion0014 },
  { version: 15, name: 'who made it', update: updateToVersion0015 },
  { version: 16, name: 'search at scale', update: updateToVersion0016 },
  { version: 17, name: 'working copy desk', update: updateToVersion0017 },
  { version: 18, name: 'text prefixes', update: updateToVersion0018 },
  { version: 19, name: 'dated list indexes', update: updateToVersion0019 },
  { version: 20, name: 'mixed shape coordinates', update: updateToVersion0020 },
  { version: 21, name: 'job change notice per statement', update: updateToVersion0021 },
  { version: 22, name: 'drop wire size index', update: updateToVersion0022 },
];

/** "Coil" in ASCII: marks a SQLite file as a Coilwright store (PRAGMA application_id). */
export const APPLICATION_ID = 0x436f696c;

export const LATEST_VERSION = migrations.reduce((max, m) => {
  if (m.version <= max) throw new Error(`migration ${m.version} (${m.name}) is out of order`);
  return m.version;
}, 0);

export function schemaVersion(db: Database.Database): number {
  return db.pragma('user_version', { simple: true }) as number;
}

/**
 * Brings the schema up to `target` (default: the latest) in one transaction: all pending migrations
 * apply, or none do. A store from a newer version of the program is refused before anything is written.
 */
export function migrate(db: Database.Database, target = LATEST_VERSION): { from: number; to: number } {
  const current = schemaVersion(db);
  // Up to date: no write transaction, so opening never waits on another connection's write lock.
  if (current >= target && current <= LATEST_VERSION) return { from: current, to: current };
  return db.transaction(() => {
    const from = schemaVersion(db);
    if (from > LATEST_VERSION) {
      throw new StoreError('store-too-new',
        `this store has schema version ${from}; this version of Coilwright knows up to ${LATEST_VERSION}: update Coilwright to open it`);
    }
    if (from === 0) db.pragma(`application_id = ${APPLICATION_ID}`);
    for (const m of migrations) {
      if (m.version > from && m.version <= target) m.update(db);
    }
    const to = Math.max(from, target);
    if (to !== from) db.pragma(`user_version = ${to}`);
    return { from, to };
  }).immediate();
}
