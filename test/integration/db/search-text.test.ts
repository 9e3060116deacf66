import { describe, expect, it } from 'vitest';
import type { Store } from '../../../db';
import { copyStore, createJob, findJobs, updateJob } from '../../../db';
import { PG_RANKED_MATCHES } from '../../../db/search/text';
import { fillWithJobs } from '../../../bench/suites/store-data';
import { PREFIX_KEPT, matchExpression, tsQueryText, tsWords } from '../../../db/search/match';
import { usePgCluster } from '../../support/pg-stores';
import { job, tempStore, value } from './helpers';

const pg = usePgCluster();

function seeded(store: Store = tempStore()) {
  value(createJob(store, job({ customer: { name: 'Spratt Engineering' }, partNumber: 'SE-200', notes: 'gate latch' })));
  value(createJob(store, job({ customer: { name: 'Wolds Tractors' }, partNumber: 'SPR-4410', notes: 'seat spring' })));
  value(createJob(store, job({ customer: { name: 'Wolds Tractors' }, partNumber: 'WT-9', notes: 'spring for the spring-loaded gate, spring steel' })));
  value(createJob(store, job({ customer: { name: 'Quayside Marine' }, partNumber: 'QM-1', drawingNumber: 'QM-D-77', notes: 'pump' })));
  return store;
}

const parts = (store: Store, text: string) => value(findJobs(store, { text })).map((h) => h.job.partNumber);

describe('text search', () => {
  it('matches word prefixes across customer, part number, drawing number and notes', () => {
    const store = seeded();
    expect(parts(store, 'spr').sort()).toEqual(['SE-200', 'SPR-4410', 'WT-9']);
    expect(parts(store, 'wolds gate')).toEqual(['WT-9']);
    expect(parts(store, 'QM-D')).toEqual(['QM-1']);
    expect(parts(store, 'J-26-0004')).toEqual(['QM-1']);
    expect(parts(store, 'ESSEX')).toEqual([]);
  });

  it('ranks identifying columns above notes, and more mentions above fewer', () => {
    const store = seeded();
    const hits = value(findJobs(store, { text: 'spr' }));
    expect(hits[0]!.job.partNumber).toBe('SPR-4410');
    expect(hits.map((h) => h.rank)).toEqual([...hits.map((h) => h.rank)].sort((a, b) => a - b));
    expect(parts(store, 'spring')).toEqual(['WT-9', 'SPR-4410']);
  });

  it('treats query syntax in user text as text', () => {
    const store = seeded();
    for (const text of ['spring OR pump', 'NEAR(spring', 'notes:pump', '"gate', 'seat AND', 'sp*r*']) {
      expect(findJobs(store, { text }).ok, text).toBe(true);
    }
    expect(parts(store, 'spring OR pump')).toEqual([]);
    expect(matchExpression('say "hi" now*')).toEqual({ ok: true, value: '"say"* """hi"""* "now"*' });
    expect(findJobs(store, { text: ' *** ' })).toMatchObject({ ok: false, error: { code: 'empty-search', path: 'text' } });
  });

  it('searches a word longer than the kept prefixes by its first eight characters, on both stores', () => {
    expect(PREFIX_KEPT).toBe(8);
    expect(matchExpression('counterweights CS-10420000000 ab')).toEqual({ ok: true, value: '"counterw"* "CS 10420000"* "ab"*' });
    expect(tsQueryText(wordsOf('counterweights CS-10420000000'))).toBe("'counterw':* & 'cs' <-> '10420000':*");
    // Up to eight characters the word is its own prefix, quoted as typed.
    expect(matchExpression('governor')).toEqual({ ok: true, value: '"governor"*' });
  });
});

function wordsOf(text: string) {
  const words = tsWords(text);
  if (!words.ok) throw new Error(JSON.stringify(words.errors));
  return words.value;
}

