/**
 * Prints random valid jobs (traveller and quote) and feeds damaged job files to the same reader, counting
 * what must never happen: a crash, a NaN or ∞ in a document, an error that names no field, a document over
 * the time limit. Shared by the test suite (a few hundred cases) and `npm run bench -- fuzz` (thousands).
 */
import fc from 'fast-check';
import { parsePrintFile } from '../../core/documents';
import type { Settings } from '../../core/settings/schema';
import { renderQuote, renderTraveller } from '../../service/pdf';
import { draftQuote, travellerFor } from '../../service/pdf/printing';
import { nonFiniteNumbers, validJobFile } from './random-springs';

export interface FuzzOutcome {
  jobs: number;
  documents: number;
  damaged: number;
  crashes: string[];
  nonFinite: string[];
  errorsWithoutPath: string[];
  overTime: string[];
  slowestMs: number;
}

function withLimit<T>(work: Promise<T>, ms: number, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const limit = new Promise<never>((_, reject) => { timer = setTimeout(() => reject(new Error(`${what}: over ${ms} ms`)), ms); });
  return Promise.race([work, limit]).finally(() => clearTimeout(timer));
}

/** A job file with one field changed to something wrong: the reader must name that field. */
const damagedJobFile = fc.tuple(validJobFile, fc.constantFrom('spec.wireDiameter', 'spec.loads', 'orderQuantity', 'spec.units', 'partNumber', 'orderQty', 'spec.material'),
  fc.constantFrom<unknown>(-1, 0, 1e300, 'x', null, [], {}, true, 1.5))
  .map(([job, field, value]) => {
    const copy = JSON.parse(JSON.stringify(job)) as Record<string, Record<string, unknown>>;
    const [head, tail] = field.split('.') as [string, string | undefined];
    if (tail) copy[head]![tail] = value;
    else (copy as Record<string, unknown>)[head] = value;
    return copy;
  });

async function printOne(raw: unknown, i: number, settings: Settings, limitMs: number, o: FuzzOutcome): Promise<void> {
  const print = parsePrintFile(raw);
  if (!print.ok) {
    o.errorsWithoutPath.push(...print.errors.filter((e) => e.path === '').map((e) => `job ${i}: ${e.message}`));
    o.crashes.push(`job ${i}: a valid job file was refused: ${print.errors[0]?.path}: ${print.errors[0]?.message}`);
    return;
  }
  const now = new Date('2026-03-02T09:30:00Z');
  const traveller = travellerFor(print.value, settings, undefined, now);
  if (!traveller.ok) {
    o.crashes.push(`job ${i}: no traveller: ${traveller.errors[0]?.message}`);
    return;
  }
  const { model: quote } = draftQuote(print.value, settings, now);
  for (const [what, model, render] of [
    ['traveller', traveller.value, () => renderTraveller(traveller.value)],
    ['quote', quote, () => renderQuote(quote)],
  ] as const) {
    o.nonFinite.push(...nonFiniteNumbers(model).map((p) => `job ${i} ${what}: ${p}`));
    const t0 = performance.now();
    try {
      const pdf = await withLimit(render(), limitMs, `job ${i} ${what}`);
      if (pdf.length < 1000) o.crashes.push(`job ${i} ${what}: a ${pdf.length}-byte PDF`);
    } catch (e) {
      (/over \d+ ms/.test((e as Error).message) ? o.overTime : o.crashes).push(`job ${i} ${what}: ${(e as Error).message}`);
    }
    o.slowestMs = Math.max(o.slowestMs, performance.now() - t0);
    o.documents++;
  }
}

export async function fuzzPrint(options: { jobs: number; damaged: number; seed: number; limitMs: number; settings: Settings }): Promise<FuzzOutcome> {
  const o: FuzzOutcome = { jobs: 0, documents: 0, damaged: 0, crashes: [], nonFinite: [], errorsWithoutPath: [], overTime: [], slowestMs: 0 };
  const jobs = fc.sample(validJobFile, { numRuns: options.jobs, seed: options.seed });
  for (const [i, raw] of jobs.entries()) {
    await printOne(raw, i, options.settings, options.limitMs, o);
    o.jobs++;
  }
  for (const [i, raw] of fc.sample(damagedJobFile, { numRuns: options.damaged, seed: options.seed + 1 }).entries()) {
    try {
      const r = parsePrintFile(raw);
      if (!r.ok) o.errorsWithoutPath.push(...r.errors.filter((e) => e.path === '').map((e) => `damaged ${i}: ${e.message}`));
    } catch (e) {
      o.crashes.push(`damaged ${i}: ${(e as Error).message}`);
    }
    o.damaged++;
  }
  return o;
}
