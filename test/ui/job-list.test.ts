import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { shopSession, UI_TEST_TIMEOUT } from './support';

const numbers = (page: Page) => page.locator('table.jobs tbody tr td:nth-child(2)').allTextContents();

/** The job list over the demo shop plus twenty more jobs: filters, sorting and pages. */
describe('the job list', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(async () => {
    ({ page, errors } = session);
    // Through the same API the page uses, so the list holds more than one page of jobs.
    const made = await page.evaluate(async () => {
      let ok = 0;
      for (let i = 0; i < 20; i++) {
        const spec = { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1, outerDiameter: 10 + i / 10, totalCoils: 10, ends: 'closed-ground', freeLength: 30 };
        const r = await fetch('/api/createJob', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ partNumber: `PG-${i}`, spec }), credentials: 'same-origin' });
        if ((await r.json()).ok) ok++;
      }
      return ok;
    });
    expect(made).toBe(20);
    await page.reload();
    await page.locator('table.jobs tbody tr').first().waitFor();
  });

  it('pages through the jobs fifty at a time', async () => {
    const status = page.getByRole('status').filter({ hasText: /^\d+ jobs$/ });
    const total = Number((await status.textContent())!.split(' ')[0]);
    expect(total).toBeGreaterThan(50);
    await expect.poll(() => page.locator('table.jobs tbody tr').count(), { timeout: 10_000 }).toBe(50);
    const first = await numbers(page);
    await page.getByRole('button', { name: 'Next page' }).click();
    await page.getByText(`Jobs 51–${total} of ${total} · page 2 of 2`).waitFor();
    const second = await numbers(page);
    expect(second).toHaveLength(total - 50);
    expect(second.filter((n) => first.includes(n))).toEqual([]);
  });

  it('sorts by job number both ways, saying so to assistive technology', async () => {
    await page.locator('table.jobs').getByRole('button', { name: 'Job', exact: true }).click();
    const header = page.getByRole('columnheader', { name: /^Job/ });
    await expect(header.getAttribute('aria-sort')).resolves.toBe('ascending');
    // The header changes before the re-sorted page arrives: wait for the rows, not the attribute.
    const sortedUp = async () => { const n = await numbers(page); return n.join() === [...n].sort().join(); };
    await expect.poll(sortedUp).toBe(true);
    const up = await numbers(page);
    await page.locator('table.jobs').getByRole('button', { name: 'Job', exact: true }).click();
    await expect(header.getAttribute('aria-sort')).resolves.toBe('descending');
    await expect.poll(async () => (await numbers(page))[0]).not.toBe(up[0]);
    await expect.poll(async () => { const n = await numbers(page); return n.join() === [...n].sort().reverse().join(); }).toBe(true);
  });

  it('filters by kind and status, and combines a filter with text search', async () => {
    await page.getByRole('combobox', { name: 'Kind' }).selectOption('torsion');
    await expect.poll(async () => (await page.locator('table.jobs tbody tr td:nth-child(6)').allTextContents()).every((t) => t.startsWith('Torsion'))).toBe(true);
    await page.getByRole('combobox', { name: 'Kind' }).selectOption('');
    await page.getByRole('combobox', { name: 'Status' }).selectOption('quoted');
    await expect.poll(async () => (await page.locator('table.jobs .status').allTextContents()).every((t) => t === 'Quoted')).toBe(true);
    await page.getByRole('combobox', { name: 'Status' }).selectOption('');
    await page.getByRole('searchbox', { name: 'Search' }).fill('PG-1');
    await page.getByRole('status').filter({ hasText: 'match “PG-1”' }).waitFor();
    await page.getByRole('combobox', { name: 'Kind' }).selectOption('torsion');
    await page.getByText('No job matches.', { exact: false }).waitFor();
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
