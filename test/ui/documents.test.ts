import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { PDFParse } from 'pdf-parse';
import type { Download, Page } from 'playwright-core';
import { screenshot, shopSession } from './support';

async function pdfOf(download: Download): Promise<{ bytes: Buffer; text: string }> {
  const bytes = readFileSync(await download.path());
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    return { bytes, text };
  } finally {
    await parser.destroy();
  }
}

/** PDF writing is the slowest work of the UI suite. */
const PDF_TEST_TIMEOUT = 90_000;

/** Travellers and quotes as PDFs, one job at a time and for a selection of jobs. */
describe('printed documents', { timeout: PDF_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(() => { ({ page, errors } = session); });

  /** Opens the demo job of a drawing number (unique among the demo jobs) and gives its job number. */
  const openDemoJob = async (drawing: string): Promise<string> => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('searchbox', { name: 'Search' }).fill(drawing);
    const open = page.locator('table.jobs tbody tr').filter({ hasText: drawing }).getByRole('button', { name: /^Open job / });
    const name = (await open.getAttribute('aria-label'))!;
    await open.click();
    await page.locator('[data-save="ok"]').waitFor();
    return name.replace('Open job ', '');
  };

  it('prints a traveller and a quote of a job as valid PDFs, and reprints the issued quote', async () => {
    const number = await openDemoJob('RRC-03-02');
    await page.getByRole('tab', { name: 'Documents' }).click();
    const travellerDownload = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Print traveller (PDF)' }).click();
    const traveller = await pdfOf(await travellerDownload);
    expect(traveller.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(traveller.text).toContain(number);
    expect(traveller.text).toContain('Quantity ordered 2,000 pcs');

    // This demo job has an open error: the issue asks for a decision naming it, with a reason.
    await page.getByRole('button', { name: 'Issue and print quote (PDF)' }).click();
    const decision = page.getByRole('dialog', { name: 'Issue this quote with its problems?' });
    await decision.waitFor();
    await expect.poll(() => decision.locator('[data-code="solid-stress-over-set-removed-allowable"]').count(), { timeout: 10_000 }).toBe(1);
    await expect(decision.getByRole('button', { name: 'Accept and issue' }).isDisabled()).resolves.toBe(true);
    await decision.getByLabel('Reason for accepting them').fill('customer fits a stop at the working length');
    await screenshot(page, 'workspace-issue-decision');
    const quoteDownload = page.waitForEvent('download');
    await decision.getByRole('button', { name: 'Accept and issue' }).click();
    const quote = await pdfOf(await quoteDownload);
    expect(quote.text).toContain('Accepted deviations from the drawing');
    expect(quote.text).toContain('permanent set when compressed to solid');
    const quoteNumber = /Q-\d\d-\d{4}/.exec(quote.text)?.[0];
    expect(quoteNumber).toBeDefined();
    const row = page.locator('tr', { hasText: quoteNumber! });
    await row.waitFor();
    await expect(row.locator('td').nth(1).textContent()).resolves.toBe(new Date().toISOString().slice(0, 10));
    await screenshot(page, 'workspace-documents');
    const reprintDownload = page.waitForEvent('download');
    await row.getByRole('button', { name: `Reprint ${quoteNumber}` }).click();
    expect((await pdfOf(await reprintDownload)).text).toContain(quoteNumber);
  });

  it('asks whether an edit of the quoted job is a new drawing revision or a correction', async () => {
    await page.getByRole('tab', { name: 'Spec & results' }).click();
    const coils = page.getByRole('textbox', { name: 'Total coils Nt', exact: true });
    const before = await coils.inputValue();
    await coils.fill(String(Number(before) + 0.5));
    const ask = page.locator('.change-kind');
    await ask.waitFor();
    await expect(ask.textContent()).resolves.toMatch(/new drawing revision, or a correction/);
    await screenshot(page, 'workspace-change-kind');
    await ask.getByRole('button', { name: 'Correction' }).click();
    await ask.waitFor({ state: 'detached' });
    await page.locator('[data-save="ok"]').waitFor();
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByText('correction', { exact: true }).first().waitFor();
  });

  it('prints travellers for the selected jobs with progress, and stops when cancelled', async () => {
    await page.keyboard.press('Alt+1');
    await page.locator('table.jobs tbody tr').first().waitFor();
    const boxes = page.getByRole('checkbox', { name: /^Select job / });
    for (let i = 0; i < 2; i++) await boxes.nth(i).check();
    await page.getByRole('button', { name: 'Print travellers (2)' }).click();
    const dialog = page.getByRole('dialog', { name: 'Printing travellers' });
    await dialog.getByText('2 of 2, finished').waitFor();
    await expect(dialog.getByRole('progressbar', { name: 'Travellers' }).getAttribute('value')).resolves.toBe('2');
    await expect.poll(() => dialog.getByRole('listitem').count(), { timeout: 10_000 }).toBe(2);
    await screenshot(page, 'batch-print');
    await dialog.getByRole('button', { name: 'Close', exact: true }).click();

    await page.getByRole('checkbox', { name: 'Select every job on this page' }).check();
    const all = await boxes.count();
    // The first traveller is held at the network until cancel has been pressed, so the run stops after it.
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => { release = resolve; });
    await page.route('**/api/printTraveller', async (route) => {
      await held;
      await route.continue();
    });
    await page.getByRole('button', { name: `Print travellers (${all})` }).click();
    await dialog.getByRole('button', { name: 'Cancel after this job' }).click();
    release();
    await dialog.getByText(`1 of ${all}, cancelled`).waitFor();
    await expect.poll(() => dialog.getByRole('listitem').count(), { timeout: 10_000 }).toBe(1);
    await page.unroute('**/api/printTraveller');
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
