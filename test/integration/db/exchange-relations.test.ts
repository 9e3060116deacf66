import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Store } from '../../../db';
import {
  archiveJob, copyJob, createEnquiry, createJob, enquiryJobs, exportJobs, getJob, importJobs, listEnquiries, setJobStatus,
} from '../../../db';
import { usePgCluster } from '../../support/pg-stores';
import { importRecordSchema } from '../../../db/exchange/document';
import { job, steppingClock, tempStore, value } from './helpers';

const pg = usePgCluster();

interface FileJob { number: string; partNumber: string; archivedAt?: string; copiedFrom?: { number: string; at: string }; enquiry?: { key: number; sheetRow: number } }

const backends: { name: string; fresh(): Store }[] = [
  { name: 'SQLite', fresh: () => tempStore(steppingClock()) },
  { name: 'PostgreSQL', fresh: () => pg.freshStore({ clock: steppingClock() }) },
];

/**
 * A demo shop (invented customers and parts): a quoted job and a draft made from it, an archived job, and an
 * enquiry of three draft jobs, the second of them since quoted.
 */
function shop(store: Store): { source: string; copy: string; archived: string; enquiry: string[] } {
  const source = value(createJob(store, job({ partNumber: 'DEMO-SRC', customer: { name: 'Demo Larkspur Valves' }, status: 'quoted' })));
  const copy = value(copyJob(store, source.id));
  const archived = value(createJob(store, job({ partNumber: 'DEMO-OLD' })));
  value(archiveJob(store, { id: archived.id, archived: true }));
  const made = value(createEnquiry(store, {
    customer: 'Demo Orchard Gauges', reference: 'DEMO-RFQ-7', source: 'demo-rfq-7.xlsx',
    rows: [2, 3, 5].map((row) => ({ row, ref: `rows[${row}]`, job: job({ partNumber: `DEMO-E${row}`, customer: undefined }) as never })),
  }));
  value(setJobStatus(store, { id: made.jobs[1]!.id, status: 'quoted' }));
  return { source: source.number, copy: copy.number, archived: archived.number, enquiry: made.jobs.map((j) => j.number) };
}

const jobsOf = (text: string): FileJob[] => (JSON.parse(text) as { jobs: FileJob[] }).jobs;
const exported = (store: Store, status?: 'draft' | 'quoted') => value(exportJobs(store, status ? { status } : {})).text!;
const byPart = (jobs: FileJob[], part: string) => jobs.find((j) => j.partNumber === part)!;

/** The enquiries of a store as reference and the part numbers of their jobs in sheet order. */
function enquiriesOf(store: Store): { reference: string; rows: [number, string][] }[] {
  return value(listEnquiries(store, { limit: 50 })).map((e) => ({
    reference: e.reference, rows: value(enquiryJobs(store, e.id)).jobs.map((j): [number, string] => [j.sheetRow, j.partNumber]),
  }));
}

