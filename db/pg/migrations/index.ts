import { version0001 } from './0001-jobs';
import { version0002 } from './0002-search';
import { version0003 } from './0003-quotes';
import { version0004 } from './0004-first-off-records';
import { version0005 } from './0005-shape-engine';
import { version0006 } from './0006-keep-issued-rows';
import { version0007 } from './0007-estimating';
import { version0008 } from './0008-job-requirements';
import { version0009 } from './0009-list-and-shape-indexes';
import { version0010 } from './0010-quotation-lines';
import { version0011 } from './0011-customer-details';
import { version0012 } from './0012-enquiries';
import { version0013 } from './0013-working-revisions';
import { fillSearchWords0014, version0014 } from './0014-job-lineage-and-archive';
import type { SyncConnection } from '../connection';
import { version0015 } from './0015-who-made-it';
import { version0016 } from './0016-search-at-scale';
import { version0017 } from './0017-working-copy-desk';
import { version0018 } from './0018-text-prefixes';
import { version0019 } from './0019-dated-list-indexes';
import { version0020 } from './0020-mixed-shape-coordinates';
import { version0021 } from './0021-job-change-notice-per-statement';
import { version0022 } from './0022-drop-wire-size-index';

/**
 * The PostgreSQL side of each numbered migration of db/migrations/index.ts: same numbers, same logical schema.
 * Append only. A test holds the two lists to the same numbers (test/integration/db/pg-schema.test.ts).
 */
export const pgMigrations: readonly { version: number; sql: string; after?: (c: SyncConnection) => void }[] = [
  { version: 1, sql: version0001 },
  { version: 2, sql: version0002 },
  { version: 3, sql: version0003 },
  { version: 4, sql: version0004 },
  { version: 5, sql: version0005 },
  { version: 6, sql: version0006 },
  { version: 7, sql: version0007 },
  { version: 8, sql: version0008 },
  { version: 9, sql: version0009 },
  { version: 10, sql: version0010 },
  { version: 11, sql: version0011 },
  { version: 12, sql: version0012 },
  { version: 13, sql: version0013 },
  { version: 14, sql: version0014, after: fillSearchWords0014 },
  { version: 15, sql: version0015 },
  { version: 16, sql: version0016 },
  { version: 17, sql: version0017 },
  { version: 18, sql: version0018 },
  { version: 19, sql: version0019 },
  { version: 20, sql: version0020 },
  { version: 21, sql: version0021 },
  { version: 22, sql: version0022 },
];
