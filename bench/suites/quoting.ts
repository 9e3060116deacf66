import { estimateCost } from '../../core/costing/estimate';
import { quotationDocument } from '../../core/documents';
import { jobJudgementSchema } from '../../core/quoting/judgement';
import { settingsSchema } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import type { Settings } from '../../core/settings/schema';
import { demoSettings } from '../../db/demo/shop';
import { renderQuote } from '../../service/pdf';
import type { BenchRow, BenchSuite } from '../harness';
import { latencies } from '../harness';

/** Invented parts (demo data): compression springs of several sizes, closed and ground, priced at five breaks. */
function specs(): Spec[] {
  return [0.8, 1.6, 2.5, 4, 6.3].map((d) => {
    const r = parseSpec({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: d, outerDiameter: d * 9,
      totalCoils: 9, ends: 'closed-ground', freeLength: d * 9 * 2.6, loads: [{ length: d * 9 * 2.0 }] });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    return r.value;
  });
}

const QUOTATION_LINES = 20;

/** A quotation of 20 lines for one invented customer (demo data): every line priced, the model built and the PDF drawn. */
async function quotationPdf(settings: Settings, pool: readonly Spec[], breaks: number[]): Promise<{ ms: number; cpuMs: number; pdfMs: number; bytes: number }> {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const lines = Array.from({ length: QUOTATION_LINES }, (_, i) => {
    const spec = pool[i % pool.length]!;
    return {
      spec, estimate: estimateCost(spec, settings, breaks, { orderQuantity: 1000 }),
      job: { number: `J-26-${String(i + 1).padStart(4, '0')}`, customerName: 'Bench Customer (demo)', partNumber: `BC-${i + 1}`,
        drawingNumber: `BC-D-${i + 1}`, drawingRevision: 'A', leadTimeDays: 20 },
    };
  });
  const model = quotationDocument({ settings, issuedAt: '2026-11-02T09:00:00.000Z', number: 'Q-26-0001', lines });
  const t1 = performance.now();
  const pdf = await renderQuote(model);
  const t2 = performance.now();
  const cpu = process.cpuUsage(cpu0);
  return { ms: t2 - t0, cpuMs: (cpu.user + cpu.system) / 1000, pdfMs: t2 - t1, bytes: pdf.length };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export const quotingSuite: BenchSuite = {
  name: 'quoting',
  async run(): Promise<BenchRow[]> {
    const settings = settingsSchema.parse(demoSettings);
    const pool = specs();
    const judgement = jobJudgementSchema.parse({
      routing: [{ operation: 'grind', machine: 'grind-1', reason: 'bench: pinned' }],
      price: { marginPercent: { value: 18, reason: 'bench' }, unitPrices: [{ quantity: 1000, unitPrice: 1.1, reason: 'bench' }], charges: [{ label: 'Tooling', amount: 200 }] },
    });
    let sink = 0;
    const breaks = [100, 500, 1000, 5000, 20_000];
    const price = (i: number) => { sink += estimateCost(pool[i % pool.length]!, settings, breaks, { judgement, orderQuantity: 1000 }).breaks.length; };
    for (let i = 0; i < 200; i++) price(i);
    const t = latencies((i) => { sink += estimateCost(pool[i % pool.length]!, settings, breaks, { judgement, orderQuantity: 1000 }).breaks.length; }, 400);
    // CPU time per call holds still on a shared machine where wall-clock percentiles catch other processes' time slices.
    const cpu0 = process.cpuUsage();
    for (let i = 0; i < 200; i++) price(i);
    const cpu = process.cpuUsage(cpu0);
    const cpuMs = (cpu.user + cpu.system) / 1000 / 200;
    if (sink === 42) console.log('');
    await quotationPdf(settings, pool, breaks);
    const runs: Awaited<ReturnType<typeof quotationPdf>>[] = [];
    for (let i = 0; i < 5; i++) runs.push(await quotationPdf(settings, pool, breaks));
    const whole = median(runs.map((r) => r.ms));
    const quotationCpuMs = median(runs.map((r) => r.cpuMs));
    return [
      { suite: 'quoting', name: `${QUOTATION_LINES}-line quotation: price, model and PDF (median of 5, warm)`, value: whole, unit: 'ms', target: '< 1000', pass: whole < 1000 },
      { suite: 'quoting', name: `${QUOTATION_LINES}-line quotation: price, model and PDF (CPU time, median of 5)`, value: quotationCpuMs, unit: 'ms', target: '< 1000', pass: quotationCpuMs < 1000 },
      { suite: 'quoting', name: `${QUOTATION_LINES}-line quotation: PDF drawing alone (median of 5)`, value: median(runs.map((r) => r.pdfMs)), unit: 'ms' },
      { suite: 'quoting', name: `${QUOTATION_LINES}-line quotation: PDF size`, value: runs[0]!.bytes / 1024, unit: 'KiB' },
      { suite: 'quoting', name: 'price one job at 5 breaks (CPU time per job)', value: cpuMs, unit: 'ms', target: '< 5', pass: cpuMs < 5 },
      { suite: 'quoting', name: 'price one job at 5 breaks (p95)', value: t.p95, unit: 'ms', target: '< 5', pass: t.p95 < 5 },
      { suite: 'quoting', name: 'price one job at 5 breaks (p50)', value: t.p50, unit: 'ms' },
    ];
  },
};
