/**
 * A created or last-saved range on the job list reads the shop's days (settings `defaults.timeZone`): a job saved
 * in the evening west of Greenwich is on that day's list, not the next UTC day's. Due dates are days already.
 */
import { describe, expect, it } from 'vitest';
import { createJob, listJobs, listQuotes, recordQuote, saveSettings } from '../../../db';
import { job, tempStore, value } from './helpers';

// 2026-03-06T01:30Z is 19:30 on 5 March in Chicago (CST, UTC−6; 15 U.S.C. §261 standard time zones).
const EVENING_IN_CHICAGO = Date.parse('2026-03-06T01:30:00.000Z');

function storeWithEveningJob() {
  let t = EVENING_IN_CHICAGO;
  const store = tempStore(() => new Date((t += 1000)));
  const saved = value(createJob(store, job({ partNumber: 'LATE-1', dueDate: '2026-03-06' })));
  return { store, saved };
}

const parts = (store: ReturnType<typeof tempStore>, dates: Record<string, string>) =>
  value(listJobs(store, { dates })).jobs.map((j) => j.partNumber);

describe('job list date ranges in the shop\'s days', () => {
  it('reads stamps by their UTC day while the shop keeps UTC (the default)', () => {
    const { store } = storeWithEveningJob();
    expect(parts(store, { field: 'created', from: '2026-03-06', to: '2026-03-06' })).toEqual(['LATE-1']);
    expect(parts(store, { field: 'created', from: '2026-03-05', to: '2026-03-05' })).toEqual([]);
  });

  it('reads them by the shop\'s day once the shop\'s zone is set, both ends included', () => {
    const { store } = storeWithEveningJob();
    value(saveSettings(store, { defaults: { timeZone: 'America/Chicago' } }));
    expect(parts(store, { field: 'created', from: '2026-03-05', to: '2026-03-05' })).toEqual(['LATE-1']);
    expect(parts(store, { field: 'updated', to: '2026-03-05' })).toEqual(['LATE-1']);
    expect(parts(store, { field: 'created', from: '2026-03-06' })).toEqual([]);
    expect(parts(store, { field: 'updated', from: '2026-03-04', to: '2026-03-04' })).toEqual([]);
    // A due date is a day as typed: no zone moves it.
    expect(parts(store, { field: 'due', from: '2026-03-06', to: '2026-03-06' })).toEqual(['LATE-1']);
    expect(value(listJobs(store, { dates: { field: 'created', from: '2026-03-05', to: '2026-03-05' } })).total).toBe(1);
  });

  it('refuses a zone name it does not know, naming the field, and keeps the zone it had', () => {
    const { store } = storeWithEveningJob();
    value(saveSettings(store, { defaults: { timeZone: 'America/Chicago' } }));
    const refused = saveSettings(store, { defaults: { timeZone: 'Central Time' } });
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.error.path).toBe('defaults.timeZone');
    expect(parts(store, { field: 'created', from: '2026-03-05', to: '2026-03-05' })).toEqual(['LATE-1']);
  });

  it('dates an issued quote\'s last valid day from its day of issue in the shop\'s zone', () => {
    const { store, saved } = storeWithEveningJob();
    value(saveSettings(store, { defaults: { timeZone: 'America/Chicago' } }));
    value(recordQuote(store, { jobId: saved.id, jobRevision: saved.revision, validityDays: 30, prices: {}, quantityBreaks: [100], document: {}, decision: null }));
    const [quote] = value(listQuotes(store, {}));
    // Issued 5 March (shop's day) + 30 days; read by its UTC day it would be 5 April.
    expect(quote!.validUntil).toBe('2026-04-04');
  });
});
