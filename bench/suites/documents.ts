/**
 * Printing speed: one traveller warm (model and PDF), a run of 500, and the cost of the drawings and the
 * layout against a bare pdfkit document holding the same text.
 */
import PDFDocument from 'pdfkit';
import { travellerDocument } from '../../core/documents';
import type { TravellerDocument } from '../../core/documents';
import { settingsSchema } from '../../core/settings/schema';
import type { Settings } from '../../core/settings/schema';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { renderTraveller } from '../../service/pdf';
import { FONT, registerFonts } from '../../service/pdf/fonts';
import type { BenchRow, BenchSuite } from '../harness';

/** DEMO DATA: an invented shop for timing only. */
const settings: Settings = settingsSchema.parse({
  shopProfile: { name: 'Bench Spring Co. (demo)', addressLines: ['DEMO DATA'], phone: '', email: '' },
  machines: [
    { id: 'c', name: 'Bench coiler', operation: 'coil', wireRange: { min: 0.1, max: 8 }, hourlyRate: 70, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 50, maxPiecesPerMinute: 80 } },
    { id: 'o', name: 'Bench oven', operation: 'stress-relieve', wireRange: { min: 0, max: 16 }, hourlyRate: 30, setupMinutes: 10,
      batch: { capacityPieces: 10000, cycleMinutes: 45 } },
    { id: 'g', name: 'Bench grinder', operation: 'grind', wireRange: { min: 0.3, max: 16 }, hourlyRate: 60, setupMinutes: 30 },
  ],
  finishes: [{ id: 'zinc', name: 'Zinc plate', vendor: 'Demo Platers', pricePerKg: 3, electroplated: true, bakeSpecification: 'ASTM B850' }],
});

/** Varied invented springs, metric and inch, plain and plated. */
function specPool(count: number): Spec[] {
  return Array.from({ length: count }, (_, i) => {
    const d = 0.8 + (i % 9) * 0.3;
    const inch = i % 3 === 0;
    const k = inch ? 1 / 25.4 : 1;
    const parsed = parseSpec({
      kind: 'compression', units: inch ? 'inch' : 'metric', material: i % 2 ? 'en10270-1-dh' : 'astm-a228',
      wireDiameter: d * k, outerDiameter: d * (7 + (i % 5)) * k, totalCoils: 7 + (i % 6), ends: 'closed-ground',
      freeLength: d * 30 * k, loads: [{ length: d * 24 * k }], ...(i % 4 === 0 ? { finish: 'zinc' } : {}),
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    return parsed.value;
  });
}

function model(spec: Spec, i: number): TravellerDocument {
  return travellerDocument({
    spec, settings, printedAt: '2026-03-02T08:00:00.000Z',
    job: { number: `J-26-${String(i).padStart(4, '0')}`, customerName: 'Bench Customer (demo)', partNumber: `BC-${i}`,
      drawingNumber: `BC-D-${i}`, drawingRevision: 'A', orderQuantity: 1000 + i, dueDate: null },
  });
}

type Line = [font: string, text: string];

/** Every string the traveller prints, in reading order, in the weight it prints in (values bold). */
function texts(m: TravellerDocument): Line[] {
  const body = (ts: string[]): Line[] => ts.map((t) => [FONT.body, t]);
  const bold = (ts: string[]): Line[] => ts.map((t) => [FONT.bold, t]);
  const fields = (fs: { label: string; value: string }[]): Line[] => fs.flatMap((f): Line[] => [[FONT.body, f.label], [FONT.bold, f.value]]);
  return [
    ...bold([m.letterhead.name, m.title]), ...body(m.letterhead.addressLines), ...fields(m.job.fields), ...body(m.findings),
    ...fields(m.material.fields), ...body([...m.material.fillIn, ...m.safety]),
    ...m.operations.flatMap((o) => [...bold([`${o.sequence} ${o.title}`]), ...body([o.workCentre, ...o.fields.map((f) => `${f.label} ${f.value}`)]),
      ...fields(o.settings), ...body([...o.notes, ...o.signOff])]),
    ...body(m.inspection.summary), ...bold(m.inspection.table.columns.map((c) => c.header)), ...body(m.inspection.table.rows.flat()),
    ...body([...m.inspection.signOff, ...m.figures.map((f) => f.caption)]), ...bold([m.caution.title]), ...body(m.caution.paragraphs),
  ].filter(([, t]) => t !== '');
}

/** The same text in a bare pdfkit document: same fonts, running text, no drawing, boxes or page footers. */
function plainPdf(lines: Line[]): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'LETTER', info: { CreationDate: new Date('2026-03-02T08:00:00Z') } });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  doc.on('data', (c: Buffer) => chunks.push(c));
  registerFonts(doc);
  doc.fontSize(8.5);
  for (const [font, text] of lines) doc.font(font).text(text);
  doc.end();
  return done;
}

async function median(count: number, fn: (i: number) => Promise<unknown>): Promise<number> {
  const times: number[] = [];
  for (let i = 0; i < count; i++) {
    const t0 = performance.now();
    await fn(i);
    times.push(performance.now() - t0);
  }
  return middle(times);
}

function middle(times: number[]): number {
  const sorted = [...times].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

/** Both documents timed in turns, so a busy machine slows both alike and the ratio holds. */
async function paired(count: number, a: () => Promise<unknown>, b: () => Promise<unknown>): Promise<[number, number]> {
  const ta: number[] = [];
  const tb: number[] = [];
  for (let i = 0; i < count; i++) {
    let t0 = performance.now();
    await a();
    ta.push(performance.now() - t0);
    t0 = performance.now();
    await b();
    tb.push(performance.now() - t0);
  }
  return [middle(ta), middle(tb)];
}

export const documentsSuite: BenchSuite = {
  name: 'documents',
  async run(): Promise<BenchRow[]> {
    const pool = specPool(64);
    for (let i = 0; i < 5; i++) await renderTraveller(model(pool[i]!, i));
    const one = await median(20, (i) => renderTraveller(model(pool[i]!, i)));
    const t0 = performance.now();
    for (let i = 0; i < 500; i++) await renderTraveller(model(pool[i % pool.length]!, i));
    const run = (performance.now() - t0) / 1000;
    const fixed = model(pool[1]!, 1);
    const lines = texts(fixed);
    for (let i = 0; i < 5; i++) await plainPdf(lines);
    const [full, plain] = await paired(20, () => renderTraveller(fixed), () => plainPdf(lines));
    const ratio = full / plain;
    return [
      { suite: 'documents', name: 'traveller, model + PDF, warm (median of 20)', value: one, unit: 'ms', target: '< 100', pass: one < 100 },
      { suite: 'documents', name: '500 travellers', value: run, unit: 's', target: '< 60', pass: run < 60 },
      { suite: 'documents', name: 'traveller PDF from its model (median of 20)', value: full, unit: 'ms' },
      { suite: 'documents', name: 'same text, bare pdfkit, no drawing (median of 20)', value: plain, unit: 'ms' },
      { suite: 'documents', name: 'ratio traveller / bare text', value: ratio, unit: '×', target: '≤ 2', pass: ratio <= 2 },
    ];
  },
};
