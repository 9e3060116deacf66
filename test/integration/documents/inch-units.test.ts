import { describe, expect, it } from 'vitest';
import { estimateCost } from '../../../core/costing/estimate';
import { quoteDocument, travellerDocument } from '../../../core/documents';
import { planInSpecUnits, planManufacture } from '../../../core/process/plan';
import { renderQuote, renderTraveller } from '../../../service/pdf';
import { inchSpec, settingsWith, specOf, valveSpec } from './fixtures';
import { ISSUED_AT, pdfText } from './helpers';

/** Every text of a value, its keys left out: what a screen or a paper could show. */
function texts(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(texts);
  if (value && typeof value === 'object') return Object.values(value).flatMap(texts);
  return [];
}

const MILLIMETRE = /\bmm\b|\dmm|N\/mm|N·mm/;
const metricWords = (all: string[]) => all.filter((t) => MILLIMETRE.test(t));

describe('an inch job shows no millimetres', () => {
  // Electroplated with a bake, a ground end, no grinder that takes the wire: the plan's notes, findings,
  // settings and the cost basis all have something to say.
  const settings = settingsWith({ machines: settingsWith().machines.filter((m) => m.operation !== 'grind') });
  const spec = specOf({ ...inchSpec, finish: 'zinc', bakeSpecification: 'ASTM B850, 22 h at 200 °C', quantities: [500, 2000] });
  const job = {
    number: 'J-26-0031', customerName: 'Demo Ridge Hinges', customerLines: ['4 Mill Lane'], partNumber: 'RH-9',
    drawingNumber: 'RH 9', drawingRevision: 'A', leadTimeDays: 15, orderQuantity: 2000, dueDate: null, purchaseOrder: 'PO-1',
  };

  it('in the plan: messages, settings and notes', () => {
    const plan = planManufacture(spec, settings, 2000);
    expect(plan.operations.some((op) => op.notes.some((n) => n.includes('no grind machine')))).toBe(true);
    const shown = planInSpecUnits(plan);
    // The same search finds the millimetres of a metric job, so an empty list means there are none.
    const metric = planInSpecUnits(planManufacture(specOf({ ...valveSpec, finish: 'zinc' }), settings, 2000));
    expect(metricWords(texts(metric.operations)).length).toBeGreaterThan(0);
    expect(metricWords([...texts(shown.operations), ...texts(shown.findings), ...texts(shown.inspection.characteristics)])).toEqual([]);
    // The B850 chart is in MPa; an inch job reads the wire's strength and the chart's edge in psi:
    // 1800 MPa / 6.894757 kPa per psi (NIST SP 811 B.8) = 261,068 psi.
    const bake = shown.findings.find((f) => f.code === 'bake-spec-not-covered');
    expect(bake?.message).toMatch(/\d psi is beyond the partial table \(up to 261068 psi\)/);
    expect(texts(shown.findings).filter((t) => /MPa/.test(t))).toEqual([]);
  });

  it('in the cost: every line\'s basis and every gap', () => {
    const estimate = estimateCost(spec, settings);
    expect(metricWords([...texts(estimate.breaks), ...texts(estimate.missing)])).toEqual([]);
    expect(estimate.breaks[0]!.lines.find((l) => l.key === 'material')?.basis).toMatch(/\d lb\)/);
  });

  it('on the quote and the traveller PDFs', async () => {
    const estimate = estimateCost(spec, settings);
    const quote = await pdfText(await renderQuote(quoteDocument({ spec, settings, job, estimate, issuedAt: ISSUED_AT })));
    const traveller = await pdfText(await renderTraveller(travellerDocument({ spec, settings, job, printedAt: ISSUED_AT })));
    expect(quote.all).toContain('in');
    for (const doc of [quote.all, traveller.all]) expect(doc.match(new RegExp(MILLIMETRE, 'g'))).toBeNull();
  });
});
