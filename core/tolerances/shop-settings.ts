/**
 * The shop's tolerance tables as settings hold them (JSON: an open top band is `upTo: null`) and as the
 * lookups read them. A table still equal to its demo default says so in its source.
 */
import type { Band } from './bands';
import type { PlusMinusTable, ShopTables, ShopToleranceTable } from './shop-tables';
import { demoShopTables, shopTableLabels } from './shop-tables';

type Stored<T extends Band> = Omit<T, 'upTo'> & { upTo: number | null };

export interface StoredShopTables {
  load: { bandedBy: ShopToleranceTable['bandedBy']; rows: Stored<ShopToleranceTable['rows'][number]>[] };
  freeLength: { bandedBy: ShopToleranceTable['bandedBy']; rows: Stored<ShopToleranceTable['rows'][number]>[] };
  legLength: { rows: Stored<PlusMinusTable['rows'][number]>[] };
  freeAngle: { rows: Stored<PlusMinusTable['rows'][number]>[] };
}

const toStored = <T extends Band>(rows: readonly T[]): Stored<T>[] =>
  rows.map((r) => ({ ...r, upTo: Number.isFinite(r.upTo) ? r.upTo : null }));
const fromStored = <T extends Band>(rows: readonly Stored<T>[]): T[] =>
  rows.map((r) => ({ ...r, upTo: r.upTo ?? Infinity }) as unknown as T);

/** The demo tables in the settings' shape: the default of a new shop. */
export function demoStoredShopTables(): StoredShopTables {
  const d = demoShopTables;
  return {
    load: { bandedBy: d.load.bandedBy, rows: toStored(d.load.rows) },
    freeLength: { bandedBy: d.freeLength.bandedBy, rows: toStored(d.freeLength.rows) },
    legLength: { rows: toStored(d.legLength.rows) },
    freeAngle: { rows: toStored(d.freeAngle.rows) },
  };
}

/** Names the table as the shop's; one never changed from the demo default says that too. */
function sourceOf(key: keyof ShopTables, stored: unknown): string {
  const isDemo = JSON.stringify(stored) === JSON.stringify(demoStoredShopTables()[key]);
  return `the shop's ${shopTableLabels[key]} table (Settings → Tolerances)${isDemo ? `; still the ${demoShopTables[key].source}` : ''}`;
}

/** The shop's tables as the lookups read them. */
export function shopTablesOf(stored: StoredShopTables): ShopTables {
  const d = demoShopTables;
  return {
    load: { ...d.load, bandedBy: stored.load.bandedBy, rows: fromStored(stored.load.rows), source: sourceOf('load', stored.load) },
    freeLength: { ...d.freeLength, bandedBy: stored.freeLength.bandedBy, rows: fromStored(stored.freeLength.rows), source: sourceOf('freeLength', stored.freeLength) },
    legLength: { ...d.legLength, rows: fromStored(stored.legLength.rows), source: sourceOf('legLength', stored.legLength) },
    freeAngle: { ...d.freeAngle, rows: fromStored(stored.freeAngle.rows), source: sourceOf('freeAngle', stored.freeAngle) },
  };
}
