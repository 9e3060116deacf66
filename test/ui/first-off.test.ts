import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fillSpring, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** A first-off record typed into the workspace, refused beside its field, then kept and used on the plan. */
describe('first-off records in the job workspace', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  let number = '';

  beforeAll(() => { ({ page, errors } = session); });

  it('puts a refused value\'s message beside its field and stores nothing', async () => {
    await page.getByRole('button', { name: /^New job/ }).first().click();
    await page.getByLabel('Metric').check();
    await field(page, 'Part number').fill('DEMO-FO-60');
    // An invented part (demo data) stressed past the allowable at solid, so it is coiled long and pressed.
    await fillSpring(page, { grade: 'en10270-1-sm', d: '3', od: '24', coils: '9', l0: '60', l1: '45' });
    await page.locator('.results[data-state="ok"]').waitFor();
    number = await savedJobNumber(page);

    await page.getByRole('tab', { name: 'First-off' }).click();
    await page.getByRole('heading', { name: `First-off inspection, job ${number}` }).waitFor();
    await expect(page.getByText('None yet.').isVisible()).resolves.toBe(true);
    // Coiled to about the set model's 65.4 mm for this spring.
    await field(page, 'Coiled free length used').fill('65.4');
    // Below the solid length: a set larger than the coiled deflection.
    await field(page, 'Free length after set removal').fill('20');
    await field(page, 'Force at L1 = 45.00 mm').fill('15x');
    await field(page, 'Outside diameter').fill('24.04');
    await field(page, 'Measured by').fill('R. Demo');
    await page.getByRole('button', { name: 'Record first-off' }).click();
    const forceRow = page.locator('tr', { has: field(page, 'Force at L1 = 45.00 mm') });
    await expect(forceRow.locator('.field__error').textContent()).resolves.toBe('"15x": "x" is not a unit this field knows');

    await field(page, 'Force at L1 = 45.00 mm').fill('152');
    await page.getByRole('button', { name: 'Record first-off' }).click();
    const message = page.locator('#first-off-freeLengthAfterSet-error');
    await message.waitFor();
    await expect(message.textContent()).resolves.toMatch(/larger than the coiled deflection to solid/);
    await expect.poll(() => forceRow.locator('.field__error').count(), { timeout: 10_000 }).toBe(0);
    await expect.poll(() => page.locator('.form-errors').count(), { timeout: 10_000 }).toBe(0);
    await expect(field(page, 'Free length after set removal').getAttribute('aria-describedby')).resolves.toContain('first-off-freeLengthAfterSet-error');
    await expect(page.getByText('None yet.').isVisible()).resolves.toBe(true);
    await screenshot(page, 'workspace-first-off-refused');
  });

  it('records the corrected first-off and lists it with its set', async () => {
    await field(page, 'Free length after set removal').fill('59.6');
    await page.getByRole('button', { name: 'Record first-off' }).click();
    await page.getByRole('status').filter({ hasText: `First-off recorded for job ${number}: set 5.80 mm.` }).waitFor();
    const row = page.locator('section[aria-labelledby="first-off-records-title"] tbody tr');
    await expect.poll(() => row.count(), { timeout: 10_000 }).toBe(1);
    await expect(row.first().textContent()).resolves.toContain('R. Demo');
    await expect.poll(() => page.locator('#first-off-freeLengthAfterSet-error').count(), { timeout: 10_000 }).toBe(0);
    await screenshot(page, 'workspace-first-off');
  });

  it('shows the calibrated coiled free length on the plan, with the record as evidence', async () => {
    await page.getByRole('tab', { name: 'Manufacturing plan' }).click();
    const panel = page.locator('section.calibration');
    await panel.getByRole('table', { name: 'First-off records used' }).waitFor();
    await expect(panel.textContent()).resolves.toMatch(/Calibrated: \d+\.\d\d mm/);
    await expect(panel.locator('tbody tr').first().textContent()).resolves.toContain(number);
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-set-calibration');
    expect(errors).toEqual([]);
  });
});
