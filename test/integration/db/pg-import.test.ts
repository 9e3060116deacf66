import { describe, expect, it } from 'vitest';
import { exportJobs, findJobs, importJobs, listJobs, reindexJobs } from '../../../db';
import { usePgCluster } from '../../support/pg-stores';
import { document } from './demo-jobs';
import { steppingClock, value } from './helpers';

const pg = usePgCluster();

describe('an import of many jobs on PostgreSQL', () => {
  it('writes them in one transaction with their customers, numbers and search rows, or refuses them all', () => {
    const store = pg.freshStore({ clock: steppingClock() });
    const refused = importJobs(store, { text: JSON.stringify(document(1200, 1150)) });
    expect(refused).toMatchObject({ ok: false, error: { path: 'jobs[1150].spec.totalCoils' } });
    expect(value(listJobs(store, {})).total).toBe(0);

    const imported = value(importJobs(store, { text: JSON.stringify(document(1200)), renumber: true })).imported;
    expect(imported).toHaveLength(1200);
    expect(imported.slice(0, 2).map((j) => j.number)).toEqual(['J-26-0001', 'J-26-0002']);
    expect(imported.at(-1)!.number).toBe('J-26-1200');
    expect(value(listJobs(store, {})).total).toBe(1200);
    const customers = store.sql('SELECT name FROM customers ORDER BY name').all() as { name: string }[];
    expect(customers.map((c) => c.name)).toEqual(['Demo Larkspur Valves', 'Demo Orchard Gauges', 'Demo Quarry Lane Pumps', 'Demo Tidewater Marine']);
    expect(value(findJobs(store, { text: 'DEMO-1177' })).map((h) => h.job.partNumber)).toContain('DEMO-1177');
    // The search numbers written by the import are the ones `db reindex` computes.
    expect(value(reindexJobs(store, { all: true }))).toMatchObject({ checked: 1200, changed: 0, problems: [] });
    const exported = JSON.parse(value(exportJobs(store, {})).text!).jobs as { partNumber: string; customer: { name: string } }[];
    expect(exported[1149]).toMatchObject({ partNumber: 'DEMO-1149', customer: { name: 'Demo Quarry Lane Pumps' } });
    // The sequence moved on once, past every number the import took.
    expect(JSON.parse((store.sql("SELECT value FROM settings WHERE key = 'numbering'").get() as { value: string }).value).next).toBe(1201);
  }, 120_000);
});
