import { describe, expect, it } from 'vitest';
import { defaultSettings } from '../../../core/settings/schema';
import { createJob, getJob, getQuote, getSettings, listQuotes, recordQuote, saveSettings, updateJob } from '../../../db';
import type { QuoteSnapshot } from '../../../db';
import { job, steppingClock, tempStore, totalCoils, value } from './helpers';

const coiler = {
  id: 'c1', name: 'Coiler 1', operation: 'coil', wireRange: { min: 0.2, max: 3 }, hourlyRate: 70, setupMinutes: 30,
  speedModel: { feedMetresPerMinute: 50, maxPiecesPerMinute: 90 },
};

describe('settings', () => {
  it('reads every key at its default in a new store', () => {
    expect(value(getSettings(tempStore()))).toEqual(defaultSettings());
  });

  it('validates each key and names the bad field; nothing is written when any key is bad', () => {
    const store = tempStore();
    const bad = saveSettings(store, {
      defaults: { currency: 'EUR', paperSize: 'a4' },
      machines: [coiler, { ...coiler, id: 'c2', hourlyRate: -1 }],
      colour: 'blue',
    });
    expect(bad.ok).toBe(false);
    const paths = !bad.ok ? bad.error.details!.map((e) => e.path) : [];
    expect(paths).toEqual(expect.arrayContaining(['machines[1].hourlyRate', 'colour']));
    expect(value(getSettings(store)).defaults.currency).toBe('USD');
    const saved = value(saveSettings(store, { defaults: { currency: 'EUR', paperSize: 'a4' }, machines: [coiler] }));
    expect(saved.defaults).toMatchObject({ currency: 'EUR', paperSize: 'a4', toleranceGrade: 2 });
    expect(saved.machines).toHaveLength(1);
  });

  it('wants a speed model for a coiler and unique machine ids', () => {
    const store = tempStore();
    const { speedModel: _s, ...noSpeed } = coiler;
    const result = saveSettings(store, { machines: [noSpeed, coiler, coiler] });
    const paths = !result.ok ? result.error.details!.map((e) => e.path) : [];
    expect(paths).toEqual(expect.arrayContaining(['machines[0].speedModel', 'machines[2].id']));
  });
});

const snapshot = (jobId: number, over: Partial<QuoteSnapshot> = {}): QuoteSnapshot => ({
  jobId, jobRevision: 1, validityDays: 30, prices: {}, quantityBreaks: [], document: {}, decision: null, ...over,
});

describe('issued quotes', () => {
  it('keep the spec, settings and prices of the day they were issued', () => {
    const store = tempStore(steppingClock(Date.parse('2026-04-01T09:00:00Z')));
    value(saveSettings(store, { machines: [coiler], defaults: { currency: 'GBP', quoteValidityDays: 45 } }));
    const created = value(createJob(store, job({ notes: 'as quoted' })));
    const quote = value(recordQuote(store, snapshot(created.id, {
      validityDays: 45, prices: { unit: [1.2, 0.9] }, quantityBreaks: [500, 1000], document: { paper: 'a4', lines: ['demo'] },
    })));
    expect(value(getJob(store, created.id)).status).toBe('quoted');
    expect(quote).toMatchObject({ number: 'Q-26-0001', jobRevision: 1, validityDays: 45, currency: 'GBP', validUntil: '2026-05-16' });
    value(saveSettings(store, { machines: [{ ...coiler, hourlyRate: 99 }], defaults: { currency: 'USD' } }));
    value(updateJob(store, { id: created.id, notes: 'changed later', spec: job({}, { totalCoils: 14 }).spec, change: 'correction' }));
    const again = value(getQuote(store, { number: 'Q-26-0001' }));
    expect(again.settings.machines[0]!.hourlyRate).toBe(70);
    expect(again.currency).toBe('GBP');
    expect(totalCoils(again.spec)).toBe(10);
    expect(again.job.notes).toBe('as quoted');
    expect(again.prices).toEqual({ unit: [1.2, 0.9] });
    expect(value(listQuotes(store, { jobId: created.id })).map((q) => q.number)).toEqual(['Q-26-0001']);
  });

  it('cannot be changed or deleted, even with SQL', () => {
    const store = tempStore();
    const created = value(createJob(store, job()));
    const quote = value(recordQuote(store, snapshot(created.id)));
    expect(() => store.db.prepare("UPDATE quotes SET prices = '{\"unit\":0}' WHERE id = ?").run(quote.id)).toThrow(/cannot be changed/);
    expect(() => store.db.prepare('DELETE FROM quotes WHERE id = ?').run(quote.id)).toThrow(/cannot be deleted/);
    expect(value(getQuote(store, { id: quote.id })).prices).toEqual({});
  });

  it('reports an unknown job by its field', () => {
    expect(recordQuote(tempStore(), snapshot(3)))
      .toMatchObject({ ok: false, error: { code: 'not-found', path: 'jobId' } });
  });
});
