import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { snapshotTimeZone } from '../../../core/calendar';
import { parseQuoteDocument, quoteDocument, travellerDocument, withQuoteIssue } from '../../../core/documents';
import { documentText } from '../../../core/documents';
import { estimateCost } from '../../../core/costing/estimate';
import { createJob, getQuote, openStore, recordQuote, saveSettings } from '../../../db';
import type { Store } from '../../../db';
import { renderQuote, renderTraveller } from '../../../service/pdf';
import { settingsWith, shop, specOf, valveSpec } from './fixtures';
import { ISSUED_AT, pdfText } from './helpers';

const job = {
  number: 'J-26-0009', customerName: 'Ossory Test Hardware (demo)', partNumber: 'OTH-6', drawingNumber: 'OTH-1206',
  drawingRevision: 'F', leadTimeDays: 14,
};

const dirs: string[] = [];
const stores: Store[] = [];
afterEach(() => {
  for (const s of stores.splice(0)) s.close();
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

function tempStore(): Store {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-docs-'));
  dirs.push(dir);
  const store = openStore(join(dir, 'shop.db'), { clock: () => new Date(ISSUED_AT) });
  stores.push(store);
  return store;
}

const ok = <T>(r: { ok: true; value: T } | { ok: false; error: unknown }): T => {
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value;
};

describe('the same model prints the same document', () => {
  const spec = specOf(valveSpec);
  const settings = settingsWith();

  it('renders a model twice, with another document between, or after a trip through JSON, to the same bytes and text', async () => {
    const model = quoteDocument({ spec, settings, job, estimate: estimateCost(spec, settings), issuedAt: ISSUED_AT });
    const traveller = travellerDocument({ spec, settings, job: { ...job, orderQuantity: 500, dueDate: null }, printedAt: ISSUED_AT });
    const first = await renderQuote(model);
    const between = await renderTraveller(traveller);
    const again = await renderQuote(model);
    const stored = await renderQuote(JSON.parse(JSON.stringify(model)));
    expect(first.subarray(0, 5).toString()).toBe('%PDF-');
    expect(again.equals(first)).toBe(true);
    expect(stored.equals(first)).toBe(true);
    expect((await pdfText(again)).all).toBe((await pdfText(first)).all);
    expect((await renderTraveller(JSON.parse(JSON.stringify(traveller)))).equals(between)).toBe(true);
  });

  it('reprints an issued quote from its snapshot after the shop\'s wire prices have changed', async () => {
    const store = tempStore();
    ok(saveSettings(store, shop));
    const created = ok(createJob(store, { customer: { name: job.customerName }, partNumber: job.partNumber, spec: valveSpec }));
    const estimate = estimateCost(spec, settings);
    const draft = quoteDocument({ spec, settings, job, estimate, issuedAt: ISSUED_AT });
    const issued = ok(recordQuote(store, {
      jobId: created.id, jobRevision: created.revision, validityDays: draft.issue.validityDays, prices: JSON.parse(JSON.stringify(estimate)),
      quantityBreaks: estimate.breaks.map((b) => b.quantity), document: JSON.parse(JSON.stringify(draft)), decision: null,
    }));
    const printed = await renderQuote(withQuoteIssue(draft, issued, settings.defaults.timeZone));

    const dearer = shop.materialPrices!.map((p) => ({ ...p, pricePerKg: p.pricePerKg * 3 }));
    ok(saveSettings(store, { materialPrices: dearer }));
    const today = estimateCost(spec, settingsWith({ materialPrices: dearer }));
    expect(today.breaks[0]!.unitPrice).toBeGreaterThan(estimate.breaks[0]!.unitPrice);

    const snapshot = ok(getQuote(store, { number: issued.number }));
    const parsed = parseQuoteDocument(snapshot.document);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const reprinted = await renderQuote(withQuoteIssue(parsed.value, snapshot, snapshotTimeZone(snapshot.settings)));
    expect(reprinted.equals(printed)).toBe(true);
    const text = (await pdfText(reprinted)).all;
    expect(text).toContain(issued.number);
    expect(text).toContain(documentText.unitPriceText(estimate.breaks[0]!.unitPrice));
    expect(text).not.toContain(documentText.unitPriceText(today.breaks[0]!.unitPrice));
  });
});
