import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fillSpring, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT, unnamedControls } from './support';

/** The customer screen: add a customer with contact, address and terms, correct a bad e-mail, edit, refuse a twin. */
describe('customers', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(() => { ({ page, errors } = session); });

  it('adds a customer, showing a bad e-mail beside its field until it is put right', async () => {
    await page.getByRole('button', { name: 'Customers' }).click();
    await page.getByRole('heading', { name: 'Customers', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Add customer' }).first().click();
    const form = page.getByRole('form', { name: 'New customer' });
    await field(page, 'Name').fill('Demo Harrow Gates');
    await field(page, 'Contact (quotes are addressed to)').fill('R. Okafor, purchasing');
    await field(page, 'E-mail').fill('buyer at harrow');
    await field(page, 'Phone').fill('555 0101');
    await field(page, 'Address (one line each, up to 6)').fill('4 Mill Lane\nDemo Town DT1 2AB');
    await field(page, 'Payment terms').fill('60 days end of month');
    await form.getByRole('button', { name: 'Add customer' }).click();
    await expect(page.locator('#customer-email-error').textContent()).resolves.toContain('e-mail address');
    await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('customer-email');
    await screenshot(page, 'customers-error');
    await field(page, 'E-mail').fill('buyer@harrow.example');
    await form.getByRole('button', { name: 'Add customer' }).click();
    await page.getByRole('status').filter({ hasText: 'Demo Harrow Gates saved.' }).waitFor();
    const row = page.getByRole('row').filter({ hasText: 'Demo Harrow Gates' });
    await expect(row.textContent()).resolves.toContain('60 days end of month');
    await screenshot(page, 'customers');
  });

  it('edits the customer, and refuses a second one of the same name on the name field', async () => {
    await page.getByRole('button', { name: 'Demo Harrow Gates' }).click();
    await field(page, 'Phone').fill('555 0199');
    await page.getByRole('button', { name: 'Save customer' }).click();
    await page.getByRole('status').filter({ hasText: 'Demo Harrow Gates saved.' }).waitFor();
    await expect(page.getByRole('row').filter({ hasText: 'Demo Harrow Gates' }).textContent()).resolves.toContain('555 0199');
    await page.getByRole('button', { name: 'Add customer' }).first().click();
    await field(page, 'Name').fill('demo harrow gates');
    await page.getByRole('form', { name: 'New customer' }).getByRole('button', { name: 'Add customer' }).click();
    await expect(page.locator('#customer-name-error').textContent()).resolves.toContain('already on file');
    const { unnamed } = await unnamedControls(page);
    expect(unnamed).toEqual([]);
    expect(errors).toEqual([]);
  });
});

/** A plated job: the plan compares what each bake specification says, and marks the one the order names. */
describe('bake specifications compared on the plan', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();

  it('marks the named specification, written with its bake, among the others', async () => {
    const { page, errors } = session;
    await page.keyboard.press('Alt+N');
    await page.getByLabel('Metric').check();
    await fillSpring(page, { grade: 'en10270-1-dh', d: '1.5', od: '12', coils: '10', l0: '40', l1: '30' });
    await field(page, 'Finish').selectOption('zinc-yellow');
    await field(page, 'Bake specification').fill('ISO 4042, 4 h at 200 °C');
    await savedJobNumber(page);
    await page.getByRole('tab', { name: 'Manufacturing plan' }).click();
    const table = page.getByRole('region', { name: 'Hydrogen-relief bake: what each specification says' });
    await table.waitFor();
    await expect(table.locator('tr.is-selected').textContent()).resolves.toContain('ISO 4042 (named)');
    await expect.poll(() => table.getByRole('row').count(), { timeout: 10_000 }).toBe(7);
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-bake-comparison');
    expect(errors).toEqual([]);
  });
});