describe('text search on PostgreSQL', () => {
  it('matches, ranks and quotes as on SQLite', () => {
    const store = seeded(pg.freshStore());
    expect(parts(store, 'spr').sort()).toEqual(['SE-200', 'SPR-4410', 'WT-9']);
    expect(parts(store, 'wolds gate')).toEqual(['WT-9']);
    expect(parts(store, 'QM-D')).toEqual(['QM-1']);
    expect(parts(store, 'J-26-0004')).toEqual(['QM-1']);
    expect(parts(store, 'ESSEX')).toEqual([]);
    expect(parts(store, 'spr')[0]).toBe('SPR-4410');
    const hits = value(findJobs(store, { text: 'spr' }));
    expect(hits.map((h) => h.rank)).toEqual([...hits.map((h) => h.rank)].sort((a, b) => a - b));
    for (const text of ['spring OR pump', 'NEAR(spring', 'notes:pump', '"gate', 'seat AND', 'sp*r*', "o'brien", 'a & b | !c']) {
      expect(findJobs(store, { text }).ok, text).toBe(true);
    }
    expect(parts(store, 'spring OR pump')).toEqual([]);
    expect(findJobs(store, { text: ' *** ' })).toMatchObject({ ok: false, error: { code: 'empty-search', path: 'text' } });
  });

  it('finds by a prefix exactly the jobs its whole words find, words written later included', () => {
    const store = seeded(pg.freshStore());
    const later = value(createJob(store, job({ customer: { name: 'Sprockett Hoists' }, partNumber: 'SH-5', notes: 'sprue' })));
    value(updateJob(store, { id: later.id, notes: 'spreader bar' }));
    const ids = (text: string) => value(findJobs(store, { text, limit: 50 })).map((h) => h.job.id).sort((a, b) => a - b);
    const byPrefix = (text: string) => (store.sql("SELECT id FROM job_text WHERE document @@ to_tsquery('simple', ?) ORDER BY id")
      .all(tsQueryText(wordsOf(text))) as { id: number }[]).map((r) => r.id);
    for (const text of ['spr', 'spre', 'sprock', 'gate', 'wolds sp', 'QM-D', 'J-26-00', 'qu', 'zz']) {
      expect(ids(text), text).toEqual(byPrefix(text));
    }
    expect(ids('spreader')).toEqual([later.id]);
    expect(ids('sprue')).toEqual([]);
  });

  it('ranks only the newest matches of a word most jobs hold', () => {
    const lite = tempStore();
    fillWithJobs(lite, PG_RANKED_MATCHES + 150, 7);
    // The oldest job mentions the word most: SQLite, which ranks up to RANKED_MATCHES, puts it first;
    // PostgreSQL ranks the newest PG_RANKED_MATCHES only, so it stays out.
    value(updateJob(lite, { id: 1, notes: 'bench bench bench' }));
    const server = pg.freshStore();
    value(copyStore(lite, server));
    expect(value(findJobs(lite, { text: 'bench', limit: 5 }))[0]!.job.id).toBe(1);
    const ids = (server.sql('SELECT id FROM jobs ORDER BY id DESC').all() as { id: number }[]).map((r) => r.id);
    const hits = value(findJobs(server, { text: 'bench', limit: 50 }));
    expect(hits).toHaveLength(50);
    for (const h of hits) expect(h.job.id).toBeGreaterThanOrEqual(ids[PG_RANKED_MATCHES - 1]!);
    value(updateJob(server, { id: ids[PG_RANKED_MATCHES - 1]!, notes: 'bench bench bench' }));
    expect(value(findJobs(server, { text: 'bench', limit: 5 }))[0]!.job.id).toBe(ids[PG_RANKED_MATCHES - 1]);
  }, 60_000);

  it('writes a short list of whole words in place of a prefix, and a word typed twice once', () => {
    const words = wordsOf('Valv DA-100 x x');
    expect(tsQueryText(words)).toBe("'valv':* & 'da' <-> '100':* & 'x'");
    expect(tsQueryText(words, new Map([['valv', ['valve', 'valves']], ['100', ['100']]]))).toBe("('valve' | 'valves') & 'da' <-> '100' & 'x'");
  });
});
