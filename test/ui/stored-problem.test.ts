import Database from 'better-sqlite3';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** A job whose stored spec names a wire grade this build no longer has, among the demo shop's jobs. */
describe('a stored job that no longer reads', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let broken = '';
  let total = 0;

  beforeAll(async () => {
    page = session.page;
    await page.locator('table.jobs tbody tr').first().waitFor();
    total = Number((await page.getByRole('status').filter({ hasText: /^\d+ jobs$/ }).textContent())!.split(' ')[0]);
    // As an older build with another grade library would have left it: written straight into the store.
    const db = new Database(session.shop.dbFile);
    const row = db.prepare('SELECT id, number, spec FROM jobs ORDER BY number LIMIT 1').get() as { id: number; number: string; spec: string };
    db.prepare('UPDATE jobs SET spec = ? WHERE id = ?').run(JSON.stringify({ ...JSON.parse(row.spec), material: 'en10270-1-withdrawn' }), row.id);
    db.close();
    broken = row.number;
    await page.reload();
    await page.locator('table.jobs tbody tr').first().waitFor();
  });

  it('still lists every job, and marks that one with the field and the reason', async () => {
    await expect(page.getByRole('status').filter({ hasText: /^\d+ jobs$/ }).textContent()).resolves.toBe(`${total} jobs`);
    await page.locator('table.jobs').getByRole('button', { name: 'Job', exact: true }).click();
    const row = page.locator('table.jobs tbody tr', { has: page.getByRole('button', { name: `Open job ${broken}` }) });
    await expect.poll(() => row.locator('.job-problem').textContent())
      .toMatch(new RegExp(`job ${broken}: the stored spec no longer reads .*spec\\.material: unknown wire grade "en10270-1-withdrawn"`));
    await expect.poll(() => page.locator('table.jobs tbody tr.has-problem').count(), { timeout: 10_000 }).toBe(1);
    await screenshot(page, 'jobs-stored-problem');
  });

  it('opening it says what is wrong instead of failing the screen', async () => {
    await page.getByRole('button', { name: `Open job ${broken}` }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/no longer reads.*spec\.material/);
    expect(session.errors).toEqual([]);
  });
});
