import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** From the customer's requirement (the demo valve seat, DEMO DATA) to a job made from the second design. */
describe('design from the customer\'s requirement', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(() => { ({ page, errors } = session); });

  const fill = async (name: string, value: string) => field(page, name).fill(value);

  it('shows a typing error beside its field', async () => {
    await page.getByRole('button', { name: 'Design from requirement' }).click();
    await page.getByRole('heading', { name: 'Design from the customer\'s requirement', level: 1 }).waitFor();
    await field(page, 'Units').selectOption('metric');
    await fill('Bore (mm)', 'twenty');
    await page.getByRole('button', { name: 'Find designs' }).click();
    await expect(page.locator('#requirement-envelope-bore-error').textContent()).resolves.toBe('"twenty" is not a number; e.g. 2.5 or 2 000 or 3/8 or 1-1/4');
  });

  it('enters the requirement, sees the ranked designs and makes the job from the second', async () => {
    await fill('Customer\'s reference', 'VS-20 (demo)');
    await fill('Bore (mm)', '20');
    await fill('Rod (mm)', '12');
    await fill('Maximum solid length (mm)', '26');
    await fill('Maximum free length (mm)', '60');
    await fill('Length L1 (mm)', '40');
    await fill('Force F1 (N)', '60');
    await fill('Length L2 (mm)', '30');
    await fill('Force F2 (N)', '110');
    await field(page, 'Duty').selectOption('cyclic');
    await fill('Stroke from length (mm)', '40');
    await fill('Stroke to length (mm)', '30');
    await fill('Cycles', '1000000');
    await page.getByLabel('Shot peening allowed').check();
    await fill('Service temperature, highest (°C)', '90');
    await field(page, 'Wire to try').selectOption('priced');
    await field(page, 'Finish').selectOption('zinc-yellow');
    await fill('Quantity breaks', '500, 2000, 10000');
    await fill('Rank at quantity', '2000');
    for (const family of ['Cold-drawn carbon', 'Hardened and tempered', 'Stainless']) await page.getByLabel(family, { exact: true }).check();
    for (const ends of ['open and ground', 'open']) await page.getByLabel(ends, { exact: true }).uncheck();
    await page.getByRole('button', { name: 'Find designs' }).click();
    const table = page.getByRole('table', { name: 'Designs that meet the requirement, cheapest first' });
    await table.waitFor();
    const rows = table.locator('tbody tr');
    expect(await rows.count()).toBeGreaterThanOrEqual(2);
    await expect(rows.nth(0).locator('td').nth(12).textContent()).resolves.toBe('cheapest');
    const second = rows.nth(1);
    const grade = (await second.locator('td').nth(1).textContent()) ?? '';
    const coils = (await second.locator('td').nth(4).textContent()) ?? '';
    const freeLength = (await second.locator('td').nth(6).textContent()) ?? '';
    expect(await second.locator('td').nth(12).textContent()).toMatch(/more per piece/);
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'design-candidates');

    await page.getByRole('button', { name: 'Make a job from design 2' }).click();
    const number = await savedJobNumber(page);
    expect(number).toMatch(/^J-\d\d-\d{4}$/);
    await expect(field(page, 'Total coils Nt').inputValue()).resolves.toBe(coils);
    await expect(field(page, 'Part number').inputValue()).resolves.toBe('VS-20 (demo)');
    await expect(field(page, 'Free length L0 (mm)').inputValue()).resolves.toBe(String(Number(freeLength)));
    const chosen = await field(page, 'Wire grade').evaluate((el) => (el as HTMLSelectElement).selectedOptions[0]?.textContent ?? '');
    expect(chosen).toContain(grade.replace(/ \(.*\)$/, ''));
    await screenshot(page, 'design-job');
    expect(errors).toEqual([]);
  });

  it('designs an extension spring in the same screen', async () => {
    await page.getByRole('button', { name: 'Design from requirement' }).click();
    await page.getByRole('heading', { name: 'Design from the customer\'s requirement', level: 1 }).waitFor();
    await field(page, 'Kind of spring').selectOption('extension');
    await field(page, 'Units').selectOption('metric');
    await fill('Maximum OD (mm)', '14');
    await fill('Maximum free length inside the ends (mm)', '55');
    await fill('Length L1 (mm)', '60');
    await fill('Force F1 (N)', '20');
    await fill('Length L2 (mm)', '80');
    await fill('Force F2 (N)', '45');
    await page.getByLabel('The assembly has a stop').check();
    await field(page, 'Wire to try').selectOption('priced');
    await page.getByRole('button', { name: 'Find designs' }).click();
    const table = page.getByRole('table', { name: 'Designs that meet the requirement, cheapest first' });
    await table.waitFor();
    await expect.poll(() => table.getByRole('columnheader', { name: 'Body coils' }).count(), { timeout: 10_000 }).toBe(1);
    expect(await table.locator('tbody tr').count()).toBeGreaterThan(0);
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'design-extension');
    expect(errors).toEqual([]);
  });
});
