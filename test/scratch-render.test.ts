import { writeFileSync } from 'node:fs';
import { it } from 'vitest';
import { quoteDocument, travellerDocument } from '../core/documents';
import { estimateCost } from '../core/costing/estimate';
import { renderQuote, renderTraveller } from '../service/pdf';
import { settingsWith, specOf, valveSpec, inchSpec } from '../test/integration/documents/fixtures';

it('renders', async () => {
  const settings = settingsWith({ quoteTerms: { estimator: 'P. Demo', priceCurveOnQuote: true } });
  for (const [name, input] of [['metric', { ...valveSpec, finish: 'zinc', bakeSpecification: 'ISO 4042, 4 h at 200 °C', duty: { type: 'cyclic', cycles: 1e6, between: [45, 35] } }], ['inch', { ...inchSpec, finish: 'oil' }]] as const) {
    const spec = specOf(input);
    const job = { number: 'J-26-0007', customerName: 'Larkfield (demo)', customerLines: ['Attn. R. Okafor', '4 Mill Lane', 'buyer@l.example'],
      partNumber: 'LTM-1', drawingNumber: 'LT 1', drawingRevision: '2', leadTimeDays: 21, orderQuantity: 1000, dueDate: null, purchaseOrder: 'PO-5521' };
    const q = quoteDocument({ spec, settings, job, estimate: estimateCost(spec, settings), issuedAt: '2026-03-02T09:30:00.000Z', terms: { enquiryReference: 'RFQ-88' } });
    writeFileSync(`/tmp/td/${name}-quote.pdf`, await renderQuote(q));
    const t = travellerDocument({ spec, settings, job, printedAt: '2026-03-02T09:30:00.000Z' });
    writeFileSync(`/tmp/td/${name}-trav.pdf`, await renderTraveller(t));
    writeFileSync(`/tmp/td/${name}-trav.json`, JSON.stringify(t, (k, v) => (k === 'svg' ? '…' : v), 1));
  }
}, 60000);
