import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fillSpring, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** The shop's settings feed the price: a machine rate changed on the settings screen moves the cost. */
describe('settings and the cost of a job', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  let number = '';
  let priceAt100 = 0;

  beforeAll(() => { ({ page, errors } = session); });

  const unitPriceAt = async (quantity: number): Promise<number> => {
    const cell = page.locator(`[data-unit-price="${quantity}"]`);
    await cell.waitFor();
    return Number((await cell.textContent())!.replace(/[^\d.]/g, ''));
  };

  const costTab = async () => {
    await page.getByRole('tab', { name: 'Cost & price' }).click();
    await page.getByRole('heading', { name: 'Price breaks' }).waitFor();
  };

  it('prices a new job at its breaks, with the price curve', async () => {
    await page.keyboard.press('Alt+N');
    await page.getByLabel('Metric').check();
    // 0.5 mm wire: only the demo shop's fine-wire coiler (0.1–2 mm) takes it, so its rate must carry the price.
    await fillSpring(page, { grade: 'en10270-1-dh', d: '0.5', od: '5', coils: '10', l0: '15', l1: '11' });
    await field(page, 'Price-break quantities (pcs)').fill('100, 1000');
    number = await savedJobNumber(page);
    await costTab();
    await page.getByRole('img', { name: 'Unit price against order quantity' }).waitFor();
    priceAt100 = await unitPriceAt(100);
    expect(priceAt100).toBeGreaterThan(await unitPriceAt(1000));
    await screenshot(page, 'workspace-cost');
  });

  it('shows a bad rate beside its field and keeps it until corrected', async () => {
    await page.keyboard.press('Alt+3');
    await page.getByRole('heading', { name: 'Shop settings', level: 1 }).waitFor();
    const rate = page.locator('#settings-machines-0-hourlyRate');
    await expect(page.locator('#settings-machines-0-id').inputValue()).resolves.toBe('coil-fine');
    await rate.fill('68 per hour');
    await expect(page.locator('#settings-machines-0-hourlyRate-error').textContent()).resolves.toBe('a number, e.g. 2.5');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('settings-machines-0-hourlyRate');
    await expect(rate.inputValue()).resolves.toBe('68 per hour');
    await screenshot(page, 'settings-error');
  });

  it('moves the cost when the coiler rate changes', async () => {
    const rate = page.locator('#settings-machines-0-hourlyRate');
    await rate.fill('400');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByRole('status').filter({ hasText: 'Settings saved.' }).waitFor();
    await screenshot(page, 'settings');
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: `Open job ${number}` }).click();
    await costTab();
    const after = await unitPriceAt(100);
    // The demo coiler's setup is 30 min: (400 − 68) × 0.5 h more over 100 pieces, before overhead and margin add to it.
    expect(after - priceAt100).toBeGreaterThanOrEqual(((400 - 68) * 0.5) / 100);
    // The saved job says what the change moved, line by line, until the estimator accepts it.
    const moved = page.locator('.settings-moved');
    await moved.waitFor();
    const setupRow = moved.locator('[data-line="coil:setup"]').first();
    await expect(setupRow.textContent()).resolves.toMatch(/USD 34\.00.*USD 200\.00.*\+USD 166\.00/);
    await screenshot(page, 'workspace-cost-settings-moved');
    await moved.getByRole('button', { name: 'Accept the new figures' }).click();
    await moved.waitFor({ state: 'detached' });
    await page.keyboard.press('Alt+3');
    await page.locator('#settings-machines-0-hourlyRate').fill('68');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByRole('status').filter({ hasText: 'Settings saved.' }).waitFor();
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: `Open job ${number}` }).click();
    await costTab();
    expect(await unitPriceAt(100)).toBe(priceAt100);
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