describe.each(backends)('the coilwright-jobs document keeps archive state, links and enquiries ($name)', ({ fresh }) => {
  it('exports them, and an import into an empty store gives back the same document', () => {
    const store = fresh();
    const numbers = shop(store);
    const text = exported(store);
    expect(JSON.parse(text)).toMatchObject({ format: 'coilwright-jobs', version: 2 });
    const jobs = jobsOf(text);
    expect(byPart(jobs, 'DEMO-OLD').archivedAt).toMatch(/^2026-03-02T/);
    expect(byPart(jobs, 'DEMO-SRC')).not.toHaveProperty('archivedAt');
    const copy = jobs.find((j) => j.number === numbers.copy)!;
    expect(copy.copiedFrom).toMatchObject({ number: numbers.source });
    const enquiry = jobs.filter((j) => j.enquiry);
    expect(enquiry.map((j) => [j.number, j.enquiry!.sheetRow])).toEqual(numbers.enquiry.map((n, i) => [n, [2, 3, 5][i]]));
    expect(new Set(enquiry.map((j) => j.enquiry!.key)).size).toBe(1);

    const target = fresh();
    const result = value(importJobs(target, { text }));
    expect(result.problems).toBeUndefined();
    expect(jobsOf(exported(target))).toEqual(jobs);
    expect(value(getJob(target, { number: numbers.archived })).archivedAt).toBe(byPart(jobs, 'DEMO-OLD').archivedAt);
    expect(value(getJob(target, { number: numbers.source })).lineage.copiedTo.map((l) => l.number)).toEqual([numbers.copy]);
    expect(enquiriesOf(target)).toEqual([{ reference: 'DEMO-RFQ-7', rows: [[2, 'DEMO-E2'], [3, 'DEMO-E3'], [5, 'DEMO-E5']] }]);
  });

  it('renumbered on a collision, the links follow the jobs by their new numbers and the enquiry is a new one', () => {
    const store = fresh();
    const numbers = shop(store);
    const text = exported(store);
    expect(importJobs(store, { text })).toMatchObject({ ok: false, error: { code: 'duplicate-number' } });
    const result = value(importJobs(store, { text, renumber: true }));
    expect(result.problems).toBeUndefined();
    const newNumber = (old: string) => result.imported[jobsOf(text).findIndex((j) => j.number === old)]!.number;
    const copy = value(getJob(store, { number: newNumber(numbers.copy) }));
    expect(copy.lineage.copiedFrom?.number).toBe(newNumber(numbers.source));
    // The first copy still links to the first source, and only to it.
    expect(value(getJob(store, { number: numbers.source })).lineage.copiedTo.map((l) => l.number)).toEqual([numbers.copy]);
    expect(value(getJob(store, { number: newNumber(numbers.archived) })).archivedAt).not.toBeNull();
    const enquiries = value(listEnquiries(store, { limit: 10 }));
    expect(enquiries).toHaveLength(2);
    const jobsOfEnquiries = enquiries.map((e) => value(enquiryJobs(store, e.id)).jobs.map((j) => j.number).sort());
    expect(jobsOfEnquiries).toContainEqual(numbers.enquiry.map(newNumber).sort());
    expect(jobsOfEnquiries).toContainEqual([...numbers.enquiry].sort());
  });

  it('names a link to a job outside the file and imports the jobs; the next file brings the job and the link back', () => {
    const store = fresh();
    const numbers = shop(store);
    const drafts = exported(store, 'draft');
    const quoted = exported(store, 'quoted');
    const at = jobsOf(drafts).findIndex((j) => j.number === numbers.copy);

    const alone = fresh();
    const result = value(importJobs(alone, { text: drafts }));
    expect(result.imported).toHaveLength(jobsOf(drafts).length);
    expect(result.problems).toEqual([expect.objectContaining({ code: 'unknown-job', path: `jobs[${at}].copiedFrom.number` })]);
    expect(result.problems![0]!.message).toContain(`job ${numbers.source}`);
    expect(value(getJob(alone, { number: numbers.copy })).lineage.copiedFrom).toBeNull();

    // Renumbered, the file's numbers name only its own jobs: not the store's job of that number.
    const renumbered = value(importJobs(store, { text: drafts, renumber: true }));
    expect(renumbered.problems).toEqual([expect.objectContaining({ code: 'unknown-job', path: `jobs[${at}].copiedFrom.number` })]);

    // A status at a time into an empty store: the copy finds its source, the enquiry comes back as one.
    const whole = fresh();
    expect(value(importJobs(whole, { text: quoted })).problems).toBeUndefined();
    expect(value(importJobs(whole, { text: drafts })).problems).toBeUndefined();
    expect(value(getJob(whole, { number: numbers.copy })).lineage.copiedFrom?.number).toBe(numbers.source);
    expect(enquiriesOf(whole)).toEqual([{ reference: 'DEMO-RFQ-7', rows: [[2, 'DEMO-E2'], [3, 'DEMO-E3'], [5, 'DEMO-E5']] }]);
  });

  it('links a job to one later in the file', () => {
    const store = fresh();
    const doc = {
      format: 'coilwright-jobs', version: 2,
      jobs: [
        { ...job({ partNumber: 'DEMO-LATE-COPY' }), number: 'D-2', copiedFrom: { number: 'D-9', at: '2026-03-01T10:00:00.000Z' } },
        { ...job({ partNumber: 'DEMO-LATE-SOURCE' }), number: 'D-9' },
      ],
    };
    expect(value(importJobs(store, { text: JSON.stringify(doc) })).problems).toBeUndefined();
    expect(value(getJob(store, { number: 'D-9' })).lineage.copiedTo).toMatchObject([{ number: 'D-2', at: '2026-03-01T10:00:00.000Z' }]);
  });
});

