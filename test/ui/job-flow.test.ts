import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fillSpring, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';
import type { Shop } from './support';

function expectNear(text: string, expected: number): void {
  expect(Math.abs(Number(text) - expected) / expected).toBeLessThan(1e-6);
}

/** A job from an empty form through units, saving, a restart of the service, search and undo. */
describe('a job from an empty form to the store and back', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let shop: Shop;
  let page: Page;
  let errors: string[];
  let number = '';

  beforeAll(() => { ({ shop, page, errors } = session); });

  it('shows results and a finding as the spring is typed, and a finding leads to its field', async () => {
    await page.getByRole('button', { name: /^New job/ }).first().click();
    await page.getByLabel('Metric').check();
    await expect(page.locator('.results').getAttribute('data-state')).resolves.toBe('incomplete');
    await field(page, 'Customer').fill('Quillon Gate Co');
    await field(page, 'Part number').fill('QG-7731');
    await fillSpring(page, { grade: 'en10270-1-sh', d: '1.6', od: '14', coils: '9', l0: '38', l1: '30', f1: '12' });
    await page.locator('.results[data-state="ok"]').waitFor();
    // Rate = G d^4 / (8 D^3 n) for D = 12.4 mm, n = 7: a few N/mm, shown in the job's units.
    await expect(page.locator('[data-figure="R"] dd').textContent()).resolves.toMatch(/^\d+(\.\d+)? N\/mm$/);
    const finding = page.locator('.finding[data-code="over-determined"]');
    await finding.waitFor();
    await finding.getByRole('button').click();
    await expect(page.evaluate(() => document.activeElement?.getAttribute('data-path'))).resolves.toBe('spec.loads[0].force');
    number = await savedJobNumber(page);
    expect(number).toMatch(/^J-\d\d-\d{4}$/);
    await screenshot(page, 'workspace-spec');
  });

  it('converts every entered value when the units change', async () => {
    await page.getByLabel('Inch').check();
    // 1 in = 25.4 mm and 1 lbf = 4.4482216152605 N exactly (NIST SP 811); fields keep a part in a million.
    expectNear(await field(page, 'Wire diameter d (in)').inputValue(), 1.6 / 25.4);
    expectNear(await field(page, 'Outside diameter OD (in)').inputValue(), 14 / 25.4);
    expectNear(await field(page, 'Free length L0 (in)').inputValue(), 38 / 25.4);
    expectNear(await field(page, 'Test length L1 (in)').inputValue(), 30 / 25.4);
    expectNear(await field(page, 'Force F1 (if specified) (lbf)').inputValue(), 12 / 4.4482216152605);
    await expect(field(page, 'Total coils Nt').inputValue()).resolves.toBe('9');
    await expect(page.locator('[data-figure="R"] dd').textContent()).resolves.toMatch(/ lbf\/in$/);
    await page.keyboard.press('Control+S');
    await page.locator('[data-save="ok"]').filter({ hasText: 'revision 2' }).waitFor();
  });

  it('keeps bad input beside its field and will not leave without asking', async () => {
    await field(page, 'Total coils Nt').fill('9,5');
    const message = page.locator('#job-spec-totalCoils-error');
    await expect(message.textContent()).resolves.toBe('"9,5": the decimal mark here is "." and "," separates thousands; did you mean 9.5?');
    await expect(field(page, 'Total coils Nt').getAttribute('aria-describedby')).resolves.toContain('job-spec-totalCoils-error');
    await page.keyboard.press('Alt+1');
    const dialog = page.getByRole('dialog', { name: 'Changes not saved' });
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Keep editing' }).click();
    await expect(field(page, 'Total coils Nt').inputValue()).resolves.toBe('9,5');
    await field(page, 'Total coils Nt').fill('9');
    await page.locator('[data-save="ok"]').waitFor();
  });

  it('finds the job after a restart by text, by a similar spec, and undoes across the restart', async () => {
    await shop.restart();
    await page.goto(shop.web.url);
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    await page.keyboard.press('/');
    await page.keyboard.type('QG-7731');
    const open = page.getByRole('button', { name: `Open job ${number}` });
    await open.waitFor();
    await expect.poll(() => page.locator('table.jobs tbody tr').count(), { timeout: 10_000 }).toBe(1);

    await page.getByRole('button', { name: /^New job/ }).first().click();
    await page.getByLabel('Metric').check();
    // As on a slow machine, the autosave first stores the new spring while the similar list is open, before the
    // list's first search is answered: the store waits until the list asks, and that search until the job is stored.
    let asking = (): void => undefined;
    const asked = new Promise<void>((r) => { asking = r; });
    const stored = page.waitForResponse((r) => r.url().endsWith('/api/createJob'));
    const searches: unknown[] = [];
    await page.route('**/api/createJob', async (route) => {
      await asked;
      await route.continue();
    });
    await page.route('**/api/similarJobs', async (route) => {
      searches.push(route.request().postDataJSON());
      if (searches.length === 1) {
        asking();
        await stored;
      }
      await route.continue();
    });
    await field(page, 'Order quantity (pcs)').fill('2500');
    await fillSpring(page, { grade: 'en10270-1-sh', d: '1.6', od: '14.4', coils: '9', l0: '35' });
    await page.locator('.results[data-state="ok"]').waitFor();
    await page.keyboard.press('Alt+S');
    const similar = page.getByRole('dialog', { name: 'Jobs like this spring' });
    await similar.waitFor();
    await page.locator('[data-save="ok"]').waitFor();
    const created = (await page.locator('.toolbar__number').textContent()) ?? '';
    expect(created).toMatch(/^J-\d\d-\d{4}$/);
    // The list keeps its name, prices at the quantity as typed from its first search, and leaves the new job out.
    expect(searches[0]).toMatchObject({ quantity: 2500 });
    const row = similar.locator('tr', { has: page.getByRole('button', { name: number, exact: true }) });
    await row.waitFor();
    await expect.poll(() => similar.getByRole('button', { name: created, exact: true }).count(), { timeout: 10_000 }).toBe(0);
    await expect(row.getByRole('list').getAttribute('aria-label')).resolves.toMatch(/^Differences: d same, OD −3 %, L0 \+9 %/);
    await expect(similar.locator('.hint').textContent()).resolves.toContain('at the break nearest 2,500 pcs');
    await page.unrouteAll();
    await screenshot(page, 'similar-jobs');
    await row.getByRole('button', { name: number, exact: true }).click();
    await page.locator('.toolbar__number', { hasText: number }).waitFor();
    await expect(page.getByLabel('Inch').isChecked()).resolves.toBe(true);
    await page.getByRole('button', { name: 'Undo' }).click();
    await page.getByLabel('Metric').and(page.locator(':checked')).waitFor();
    await expect(field(page, 'Wire diameter d (mm)').inputValue()).resolves.toBe('1.6');
    await page.getByRole('button', { name: 'Redo' }).click();
    expectNear(await field(page, 'Wire diameter d (in)').inputValue(), 1.6 / 25.4);
    await page.getByRole('tab', { name: 'History' }).click();
    await expect(page.locator('table.history tbody tr').first().textContent()).resolves.toContain('restored revision');
    await screenshot(page, 'workspace-history');
  });

  it('asks before the page is left with a change that cannot be saved yet', async () => {
    await page.getByRole('tab', { name: 'Spec & results' }).click();
    await field(page, 'Free length L0 (in)').fill('long');
    const asked = page.waitForEvent('dialog');
    const leaving = page.goto('about:blank').then(() => 'left', () => 'stayed');
    const dialog = await asked;
    expect(dialog.type()).toBe('beforeunload');
    await dialog.dismiss();
    await expect(leaving).resolves.toBe('stayed');
    await expect(field(page, 'Free length L0 (in)').inputValue()).resolves.toBe('long');
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
