import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

const understood = (page: Page, path: string) => page.locator(`[id="job-${path.replace(/[^A-Za-z0-9]+/g, '-')}-understood"]`).textContent();
const figure = (page: Page, name: string) => page.locator('.figures__item', { has: page.locator('dt', { hasText: name }) }).locator('dd');

/** Numbers typed as a shop with a decimal comma types them, read back with what was understood, and the history of the edits. */
describe('numbers as people type them, and history that shows what changed', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  beforeAll(() => { ({ page, errors } = session); });

  it('takes the decimal comma as a shop setting', async () => {
    await page.keyboard.press('Alt+3');
    await field(page, 'Decimal mark in typed numbers').selectOption(',');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByRole('button', { name: 'Save settings' }).and(page.locator(':disabled')).waitFor();
  });

  it('reads "1,6", "3/8", "12 mm" and "2 000" and says what it understood', async () => {
    await page.keyboard.press('Alt+N');
    await page.getByLabel('Inch').check();
    await field(page, 'Part number').fill('DEMO-TN-16');
    await field(page, 'Wire grade').selectOption('astm-a228');
    await field(page, 'Wire diameter d (in)').fill('0,035');
    await field(page, 'Outside diameter OD (in)').fill('3/8');
    await field(page, 'Total coils Nt').fill('12');
    await field(page, 'Free length L0 (in)').fill('1,6');
    await field(page, 'Test length L1 (in)').fill('12 mm');
    await field(page, 'Price-break quantities (pcs)').fill('500; 2 000; 10 000');
    await page.locator('.results[data-state="ok"]').waitFor();
    await expect(understood(page, 'spec.outerDiameter')).resolves.toBe('read "3/8" as 0,375 in');
    // 12 mm / 25.4 mm per inch (NIST SP 811, Appendix B) = 0.4724409 in at seven digits.
    await expect(understood(page, 'spec.loads[0].length')).resolves.toBe('read "12 mm" as 0,4724409 in');
    await expect(understood(page, 'spec.quantities')).resolves.toBe('read "2 000" as 2000 pcs; read "10 000" as 10000 pcs');
    // "1,6" is the shop's plain way of writing 1.6: nothing to explain, and 1.6 in is 40.64 mm.
    await expect.poll(() => page.locator('[id="job-spec-freeLength-understood"]').count(), { timeout: 10_000 }).toBe(0);
    await savedJobNumber(page);
    await screenshot(page, 'typed-entry-understood');
    await page.getByLabel('Metric').check();
    await expect(field(page, 'Free length L0 (mm)').inputValue()).resolves.toBe('40,64');
    await expect(field(page, 'Outside diameter OD (mm)').inputValue()).resolves.toBe('9,525');
    await expect(field(page, 'Test length L1 (mm)').inputValue()).resolves.toBe('12');
    await page.getByLabel('Inch').check();
  });

  it('keeps the figures that do not depend on a field that does not read, and saves the other edits', async () => {
    const index = await figure(page, 'Spring index').textContent();
    await field(page, 'Total coils Nt').fill('twelve');
    await field(page, 'Part number').fill('DEMO-TN-17');
    await page.locator('.results[data-state="partial"]').waitFor();
    await expect(page.locator('#job-spec-totalCoils-error').textContent()).resolves.toMatch(/^"twelve" is not a number/);
    await expect.poll(() => page.getByRole('heading', { name: 'Waiting for total coils' }).count(), { timeout: 10_000 }).toBe(1);
    // The spring index C = D/d does not depend on the coils; the rate does (EN 13906-1, 9.2).
    await expect(figure(page, 'Spring index').textContent()).resolves.toBe(index);
    await expect(figure(page, 'Rate').textContent()).resolves.toMatch(/^— waits for total coils/);
    await page.locator('.toolbar__sub', { hasText: 'DEMO-TN-17' }).waitFor();
    await screenshot(page, 'typed-entry-partial');
    await field(page, 'Total coils Nt').fill('12');
    await page.locator('.results[data-state="ok"]').waitFor();
    await page.locator('[data-save="ok"]').waitFor();
  });

  it('undoes typing in a text field, not a saved revision', async () => {
    const partNumber = field(page, 'Part number');
    await partNumber.click();
    await page.keyboard.press('End');
    await page.keyboard.type('-X');
    await expect(partNumber.inputValue()).resolves.toBe('DEMO-TN-17-X');
    // The browser's own undo steps back through the typing (a key or a word at a time).
    for (let i = 0; i < 3 && (await partNumber.inputValue()) !== 'DEMO-TN-17'; i++) await page.keyboard.press('Control+Z');
    await expect(partNumber.inputValue()).resolves.toBe('DEMO-TN-17');
    await expect(field(page, 'Total coils Nt').inputValue()).resolves.toBe('12');
  });

  it('coalesces a working session into one revision and shows what changed', async () => {
    await field(page, 'Free length L0 (in)').fill('1,7');
    await page.locator('[data-save="ok"]').filter({ hasText: 'working on revision 2' }).waitFor();
    await field(page, 'Free length L0 (in)').fill('1,75');
    await page.locator('[data-save="ok"]').filter({ hasText: 'working on revision 2' }).waitFor();
    await page.getByRole('tab', { name: 'History' }).click();
    // The second autosave may still be on its way: wait for the working row to show it.
    await page.locator('tr.history__working').filter({ hasText: 'Free length: 1,600 in → 1,750 in' }).waitFor();
    await page.keyboard.press('Control+S');
    await page.locator('[data-save="ok"]').filter({ hasText: 'Saved · revision 2 ·' }).waitFor();
    await expect.poll(() => page.locator('tr.history__working').count()).toBe(0);
    const rows = page.locator('table.history tbody tr');
    await expect.poll(() => rows.count()).toBe(2);
    const newest = await rows.first().textContent();
    expect(newest).toContain('Free length: 1,600 in → 1,750 in');
    expect(newest).toContain('Part number: DEMO-TN-16 → DEMO-TN-17');
    await screenshot(page, 'typed-entry-history');
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
