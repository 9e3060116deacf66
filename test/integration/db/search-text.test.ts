import { describe, expect, it } from 'vitest';
import { createJob, findJobs } from '../../../db';
import { PREFIX_KEPT, matchExpression, tsQueryExpression } from '../../../db/search/match';
import { job, tempStore, value } from './helpers';

function seeded() {
  const store = tempStore();
  value(createJob(store, job({ customer: { name: 'Spratt Engineering' }, partNumber: 'SE-200', notes: 'gate latch' })));
  value(createJob(store, job({ customer: { name: 'Wolds Tractors' }, partNumber: 'SPR-4410', notes: 'seat spring' })));
  value(createJob(store, job({ customer: { name: 'Wolds Tractors' }, partNumber: 'WT-9', notes: 'spring for the spring-loaded gate, spring steel' })));
  value(createJob(store, job({ customer: { name: 'Quayside Marine' }, partNumber: 'QM-1', drawingNumber: 'QM-D-77', notes: 'pump' })));
  return store;
}

const parts = (store: ReturnType<typeof seeded>, text: string) => value(findJobs(store, { text })).map((h) => h.job.partNumber);

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
    expect(tsQueryExpression('counterweights CS-10420000000')).toEqual({ ok: true, value: "'counterw':* & 'cs' <-> '10420000':*" });
    // Up to eight characters the word is its own prefix, quoted as typed.
    expect(matchExpression('governor')).toEqual({ ok: true, value: '"governor"*' });
  });
});
