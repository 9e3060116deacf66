import { describe, expect, it } from 'vitest';
import { field, openPage, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** Two desks on one store: a save made on a revision the other desk replaced, seen and settled in the browser. */
describe('two desks editing one job', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();

  it('shows both versions of the field and keeps this desk\'s edit as the next revision', async () => {
    const { page, browser, shop, errors } = session;
    const listed = await fetch(`http://127.0.0.1:${shop.web.port}/api/listJobs`, {
      method: 'POST', headers: { 'content-type': 'application/json', cookie: `cw_token=${shop.web.token}` }, body: JSON.stringify({ limit: 1, status: 'draft', sort: 'number', direction: 'asc' }),
    }).then((r) => r.json()) as { value: { jobs: { id: number; number: string; revision: number }[] } };
    const target = listed.value.jobs[0]!;
    const open = async (p: typeof page) => {
      await p.getByRole('button', { name: `Open job ${target.number}` }).click();
      await p.locator('[data-save="ok"]').waitFor();
    };
    await open(page);
    const other = await openPage(browser, shop.web.url);
    await open(other.page);

    await field(other.page, 'Part number').fill('DESK-B-1 (demo)');
    await other.page.getByRole('button', { name: 'Save now' }).click();
    await other.page.locator('[data-save="ok"]').filter({ hasText: `revision ${target.revision + 1}` }).waitFor();

    await field(page, 'Part number').fill('DESK-A-1 (demo)');
    await page.getByRole('button', { name: 'Save now' }).click();
    const notice = page.getByTestId('saved-elsewhere');
    await notice.waitFor();
    await expect(notice.textContent()).resolves.toContain('partNumber: saved: "DESK-B-1 (demo)"; yours: "DESK-A-1 (demo)"');
    await screenshot(page, 'workspace-saved-elsewhere');
    await notice.getByRole('button', { name: 'Save mine as the next revision' }).click();
    await page.locator('[data-save="ok"]').filter({ hasText: `revision ${target.revision + 2}` }).waitFor();
    await expect(field(page, 'Part number').inputValue()).resolves.toBe('DESK-A-1 (demo)');
    await other.page.close();
    expect([...errors, ...other.errors].filter((e) => !/409|stale/.test(e))).toEqual([]);
  });
});
