import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, shopSession, UI_TEST_TIMEOUT } from './support';
import { datedJobs, datedJobsDocument } from '../support/dated-jobs';

const numbers = (page: Page) => page.locator('table.jobs tbody tr td:nth-child(2)').allTextContents();
const countLine = (page: Page) => page.getByRole('status').filter({ hasText: /jobs?$/ });

/** What the store lists for the same input, through the same web transport the page uses. */
async function storeList(page: Page, input: Record<string, unknown>): Promise<{ total: number; numbers: string[] }> {
  return page.evaluate(async (body) => {
    const r = await fetch('/api/listJobs', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ ...body, limit: 500 }), credentials: 'same-origin' });
    const answer = await r.json() as { ok: boolean; value: { total: number; jobs: { number: string }[] } };
    if (!answer.ok) throw new Error(JSON.stringify(answer));
    return { total: answer.value.total, numbers: answer.value.jobs.map((j) => j.number) };
  }, input);
}

/** The demo shop plus 120 jobs created a week apart from January 2024, each due 30 days after it was created. */
describe('the job list by a date range', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  const asked: string[] = [];

  beforeAll(async () => {
    ({ page, errors } = session);
    const imported = await page.evaluate(async (text) => {
      const r = await fetch('/api/importJobs', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ text }), credentials: 'same-origin' });
      return r.json() as Promise<{ ok: boolean }>;
    }, datedJobsDocument(datedJobs(120, 7)));
    expect(imported.ok).toBe(true);
    page.on('request', (r) => { if (r.url().endsWith('/api/listJobs')) asked.push(r.postData() ?? ''); });
    await page.reload();
    await page.locator('table.jobs tbody tr').first().waitFor();
  });

  it('lists a created range as the store does, over two pages', async () => {
    await page.getByRole('combobox', { name: 'Date', exact: true }).selectOption('created');
    await page.getByLabel('From', { exact: true }).fill('2024-03-01');
    await page.getByLabel('To', { exact: true }).fill('2025-02-28');
    const range = { dates: { field: 'created', from: '2024-03-01', to: '2025-02-28' } };
    const store = await storeList(page, range);
    expect(store.total).toBeGreaterThan(50);
    await countLine(page).filter({ hasText: `${store.total} jobs` }).waitFor();
    await expect.poll(() => page.locator('table.jobs tbody tr').count()).toBe(50);
    const first = await numbers(page);
    await page.getByRole('button', { name: 'Next page' }).click();
    await page.getByText(`Jobs 51–${store.total} of ${store.total} · page 2 of 2`).waitFor();
    const second = await numbers(page);
    expect([...first, ...second].sort()).toEqual([...store.numbers].sort());
    // The range's created date shows in its own column.
    await expect(page.getByRole('columnheader', { name: 'Created' }).count()).resolves.toBe(1);
    await screenshot(page, 'jobs-created-range-page-2');
  });

  it('combines the range with a status filter and every sort', async () => {
    await page.getByRole('combobox', { name: 'Status' }).selectOption('quoted');
    const store = await storeList(page, { status: 'quoted', dates: { field: 'created', from: '2024-03-01', to: '2025-02-28' }, sort: 'number', direction: 'asc' });
    expect(store.total).toBeGreaterThan(5);
    await countLine(page).filter({ hasText: `${store.total} jobs` }).waitFor();
    await page.locator('table.jobs').getByRole('button', { name: 'Job', exact: true }).click();
    await expect.poll(() => numbers(page)).toEqual(store.numbers);
    await screenshot(page, 'jobs-created-range-quoted');
    await page.locator('table.jobs').getByRole('button', { name: 'Customer', exact: true }).click();
    const byCustomer = await storeList(page, { status: 'quoted', dates: { field: 'created', from: '2024-03-01', to: '2025-02-28' }, sort: 'customer', direction: 'asc' });
    await expect.poll(() => numbers(page)).toEqual(byCustomer.numbers);
    await page.locator('table.jobs').getByRole('button', { name: 'Job', exact: true }).click();
    await expect.poll(() => numbers(page)).toEqual(store.numbers);
  });

  it('clears the range back to the whole list', async () => {
    await page.getByRole('combobox', { name: 'Status' }).selectOption('');
    const all = await storeList(page, {});
    await page.getByRole('button', { name: 'Clear dates' }).click();
    await countLine(page).filter({ hasText: `${all.total} jobs` }).waitFor();
    await expect(page.getByLabel('From', { exact: true }).inputValue()).resolves.toBe('');
    await expect(page.getByRole('button', { name: 'Clear dates' }).isDisabled()).resolves.toBe(true);
  });

  it('refuses a from date after the to date beside the field, asks nothing and keeps what was typed', async () => {
    await page.getByRole('combobox', { name: 'Date', exact: true }).selectOption('due');
    await page.getByLabel('To', { exact: true }).fill('2025-03-01');
    await page.getByRole('columnheader', { name: 'Due' }).waitFor();
    const before = asked.length;
    await page.getByLabel('From', { exact: true }).fill('2025-04-01');
    const error = page.getByRole('alert').filter({ hasText: 'From is after To (2025-03-01)' });
    await error.waitFor();
    await expect(page.getByLabel('From', { exact: true }).getAttribute('aria-invalid')).resolves.toBe('true');
    await screenshot(page, 'jobs-due-range-backwards');
    await page.waitForTimeout(300);
    expect(asked.slice(before).filter((body) => body.includes('2025-04-01'))).toEqual([]);
    await expect(page.getByLabel('From', { exact: true }).inputValue()).resolves.toBe('2025-04-01');
    await expect(page.getByLabel('To', { exact: true }).inputValue()).resolves.toBe('2025-03-01');
    await page.getByLabel('To', { exact: true }).fill('2025-04-30');
    await error.waitFor({ state: 'detached' });
    const store = await storeList(page, { dates: { field: 'due', from: '2025-04-01', to: '2025-04-30' } });
    await countLine(page).filter({ hasText: new RegExp(`^${store.total} jobs?$`) }).waitFor();
  });

  it('fills a quick range from today\'s local date', async () => {
    await page.getByRole('button', { name: 'Created last year' }).click();
    const year = await page.evaluate(() => new Date().getFullYear() - 1);
    await expect(page.getByLabel('From', { exact: true }).inputValue()).resolves.toBe(`${year}-01-01`);
    await expect(page.getByLabel('To', { exact: true }).inputValue()).resolves.toBe(`${year}-12-31`);
    await expect(page.getByRole('combobox', { name: 'Date', exact: true }).inputValue()).resolves.toBe('created');
    // Still sorted by job number, as set above.
    const store = await storeList(page, { dates: { field: 'created', from: `${year}-01-01`, to: `${year}-12-31` }, sort: 'number', direction: 'asc' });
    await countLine(page).filter({ hasText: new RegExp(`^${store.total} jobs?$`) }).waitFor();
    await expect.poll(() => numbers(page)).toEqual(store.numbers.slice(0, 50));
  });

  it('reads an open count when the store stopped counting a long range', async () => {
    // The store counts a range up to its cap (db/search/list.ts) and then answers totalAtLeast; here the answer
    // is made to say so, so the wording is seen without filling a store past the cap.
    await page.route('**/api/listJobs', async (route) => {
      const real = await route.fetch();
      const answer = await real.json() as { ok: boolean; value: { total: number; totalAtLeast: boolean } };
      await route.fulfill({ response: real, json: { ...answer, value: { ...answer.value, total: 10_000, totalAtLeast: true } } });
    });
    await page.getByRole('button', { name: 'Clear dates' }).click();
    await countLine(page).filter({ hasText: /^10 000\+ jobs$/ }).waitFor();
    await page.getByText('Jobs 1–50 of 10 000+ · page 1 of 200+').waitFor();
    await expect(page.getByRole('button', { name: 'Next page' }).isEnabled()).resolves.toBe(true);
    await page.unroute('**/api/listJobs');
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
