import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { REVIEW_CAUTION, STORED_ENERGY_CAUTION, parseQuoteDocument, quoteDocument, withQuoteIssue } from '../../../core/documents';
import type { QuoteDocument } from '../../../core/documents';
import { documentText } from '../../../core/documents';
import { estimateCost } from '../../../core/costing/estimate';
import type { Settings } from '../../../core/settings/schema';
import type { Spec } from '../../../core/spec';
import { renderQuote } from '../../../service/pdf';
import { settingsWith, specOf, valveSpec } from './fixtures';
import { ISSUED_AT, norm, pageSizes, pdfText } from './helpers';

const job = {
  number: 'J-26-0007', customerName: 'Larkfield Test Machinery (demo)', customerLines: ['buyer@larkfield.example'],
  partNumber: 'LTM-77-118', drawingNumber: 'LT 77118', drawingRevision: '2', leadTimeDays: 21,
};

function quote(spec: Spec, settings: Settings): QuoteDocument {
  return quoteDocument({ spec, settings, job, estimate: estimateCost(spec, settings), issuedAt: ISSUED_AT });
}

describe('quote PDF', () => {
  const spec = specOf(valveSpec);
  const settings = settingsWith();
  const estimate = estimateCost(spec, settings);
  const model = quote(spec, settings);

  it('prints each price break at the unit price and total the estimate gives, in the shop\'s currency', async () => {
    expect(estimate.missing).toEqual([]);
    expect(estimate.breaks.map((b) => b.quantity)).toEqual([250, 1000, 5000]);
    const text = (await pdfText(await renderQuote(model))).all;
    expect(text).toContain('Unit price (EUR)');
    for (const b of estimate.breaks) {
      const row = `${documentText.piecesText(b.quantity)} ${documentText.unitPriceText(b.unitPrice)} ${documentText.moneyText(b.total)}`;
      expect(text).toContain(row);
    }
    // Unit prices fall with quantity: setup is shared by more pieces.
    const units = estimate.breaks.map((b) => b.unitPrice);
    expect(units[0]!).toBeGreaterThan(units[2]!);
  });

  it('states the spring in trade terms, the part, the lead time and the terms', async () => {
    const text = (await pdfText(await renderQuote(model))).all;
    for (const s of [
      'Wire Ø d 2.00 mm', 'Outside Ø De 22.00 mm', 'Free length L0 60.00 mm', 'Total coils nt 10', 'Active coils n 8',
      'Load F2 at L2 = 35.00 mm 70.0 N ±10 %', 'Ends closed and ground', 'Part number LTM-77-118', 'Drawing LT 77118 rev. 2',
      'Lead time 21 days from order and drawing approval', 'Over/under shipment: up to ±10 %', 'exclude tax and freight unless stated',
      'Valid until 2026-04-16', 'Fernhill Test Springs (demo)', 'Larkfield Test Machinery (demo)',
    ]) expect(text).toContain(s);
  });

  it('carries the cautions and numbers its pages', async () => {
    const { pages, all } = await pdfText(await renderQuote(model));
    expect(all).toContain(norm(REVIEW_CAUTION));
    expect(all).toContain(norm(STORED_ENERGY_CAUTION));
    pages.forEach((p, i) => expect(p).toContain(`Page ${i + 1} of ${pages.length}`));
  });

  it('is A4 when the shop prints on A4', async () => {
    const a4 = quote(spec, settingsWith({ defaults: { ...settings.defaults, paperSize: 'a4' } }));
    expect(a4.paperSize).toBe('a4');
    const sizes = await pageSizes(await renderQuote(a4));
    expect(sizes.length).toBeGreaterThan(0);
    for (const p of sizes) expect([Math.round(p.width), Math.round(p.height)]).toEqual([595, 842]);
    const letter = await pageSizes(await renderQuote(model));
    expect(letter[0]).toEqual({ width: 612, height: 792 });
  });

  it('takes the store\'s number and date at issue; validity stays as drafted', () => {
    expect(model.issue).toEqual({ number: 'DRAFT', date: '2026-03-02', validUntil: '2026-04-16', validityDays: 45 });
    const issued = withQuoteIssue(model, { number: 'Q-26-0003', issuedAt: '2026-03-05T10:00:00.000Z' }, 'UTC');
    expect(issued.issue).toEqual({ number: 'Q-26-0003', date: '2026-03-05', validUntil: '2026-04-19', validityDays: 45 });
    expect(issued.reference).toBe('Quotation Q-26-0003');
    expect(issued.lines).toEqual(model.lines);
  });

  it('dates the quote on the shop\'s day: issued at 7 pm in Chicago is that day, not the next UTC one', () => {
    // 2026-03-06T01:00Z is 19:00 on 5 March in Chicago (CST, UTC−6, before the 8 March change).
    const evening = withQuoteIssue(model, { number: 'Q-26-0004', issuedAt: '2026-03-06T01:00:00.000Z' }, 'America/Chicago');
    expect(evening.issue).toEqual({ number: 'Q-26-0004', date: '2026-03-05', validUntil: '2026-04-19', validityDays: 45 });
    expect(withQuoteIssue(model, { number: 'Q-26-0004', issuedAt: '2026-03-06T01:00:00.000Z' }, 'UTC').issue.date).toBe('2026-03-06');
  });

  it('prints the shop\'s logo, leaves out one it cannot read, and names the bake of a plated spring', async () => {
    const logo = await QRCode.toDataURL('Fernhill', { margin: 1 });
    const withLogo = quote(spec, settingsWith({ shopProfile: { ...settings.shopProfile, logo } }));
    expect(withLogo.letterhead.logo).toBe(logo);
    expect((await renderQuote(withLogo)).includes('/Subtype /Image')).toBe(true);
    expect((await renderQuote(model)).includes('/Subtype /Image')).toBe(false);
    const broken = quote(spec, settingsWith({ shopProfile: { ...settings.shopProfile, logo: 'data:image/png;base64,AAAA' } }));
    expect((await pdfText(await renderQuote(broken))).all).toContain('Fernhill Test Springs (demo)');

    const plated = quote(specOf({ ...valveSpec, finish: 'zinc', bakeSpecification: 'ISO 9588, per drawing note 3' }), settings);
    const text = (await pdfText(await renderQuote(plated))).all;
    expect(text).toContain('Finish Zinc plate, clear');
    expect(text).toContain('Hydrogen relief bake ISO 9588, per drawing note 3');
  });

  it('never embeds a file an SVG logo names, only images carried inside it', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-logo-'));
    const local = join(dir, 'private.png');
    writeFileSync(local, Buffer.from((await QRCode.toDataURL('private')).split(',')[1]!, 'base64'));
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="40" height="20"><rect width="40" height="20" fill="#246"/><image href="${local}" width="20" height="20"/></svg>`;
    const logo = `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`;
    const pdf = await renderQuote(quote(spec, settingsWith({ shopProfile: { ...settings.shopProfile, logo } })));
    rmSync(dir, { recursive: true, force: true });
    expect(pdf.includes('/Subtype /Image')).toBe(false);
    const embedded = svg.replace(local, await QRCode.toDataURL('inside', { margin: 1 }));
    const inside = `data:image/svg+xml;base64,${Buffer.from(embedded).toString('base64')}`;
    expect((await renderQuote(quote(spec, settingsWith({ shopProfile: { ...settings.shopProfile, logo: inside } })))).includes('/Subtype /Image')).toBe(true);
  });

  it('refuses a damaged stored model and names the field', () => {
    const damaged = JSON.parse(JSON.stringify(model)) as Record<string, unknown>;
    ((damaged.lines as Record<string, Record<string, unknown>>[])[0]!.prices!).table = null;
    const parsed = parseQuoteDocument(damaged);
    expect(parsed.ok).toBe(false);
    expect(!parsed.ok && parsed.errors[0]!.path).toBe('document.lines[0].prices.table');
    expect(parseQuoteDocument(JSON.parse(JSON.stringify(model))).ok).toBe(true);
  });
});