describe('records that contradict themselves', () => {
  const enquiry = (over: Record<string, unknown> = {}) => ({
    key: 4, customer: 'Demo Orchard Gauges', reference: 'DEMO-RFQ-9', source: '', receivedAt: '2026-03-01T09:00:00.000Z', sheetRow: 1, ...over,
  });

  it('refuses the whole file when one enquiry key carries two references, naming the field', () => {
    const store = tempStore();
    const doc = {
      format: 'coilwright-jobs', version: 2,
      jobs: [{ ...job(), enquiry: enquiry() }, { ...job(), enquiry: enquiry({ reference: 'DEMO-RFQ-10', sheetRow: 2 }) }],
    };
    const refused = importJobs(store, { text: JSON.stringify(doc) });
    expect(refused).toMatchObject({ ok: false, error: { code: 'enquiry-mismatch', path: 'jobs[1].enquiry.reference' } });
    expect(value(listEnquiries(store, { limit: 5 }))).toEqual([]);
    // The same customer written another way is the same customer (customers match regardless of case and spacing).
    const same = { ...doc, jobs: [doc.jobs[0], { ...job(), enquiry: enquiry({ customer: 'demo  orchard gauges', sheetRow: 2 }) }] };
    expect(value(importJobs(store, { text: JSON.stringify(same) })).imported).toHaveLength(2);
    expect(enquiriesOf(store)).toEqual([{ reference: 'DEMO-RFQ-9', rows: [[1, 'FG-100'], [2, 'FG-100']] }]);
  });

  it('names a job made from itself as a link not kept', () => {
    const store = tempStore();
    const doc = { format: 'coilwright-jobs', version: 2, jobs: [{ ...job(), number: 'D-1', copiedFrom: { number: 'D-1', at: '2026-03-01T10:00:00.000Z' } }] };
    expect(value(importJobs(store, { text: JSON.stringify(doc) })).problems).toEqual([expect.objectContaining({ code: 'copied-from-itself', path: 'jobs[0].copiedFrom.number' })]);
  });
});

describe('a version 1 document', () => {
  // Written by the version 1 export (`db export` of the DEMO shop) before the archive state, links and enquiries were carried.
  const text = readFileSync(join(__dirname, 'fixtures', 'demo-jobs-version-1.json'), 'utf8');

  it.each(backends)('imports as before on $name: every job listed, no links, no enquiries, the same records', ({ fresh }) => {
    const store = fresh();
    const file = JSON.parse(text) as { version: number; jobs: FileJob[] };
    expect(file.version).toBe(1);
    const result = value(importJobs(store, { text }));
    expect(result.problems).toBeUndefined();
    expect(result.imported.map((j) => j.number)).toEqual(file.jobs.map((j) => j.number));
    expect(store.sql('SELECT count(*) AS n FROM jobs WHERE archived_at IS NOT NULL').get()).toEqual({ n: 0 });
    expect(store.sql('SELECT (SELECT count(*) FROM job_copies) + (SELECT count(*) FROM enquiries) AS n').get()).toEqual({ n: 0 });
    expect(jobsOf(exported(store))).toEqual(file.jobs);
  });
});

describe('the record schema', () => {
  const base = { spec: {} };
  const issues = (raw: Record<string, unknown>) => {
    const parsed = importRecordSchema.safeParse({ ...base, ...raw });
    return parsed.success ? [] : parsed.error.issues.map((i) => i.path.join('.'));
  };

  it('describes the archive state, the link and the enquiry, and refuses them malformed by field', () => {
    expect(issues({ archivedAt: '2026-03-01T10:00:00.000Z', copiedFrom: { number: 'J-26-0001', at: '2026-03-01T10:00:00.000Z' } })).toEqual([]);
    expect(issues({ archivedAt: null })).toEqual([]);
    expect(issues({ archivedAt: 'last week' })).toEqual(['archivedAt']);
    expect(issues({ copiedFrom: { number: 'J-26-0001' } })).toEqual(['copiedFrom.at']);
    expect(issues({ copiedFrom: { number: ' ', at: '2026-03-01T10:00:00.000Z' } })).toEqual(['copiedFrom.number']);
    const enquiry = { key: 1, customer: 'Demo Orchard Gauges', reference: 'DEMO-RFQ-7', receivedAt: '2026-03-01T09:00:00.000Z', sheetRow: 2 };
    expect(issues({ enquiry })).toEqual([]);
    expect(importRecordSchema.parse({ ...base, enquiry }).enquiry?.source).toBe('');
    expect(issues({ enquiry: { ...enquiry, sheetRow: 0 } })).toEqual(['enquiry.sheetRow']);
    expect(issues({ enquiry: { ...enquiry, key: 1.5 } })).toEqual(['enquiry.key']);
    expect(issues({ enquiry: { ...enquiry, customer: '' } })).toEqual(['enquiry.customer']);
    expect(issues({ enquiry: { ...enquiry, id: 3 } })).toEqual(['enquiry']);
  });
});
