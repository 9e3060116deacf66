import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { PDFParse } from 'pdf-parse';
import type { Page } from 'playwright-core';
import { DEMO_CUSTOMER, requestCsv, requestRows, requestXlsx } from '../support/request-sheets';
import { UI_TEST_TIMEOUT, field, screenshot, shopSession, unnamedControls } from './support';

/** Uploads a sheet, names the customer, fixes the one marked cell, imports, and checks the enquiry's jobs. */
async function importSheet(page: Page, file: { name: string; mimeType: string; buffer: Buffer }, reference: string, shot: string, decimalComma: boolean) {
  await page.getByRole('button', { name: 'Request sheets' }).click();
  await page.getByRole('heading', { name: 'Import a request sheet', level: 1 }).waitFor();
  await page.getByLabel('Request sheet (CSV or XLSX, one spring per row)').setInputFiles(file);
  // As the estimator does: the sheet is read (and its reference proposed from the file name) before they type over it.
  await page.getByRole('status').filter({ hasText: `${file.name}: ` }).filter({ hasText: 'rows read.' }).waitFor();
  const referenceBox = page.getByRole('textbox', { name: 'Enquiry reference', exact: true });
  await expect(referenceBox.inputValue()).resolves.toBe(file.name.replace(/\.[^.]+$/, ''));
  await field(page, 'Customer').fill(DEMO_CUSTOMER);
  await referenceBox.fill(reference);
  await expect(referenceBox.inputValue()).resolves.toBe(reference);
  const counts = page.getByRole('status').filter({ hasText: /rows? ready/ });
  await counts.waitFor();
  await page.getByRole('combobox', { name: 'Decimal mark' }).selectOption(decimalComma ? ',' : '.');
  await counts.filter({ hasText: '9 rows ready, 1 to fix' }).waitFor();

  // The bad wire diameter of the seventh spring is marked with its cell reference and the reason.
  const marked = page.locator('td.request-cell--error');
  await expect.poll(() => marked.count(), { timeout: 10_000 }).toBe(1);
  const ref = await marked.getAttribute('data-ref');
  expect(ref).toMatch(/^E\d+$/);
  await expect(page.getByText(/Wire diameter: "1,6\.0x"/).first().isVisible()).resolves.toBe(true);
  const importButton = page.getByRole('button', { name: /^Import \d+ jobs? as one enquiry$/ });
  await expect(importButton.isDisabled()).resolves.toBe(true);
  await marked.scrollIntoViewIfNeeded();
  await screenshot(page, `${shot}-marked`);

  await page.getByLabel(`New value for ${ref}`).fill(decimalComma ? '1,5' : '1.5');
  await page.getByRole('button', { name: 'Use' }).click();
  await counts.filter({ hasText: '10 rows ready, 0 to fix' }).waitFor();
  await expect.poll(() => marked.count(), { timeout: 10_000 }).toBe(0);
  await page.getByRole('button', { name: 'Import 10 jobs as one enquiry' }).click();

  const jobs = page.getByRole('table', { name: `Jobs of enquiry ${reference}` });
  await jobs.waitFor().catch(async (e: unknown) => {
    // What the screen said instead (an error, a status), with a picture, so a rare failure names its cause.
    await screenshot(page, `${shot}-not-imported`);
    const said = await page.locator('[role=alert], [role=status], .panel__title').allInnerTexts();
    throw new Error(`${(e as Error).message}\nthe screen said: ${said.join(' | ')}`);
  });
  await expect.poll(() => jobs.locator('tbody tr').count(), { timeout: 10_000 }).toBe(10);
  await expect(jobs.locator('tbody tr').nth(6).textContent()).resolves.toMatch(/HV-1006.*Compression.*draft/);
  await jobs.scrollIntoViewIfNeeded();
  await screenshot(page, `${shot}-imported`);
}

describe('importing a customer\'s request sheet', { timeout: UI_TEST_TIMEOUT * 2 }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  beforeAll(() => { ({ page, errors } = session); });

  it('imports a 10-row CSV with decimal commas after the bad cell is fixed in the preview', async () => {
    const csv = requestCsv(requestRows(10, { decimalMark: ',', badRow: 6 }), ';');
    await importSheet(page, { name: 'halden-rfq-118.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) }, 'RFQ-118', 'request-sheet-csv', true);
    expect((await unnamedControls(page)).unnamed).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('quotes the enquiry as one quotation of ten lines, in sheet order', async () => {
    const quoteDownload = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Quote enquiry RFQ-118 (10)' }).click();
    // Draft jobs from a sheet may carry open findings or an unpriced operation: the estimator states why they go out.
    const decision = page.getByRole('dialog', { name: 'Issue this quote with its problems?' });
    const asked = await Promise.race([decision.waitFor().then(() => true), quoteDownload.then(() => false)]);
    if (asked) {
      await decision.getByLabel('Reason for accepting them').fill('budget prices for the customer\'s enquiry; drawings to follow');
      await decision.getByRole('button', { name: 'Accept and issue' }).click();
    }
    const download = await quoteDownload;
    const parser = new PDFParse({ data: new Uint8Array(readFileSync(await download.path())) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Item 1: HV-1000');
    expect(text.indexOf('Item 10: HV-1009')).toBeGreaterThan(text.indexOf('Item 1: HV-1000'));
    await page.getByRole('status').filter({ hasText: '10 lines' }).waitFor();
    const jobs = page.getByRole('table', { name: 'Jobs of enquiry RFQ-118' });
    await expect.poll(() => jobs.locator('tbody tr').filter({ hasText: 'quoted' }).count(), { timeout: 10_000 }).toBe(10);
    expect(errors).toEqual([]);
  });

  it('imports a 10-row XLSX with the customer\'s mapping kept from the first sheet, and opens a job of the enquiry', async () => {
    const xlsx = await requestXlsx(requestRows(10, { badRow: 6 }));
    await page.getByRole('button', { name: 'Jobs' }).first().click();
    await importSheet(page, { name: 'halden-rfq-119.xlsx', mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', buffer: xlsx },
      'RFQ-119', 'request-sheet-xlsx', false);
    // The columns came from the mapping kept with the first sheet.
    await expect.poll(() => page.locator('.request-origin--saved').count(), { timeout: 10_000 }).toBe(12);
    // Both enquiries are listed; the first one's jobs open from the list, as a quotation of them would pick them.
    await page.getByRole('button', { name: 'Jobs of RFQ-118' }).click();
    const earlier = page.getByRole('table', { name: 'Jobs of enquiry RFQ-118' });
    await earlier.waitFor();
    await expect.poll(() => earlier.locator('tbody tr').count(), { timeout: 10_000 }).toBe(10);
    await earlier.scrollIntoViewIfNeeded();
    await screenshot(page, 'request-sheet-enquiries');
    await page.getByRole('table', { name: 'Jobs of enquiry RFQ-119' }).getByRole('button', { name: /^Open job / }).first().click();
    await page.getByRole('textbox', { name: /Wire diameter d \(mm\)/ }).waitFor();
    await expect(page.getByRole('textbox', { name: /Wire diameter d \(mm\)/ }).inputValue()).resolves.toBe('1');
    expect(errors).toEqual([]);
  });
});
