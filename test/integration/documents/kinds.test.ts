import { describe, expect, it } from 'vitest';
import { quoteDocument, travellerDocument } from '../../../core/documents';
import { estimateCost } from '../../../core/costing/estimate';
import { formatQuantity } from '../../../core/format';
import { planManufacture } from '../../../core/process/plan';
import { renderQuote, renderTraveller } from '../../../service/pdf';
import { drawbarExtension, lidTorsion } from '../../fixtures/specs';
import { settingsWith, specOf } from './fixtures';
import { ISSUED_AT, pdfText } from './helpers';

const job = {
  number: 'J-26-0077', customerName: 'Brackenfield Gates (demo)', partNumber: 'BG-20', drawingNumber: 'BG-D-20',
  drawingRevision: 'A', orderQuantity: 2000, dueDate: '2026-05-04', leadTimeDays: 15,
};

describe('extension and torsion springs on the same documents', () => {
  const settings = settingsWith();

  it('an extension spring\'s traveller prints its loops, initial tension and the load test at length', async () => {
    const spec = specOf({ ...drawbarExtension, finish: 'zinc', bakeSpecification: 'ASTM B850' });
    const model = travellerDocument({ spec, settings, job, printedAt: ISSUED_AT });
    const text = (await pdfText(await renderTraveller(model))).all;
    expect(text).toContain('Coil close-wound');
    expect(text).toContain('End 1 full loop End 2 full loop');
    expect(text).toContain(`Initial tension (after stress relief) ${formatQuantity(8, 'force', 'metric')}`);
    expect(text).toMatch(/Load test at length/);
    expect(text).toMatch(/never stretch/i);
    expect(text).toContain('Free length inside ends');
    const plan = planManufacture(spec, settings, 2000);
    expect(text).toContain(`Wire per piece ${formatQuantity(plan.wireLengthPerPiece, 'length', 'metric')}`);
  });

  it('a torsion spring\'s traveller prints its legs, wind and the torque test, and says its tolerances are the shop\'s', async () => {
    const spec = specOf({ ...lidTorsion, freeAngle: 90, loads: [{ angle: 60, torque: 400 }] });
    const model = travellerDocument({ spec, settings, job, printedAt: ISSUED_AT });
    const text = (await pdfText(await renderTraveller(model))).all;
    expect(text).toContain('Coil with legs');
    expect(text).toMatch(/Torque test at angle/);
    expect(text).toContain('Torque at 60° 400 N·mm 360 N·mm to 440 N·mm');
    expect(text).toContain('Direction of wind right-hand');
    expect(text).toContain('Torque–angle diagram');
    expect(text).toMatch(/shop-entered/);
  });

  it('quotes price them like any other kind', async () => {
    for (const input of [drawbarExtension, lidTorsion]) {
      const spec = specOf({ ...input, quantities: [500, 5000] });
      const estimate = estimateCost(spec, settings);
      const model = quoteDocument({ spec, settings, estimate, issuedAt: ISSUED_AT, validityDays: 30, job });
      const text = (await pdfText(await renderQuote(model))).all;
      expect(text).toContain(spec.kind === 'extension' ? 'Helical extension spring' : 'Helical torsion spring');
      expect(text).toMatch(/5,000|5 000|5000/);
    }
  });
});
