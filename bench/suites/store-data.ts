import type { JobStatus } from '../../core/api/store';
import type { SqliteStore as Store } from '../../db';
import { checkNewJob } from '../../db/jobs/input';
import { writeNewJob } from '../../db/jobs/write';

/** Generated jobs for the store bench: invented customers, parts and notes, varied springs. */
const grades = ['en10270-1-sh', 'en10270-1-dh', 'en10270-3-1.4310', 'en10270-2-vdsicr', 'astm-a228'];
const words = ('valve return latch hinge seat clutch brake pump trigger detent plunger injector closer tine gauge ' +
  'governor throttle pedal lever damper buffer catch pawl ratchet spool relief regulator actuator piston nozzle ' +
  'zinc oxide passivate peened ground squared tested repeat urgent sample prototype drawing revised lost price').split(' ');
const customerStems = ('Ash Birch Cedar Elm Fir Hazel Larch Maple Oak Pine Rowan Willow Yew Alder Beech Holly').split(' ');
const customerTrades = ('Valves Pumps Locks Gauges Tractors Motors Marine Medical Controls Hydraulics').split(' ');

export function lcg(seed: number): () => number {
  let s = seed;
  return () => ((s = (s * 16807) % 2147483647) / 2147483647);
}

export function customerName(i: number): string {
  return `${customerStems[i % customerStems.length]} ${customerTrades[Math.floor(i / customerStems.length) % customerTrades.length]} ${Math.floor(i / 160) + 1} (bench)`;
}

/**
 * The share of each kind in a generated store: compression most, torsion rare (1 %), so the bench sees
 * how a search for a rare kind behaves in a store of mostly another kind.
 */
export const KIND_SHARES = { compression: 0.94, extension: 0.05, torsion: 0.01 } as const;

/** A valid spec of a kind drawn by KIND_SHARES. */
export function benchSpec(random: () => number): Record<string, unknown> {
  const pick = random();
  if (pick < KIND_SHARES.torsion) return torsionSpec(random);
  if (pick < KIND_SHARES.torsion + KIND_SHARES.extension) return extensionSpec(random);
  return compressionSpec(random);
}

/** A valid extension spec: d 0.3–6 mm, index 5–12, full loops, initial tension well inside the window. */
export function extensionSpec(random: () => number): Record<string, unknown> {
  const d = 0.3 * Math.exp(random() * Math.log(20));
  const index = 5 + random() * 7;
  const round = (v: number) => Number(v.toPrecision(4));
  return {
    kind: 'extension', units: 'metric', material: 'en10270-1-sh', wireDiameter: round(d), outerDiameter: round(d * (index + 1)),
    bodyCoils: 8 + Math.round(random() * 30) + 0.5, ends: ['full-loop', 'full-loop'],
  };
}

/** A valid torsion spec: d 0.5–5 mm, index 6–12, two legs, loaded to close. */
export function torsionSpec(random: () => number): Record<string, unknown> {
  const d = 0.5 * Math.exp(random() * Math.log(10));
  const index = 6 + random() * 6;
  const round = (v: number) => Number(v.toPrecision(4));
  return {
    kind: 'torsion', units: 'metric', material: 'astm-a228', wireDiameter: round(d), outerDiameter: round(d * (index + 1)),
    bodyCoils: 3 + Math.round(random() * 12) + 0.25, legs: [{ length: round(d * 12) }, { length: round(d * 15) }],
    windDirection: 'right', loadDirection: 'closing',
  };
}

/** A valid compression spec with d log-uniform over 0.2–12 mm; one in three in inch units. */
export function compressionSpec(random: () => number): Record<string, unknown> {
  const d = 0.2 * Math.exp(random() * Math.log(60));
  const index = 4 + random() * 10;
  const na = 3 + Math.round(random() * 22);
  const L0 = d * (na + 2) + na * d * (0.4 + random() * 2.5);
  const inch = random() < 0.33;
  const k = inch ? 1 / 25.4 : 1;
  const round = (v: number) => Number(v.toPrecision(4));
  return {
    kind: 'compression', units: inch ? 'inch' : 'metric', material: grades[Math.floor(random() * grades.length)],
    wireDiameter: round(d * k), outerDiameter: round(d * (index + 1) * k), totalCoils: na + 2, ends: 'closed-ground',
    freeLength: round(L0 * k),
  };
}

export interface BenchJob {
  customer: { name: string };
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  status: JobStatus;
  dueDate: string | null;
  notes: string;
  spec: Record<string, unknown>;
}

export function benchJob(i: number, random: () => number, dated: JobTimes): BenchJob {
  const note = Array.from({ length: 3 + Math.floor(random() * 6) }, () => words[Math.floor(random() * words.length)]).join(' ');
  const prefix = String.fromCharCode(65 + (i % 26)) + String.fromCharCode(65 + Math.floor(i / 26) % 26);
  return {
    customer: { name: customerName(Math.floor(random() * 1200)) },
    partNumber: `${prefix}-${String(10000 + i)}`,
    drawingNumber: `D${String(i * 7 % 1000003).padStart(7, '0')}`,
    drawingRevision: 'ABCDE'[i % 5]!,
    status: dated.status,
    dueDate: dated.dueDate,
    notes: note,
    spec: benchSpec(random),
  };
}

/** The moment the generated shop's history ends: date ranges in the bench ("this month", "last year") count back from it. */
export const BENCH_NOW = Date.UTC(2026, 2, 20, 12);
/** Twenty years of jobs, the newest year three times as busy as the first. */
export const BENCH_YEARS = 20;
const DAY = 86_400_000;
const SPAN = BENCH_YEARS * 365.25 * DAY;
const GROWTH = Math.log(3) / SPAN;

