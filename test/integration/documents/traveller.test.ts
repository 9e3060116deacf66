import { describe, expect, it } from 'vitest';
import { REVIEW_CAUTION, STORED_ENERGY_CAUTION, travellerDocument } from '../../../core/documents';
import type { TravellerDocument } from '../../../core/documents';
import { formatQuantity } from '../../../core/format';
import { planManufacture } from '../../../core/process/plan';
import type { Settings } from '../../../core/settings/schema';
import type { Spec } from '../../../core/spec';
import { renderTraveller } from '../../../service/pdf';
import { inchSpec, setSpringSpec, settingsWith, specOf, valveSpec } from './fixtures';
import { ISSUED_AT, norm, pageSizes, pdfText } from './helpers';

const job = {
  number: 'J-26-0042', customerName: 'Kestrel Test Pumps (demo)', partNumber: 'KTP-118', drawingNumber: 'KTP-D-118',
  drawingRevision: 'C', orderQuantity: 1000, dueDate: '2026-04-15',
};

function traveller(spec: Spec, settings: Settings = settingsWith(), orderQuantity = 1000): TravellerDocument {
  return travellerDocument({ spec, settings, job: { ...job, orderQuantity }, printedAt: ISSUED_AT });
}

const field = (fields: { label: string; value: string }[], label: string) => fields.find((f) => f.label === label)?.value;

describe('traveller PDF', () => {
  const spec = specOf(setSpringSpec);
  const settings = settingsWith();
  const plan = planManufacture(spec, settings, 1000);
  const model = traveller(spec, settings);

  it('says the day it was printed on in the shop\'s time zone', () => {
    expect(field(model.job.fields, 'Printed')).toBe('2026-03-02');
    // 02:00 UTC on 3 March is 20:00 on 2 March in Chicago (CST, UTC−6).
    const evening = travellerDocument({ spec, settings: settingsWith({ defaults: { ...settings.defaults, timeZone: 'America/Chicago' } }),
      job: { ...job }, printedAt: '2026-03-03T02:00:00.000Z' });
    expect(field(evening.job.fields, 'Printed')).toBe('2026-03-02');
  });

  it('prints the plan\'s wire per piece, coiled free length and sample, formatted as the model formats them', async () => {
    const wire = formatQuantity(plan.wireLengthPerPiece, 'length', 'metric');
    const coiled = formatQuantity(plan.coiledFreeLength!, 'length', 'metric');
    expect(plan.coiledFreeLength!).toBeGreaterThan(plan.freeLength!);
    expect(field(model.material.fields, 'Wire per piece')).toBe(wire);
    const coil = model.operations.find((o) => o.title.startsWith('Coil'))!;
    expect(field(coil.settings, 'Coiled free length')).toBe(coiled);
    // Lot 1000 at AQL 1.0, normal single sampling, level II: code J, n = 80, Ac 2 / Re 3 (ISO 2859-1 Table 1 and Table 2-A).
    expect(plan.inspection).toMatchObject({ code: 'J', sampleSize: 80, accept: 2, reject: 3 });
    const text = (await pdfText(await renderTraveller(model))).all;
    expect(text).toContain(`Wire per piece ${wire}`);
    expect(text).toContain(`Coiled free length ${coiled}`);
    expect(text).toContain('sample n = 80, accept Ac 2, reject Re 3');
    expect(text).toContain('n = 80, Ac 2 / Re 3');
    expect(text).toContain(norm(field(model.material.fields, 'Wire mass for the lot')!));
  });

  it('numbers every page "Page X of Y" and prints the cautions, the sign-off boxes and the heat number box', async () => {
    const { pages, all } = await pdfText(await renderTraveller(model));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    pages.forEach((p, i) => expect(p).toContain(`Page ${i + 1} of ${pages.length}`));
    expect(all).toContain(norm(REVIEW_CAUTION));
    expect(all).toContain(norm(STORED_ENERGY_CAUTION));
    expect(all).toContain('press to solid only in a guarded fixture');
    expect(all).toContain('Heat / lot number');
    const signOffs = all.split('Operator Date Qty good Qty scrap').length - 1;
    expect(signOffs).toBe(model.operations.filter((o) => !o.outside).length);
  });

  it('is Letter or A4 as the shop\'s settings say', async () => {
    const letter = await pageSizes(await renderTraveller(model));
    const a4 = await pageSizes(await renderTraveller(traveller(spec, settingsWith({ defaults: { ...settings.defaults, paperSize: 'a4' } }))));
    for (const p of letter) expect([p.width, p.height]).toEqual([612, 792]);
    for (const p of a4) {
      expect(p.width).toBeCloseTo(595.28, 1);
      expect(p.height).toBeCloseTo(841.89, 1);
    }
  });

  it('names the bake specification as given, and refuses to release plating without one', async () => {
    const named = traveller(specOf({ ...valveSpec, finish: 'zinc', bakeSpecification: 'ASTM B850, 22 h at 200 °C' }));
    const text = (await pdfText(await renderTraveller(named))).all;
    expect(text).toContain('Bake to the named specification: ASTM B850, 22 h at 200 °C.');
    expect(text).toContain('Hydrogen embrittlement');
    const unnamed = traveller(specOf({ ...valveSpec, finish: 'zinc' }));
    expect(unnamed.safety.join(' ')).toContain('NO BAKE SPECIFICATION IS NAMED');
    expect(unnamed.findings.some((f) => f.startsWith('ERROR') && /bake/i.test(f))).toBe(true);
    const plain = traveller(specOf(valveSpec));
    expect(plain.safety.join(' ')).not.toContain('Hydrogen embrittlement');
  });

  it('tests every piece when the load tolerance is tight (under ±5 %)', () => {
    const tight = traveller(specOf({ ...valveSpec, loads: [{ length: 45 }, { length: 35, force: 70, tolerancePercent: 3 }] }));
    const row = tight.inspection.table.rows.find((r) => r[0]!.startsWith('Force at L2'))!;
    expect(row[4]).toBe('100 %');
  });

  it('prints an inch job in inches and pounds-force, and the lot wire in metres and kilograms with feet and pounds', async () => {
    const inch = traveller(specOf(inchSpec), settingsWith(), 500);
    const p = planManufacture(specOf(inchSpec), settingsWith(), 500);
    expect(field(inch.material.fields, 'Wire Ø d')).toBe('0.047 in');
    expect(field(inch.material.fields, 'Wire per piece')).toBe(formatQuantity(p.wireLengthPerPiece, 'length', 'inch'));
    expect(field(inch.material.fields, 'Min. tensile strength')).toMatch(/^\d{3},\d{3} psi$/);
    expect(field(inch.material.fields, 'Wire mass for the lot')).toMatch(/^[\d,.]+ kg \([\d.]+ lb\)$/);
    const force = inch.inspection.table.rows.find((r) => r[0]!.startsWith('Force at L1'))!;
    expect(force[0]).toBe('Force at L1 = 1.250 in');
    expect(force[1]).toBe('2.50 lbf');
    const text = (await pdfText(await renderTraveller(inch))).all;
    expect(text).toContain('2.25 lbf to 2.75 lbf');
  });

  it('puts the job number in the QR code and leaves the code out for a job not in the store', async () => {
    expect(model.qr).toBe('J-26-0042');
    const unstored = travellerDocument({ spec, settings, job: { ...job, number: null }, printedAt: ISSUED_AT });
    expect(unstored.qr).toBeNull();
    expect((await pdfText(await renderTraveller(unstored))).all).toContain('not in the job store');
  });
});
