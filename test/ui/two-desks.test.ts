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

  it('tells the second desk who is editing, refuses its autosave with both versions, and refuses the first desk\'s next one after', async () => {
    const { page, browser, shop, errors } = session;
    const listed = await fetch(`http://127.0.0.1:${shop.web.port}/api/listJobs`, {
      method: 'POST', headers: { 'content-type': 'application/json', cookie: `cw_token=${shop.web.token}` }, body: JSON.stringify({ limit: 2, status: 'draft', sort: 'number', direction: 'desc' }),
    }).then((r) => r.json()) as { value: { jobs: { id: number; number: string; revision: number }[] } };
    const target = listed.value.jobs[0]!;
    const open = async (p: typeof page) => {
      await p.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: /^Jobs/ }).click();
      await p.getByRole('button', { name: `Open job ${target.number}` }).click();
      await p.locator('[data-save="ok"]').waitFor();
    };
    await open(page);
    await field(page, 'Part number').fill('DESK-A-2 (demo)');
    await page.locator('[data-save="ok"]').filter({ hasText: `working on revision ${target.revision + 1}` }).waitFor();

    const other = await openPage(browser, shop.web.url);
    await other.page.getByRole('button', { name: `Open job ${target.number}` }).click();
    const presence = other.page.getByTestId('editing-elsewhere');
    await presence.waitFor();
    await expect(presence.textContent()).resolves.toMatch(/is editing this job at another desk \(working copy since/);
    await expect(field(other.page, 'Part number').inputValue()).resolves.toBe('DESK-A-2 (demo)');

    await field(other.page, 'Part number').fill('DESK-B-2 (demo)');
    const refused = other.page.getByTestId('saved-elsewhere');
    await refused.waitFor();
    await expect(refused.getAttribute('data-code')).resolves.toBe('edited-elsewhere');
    await expect(refused.textContent()).resolves.toContain('partNumber: saved: "DESK-A-2 (demo)"; yours: "DESK-B-2 (demo)"');
    await screenshot(other.page, 'workspace-edited-elsewhere');
    await refused.getByRole('button', { name: 'Save mine as the next revision' }).click();
    await other.page.locator('[data-save="ok"]').filter({ hasText: `revision ${target.revision + 2}` }).waitFor();

    // The first desk's next autosave started from the old revision: refused, with the other desk's value beside its own.
    await field(page, 'Part number').fill('DESK-A-3 (demo)');
    const stale = page.getByTestId('saved-elsewhere');
    await stale.waitFor();
    await expect(stale.getAttribute('data-code')).resolves.toBe('stale-revision');
    await expect(stale.textContent()).resolves.toContain('partNumber: saved: "DESK-B-2 (demo)"; yours: "DESK-A-3 (demo)"');
    await stale.getByRole('button', { name: 'Take the saved version' }).click();
    await expect.poll(() => field(page, 'Part number').inputValue()).toBe('DESK-B-2 (demo)');
    await expect(page.getByTestId('saved-elsewhere').count()).resolves.toBe(0);
    await other.page.close();
    expect([...errors, ...other.errors].filter((e) => !/409|stale/.test(e))).toEqual([]);
  });

  it('the same desk after a restart goes on in the working copy it left open', async () => {
    const { page, shop, errors } = session;
    const listed = await fetch(`http://127.0.0.1:${shop.web.port}/api/listJobs`, {
      method: 'POST', headers: { 'content-type': 'application/json', cookie: `cw_token=${shop.web.token}` }, body: JSON.stringify({ limit: 1, status: 'draft', sort: 'number', direction: 'desc' }),
    }).then((r) => r.json()) as { value: { jobs: { number: string; revision: number }[] } };
    const target = listed.value.jobs[0]!;
    const open = async () => {
      await page.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: /^Jobs/ }).click();
      await page.getByRole('button', { name: `Open job ${target.number}` }).click();
      await page.locator('[data-save="ok"]').waitFor();
    };
    await open();
    await field(page, 'Part number').fill('RESTART-1 (demo)');
    await page.locator('[data-save="ok"]').filter({ hasText: `working on revision ${target.revision + 1}` }).waitFor();
    // The window goes away with the working copy still open (no "leaving the job"), and comes back.
    await page.goto(shop.web.url);
    await open();
    await expect(page.getByTestId('editing-elsewhere').count()).resolves.toBe(0);
    await field(page, 'Part number').fill('RESTART-2 (demo)');
    await page.locator('[data-save="ok"]').filter({ hasText: `working on revision ${target.revision + 1}` }).waitFor();
    await expect(page.getByTestId('saved-elsewhere').count()).resolves.toBe(0);
    expect(errors.filter((e) => !/409|stale/.test(e))).toEqual([]);
  });
});