/** When a job and what happened to it: stamps as the store keeps them (ISO), the due date as YYYY-MM-DD. */
export interface JobTimes {
  createdAt: string;
  updatedAt: string;
  dueDate: string | null;
  status: JobStatus;
  /** When the shop archived it, or null (still listed). */
  archivedAt: string | null;
}

/** Job `i` of `count` is created at the i-th quantile of a history growing exponentially: ids and numbers follow time. */
function createdTime(i: number, count: number, random: () => number): number {
  const u = (i + random()) / count;
  return BENCH_NOW - SPAN + Math.log(1 + u * Math.expm1(GROWTH * SPAN)) / GROWTH;
}

/** A status as a shop's book shows it by age: recent jobs open, the rest done or lost (a few quotes never closed out). */
function statusByAge(ageDays: number, r: number): JobStatus {
  const table: [number, JobStatus][] = ageDays < 14
    ? [[0.3, 'draft'], [0.75, 'quoted'], [0.9, 'ordered'], [0.95, 'in-production'], [1, 'lost']]
    : ageDays < 90
      ? [[0.03, 'draft'], [0.25, 'quoted'], [0.35, 'ordered'], [0.5, 'in-production'], [0.85, 'done'], [1, 'lost']]
      : [[0.02, 'quoted'], [0.64, 'done'], [1, 'lost']];
  return table.find(([upTo]) => r < upTo)![1];
}

/**
 * The times of job `i` of `count`: created over BENCH_YEARS up to BENCH_NOW; last saved days after creation
 * (one in twenty touched again at any later time, a repeat or a correction); due two to eight weeks after
 * creation (none on one in seven); closed jobs older than three years archived by half, within a year.
 */
export function jobTimes(i: number, count: number, random: () => number): JobTimes {
  const created = createdTime(i, count, random);
  const age = BENCH_NOW - created;
  const status = statusByAge(age / DAY, random());
  const touched = random() < 0.05 ? created + random() * age : created + Math.min(age, -Math.log(1 - random()) * 10 * DAY);
  const due = random() < 1 / 7 ? null : new Date(created + (14 + random() * 42) * DAY).toISOString().slice(0, 10);
  const closed = status === 'done' || status === 'lost';
  const archive = closed && age > 3 * 365.25 * DAY && random() < 0.5 ? created + (3 + random()) * 365.25 * DAY : null;
  return {
    createdAt: new Date(created).toISOString(),
    updatedAt: new Date(Math.min(touched, BENCH_NOW)).toISOString(),
    dueDate: due,
    status,
    archivedAt: archive === null ? null : new Date(Math.min(archive, BENCH_NOW)).toISOString(),
  };
}

/** Numbers as the shop's default sequence gives them, by the year of creation: J-16-00412. */
export class YearNumbers {
  private year = '';
  private n = 0;

  next(createdAt: string): string {
    const year = createdAt.slice(2, 4);
    if (year !== this.year) [this.year, this.n] = [year, 0];
    return `J-${year}-${String(++this.n).padStart(5, '0')}`;
  }
}

/** Words a shop would type: part-number prefixes, customer names, note words. */
export function benchQueries(random: () => number, count: number): string[] {
  return Array.from({ length: count }, (_, i) => {
    const n = Math.floor(random() * 100000);
    switch (i % 4) {
      case 0: return `${String.fromCharCode(65 + (n % 26))}${String.fromCharCode(65 + Math.floor(n / 26) % 26)}-${10000 + n}`.slice(0, 6 + (i % 3));
      case 1: return customerName(Math.floor(random() * 1200)).split(' ').slice(0, 2).join(' ');
      case 2: return `${words[Math.floor(random() * words.length)]} ${words[Math.floor(random() * words.length)]}`;
      default: return `D${String(n * 7 % 1000003).padStart(7, '0').slice(0, 5)}`;
    }
  });
}

/** Single words as an estimator types them, one keystroke at a time: 1 to 4 characters of a real word. */
export function oneWordQueries(random: () => number, count: number): string[] {
  return Array.from({ length: count }, (_, i) => {
    const pool = [...words, ...customerStems];
    return pool[Math.floor(random() * pool.length)]!.slice(0, 1 + (i % 4));
  });
}

/**
 * Jobs committed together while generating. One transaction of a million jobs spills its pages into a
 * write-ahead log of gigabytes that every later page read must search (it slowed past an hour); a
 * shop's store grows by commits, and 20 000 jobs a commit keeps the log small at any size.
 */
export const GENERATION_BATCH = 20_000;

/**
 * Writes `count` generated jobs, GENERATION_BATCH a transaction, through the store's own checks and write path,
 * with the times of jobTimes (their own random stream, seeded from `seed`); the archived ones are archived
 * in the same transaction.
 */
export function fillWithJobs(store: Store, count: number, seed: number, onBatch?: (written: number) => void): void {
  const random = lcg(seed);
  const timeline = lcg(seed + 1);
  const numbers = new YearNumbers();
  const archive = store.sql('UPDATE jobs SET archived_at = ? WHERE id = ?');
  for (let from = 0; from < count; from += GENERATION_BATCH) {
    store.db.transaction(() => {
      for (let i = from; i < Math.min(count, from + GENERATION_BATCH); i++) {
        const times = jobTimes(i, count, timeline);
        const checked = checkNewJob(benchJob(i, random, times));
        if (!checked.ok) throw new Error(`bench job ${i}: ${JSON.stringify(checked.errors)}`);
        const id = writeNewJob(store, checked.value, { number: numbers.next(times.createdAt), createdAt: times.createdAt, updatedAt: times.updatedAt });
        if (times.archivedAt !== null) archive.run(times.archivedAt, id);
      }
    }).immediate();
    onBatch?.(Math.min(count, from + GENERATION_BATCH));
  }
}
