import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { fillSpring, savedJobNumber, screenshot, shopSession, UI_TEST_TIMEOUT, unnamedControls } from './support';

/** The accessible name (or the text) of the element that has the keyboard focus. */
const focusedName = (page: Page) => page.evaluate(() => {
  const el = document.activeElement as HTMLElement | null;
  if (!el) return '';
  const labelled = el.getAttribute('aria-label') ?? (el.id ? document.querySelector(`label[for="${el.id}"]`)?.textContent : null);
  return (labelled ?? el.textContent ?? '').trim();
});

/** Presses Tab until the focused control's name matches, failing if it is not reached in `limit` presses. */
async function tabTo(page: Page, name: RegExp, limit = 60): Promise<void> {
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press('Tab');
    if (name.test(await focusedName(page))) return;
  }
  throw new Error(`${name} is not reachable with Tab within ${limit} presses`);
}

describe('keyboard and accessible names', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(() => { ({ page, errors } = session); });

  it('reaches the main actions without a mouse', async () => {
    await expect(focusedName(page)).resolves.toBe('Jobs');
    await page.keyboard.press('/');
    await expect(page.evaluate(() => (document.activeElement as HTMLInputElement).type)).resolves.toBe('search');
    await page.keyboard.type('RRC-BR-3');
    await page.locator('table.jobs tbody tr').first().waitFor();
    await tabTo(page, /^Open job J-\d\d-\d{4}$/);
    await page.keyboard.press('Enter');
    await page.locator('[data-save="ok"]').waitFor();
    await expect(focusedName(page)).resolves.toMatch(/^Job J-\d\d-\d{4}$/);
    await tabTo(page, /^Save now$/);
    await tabTo(page, /^Spec & results$/);
    await page.keyboard.press('ArrowRight');
    await expect(focusedName(page)).resolves.toBe('Manufacturing plan');
    await page.getByRole('heading', { name: 'Routing' }).waitFor();

    await page.keyboard.press('Alt+4');
    await expect(focusedName(page)).resolves.toBe('Data & backups');
    await tabTo(page, /^Download a backup$/);
    await page.keyboard.press('Enter');
    await page.getByRole('status').filter({ hasText: 'Backup downloaded' }).waitFor();

    await page.keyboard.press('F1');
    await page.getByRole('dialog', { name: 'Keyboard' }).waitFor();
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Keyboard' }).waitFor({ state: 'hidden' });

    await page.keyboard.press('Alt+N');
    // A new job starts in its first field.
    await expect(focusedName(page)).resolves.toBe('Kind of spring');
    await tabTo(page, /^Wire grade$/);
    await page.keyboard.press('Alt+3');
    await expect(focusedName(page)).resolves.toBe('Shop settings');
    await tabTo(page, /^Machines & rates$/);
    await page.keyboard.press('Enter');
    await tabTo(page, /^Rate per hour/);
  });

  const screens: [string, (p: Page) => Promise<void>][] = [
    ['jobs', async (p) => { await p.keyboard.press('Alt+1'); await p.locator('table.jobs tbody tr').first().waitFor(); }],
    ['workspace-new', async (p) => { await p.keyboard.press('Alt+N'); await p.getByRole('heading', { name: 'New job' }).waitFor(); }],
    ['workspace-results', async (p) => {
      await p.getByLabel('Metric').check();
      await fillSpring(p, { grade: 'en10270-1-sh', d: '1', od: '12', coils: '12', l0: '40', l1: '20', f1: '2' });
      await p.locator('.finding').first().waitFor();
      await savedJobNumber(p);
    }],
    ['workspace-plan', async (p) => { await p.getByRole('tab', { name: 'Manufacturing plan' }).click(); await p.getByRole('heading', { name: 'Inspection' }).waitFor(); }],
    ['workspace-cost', async (p) => { await p.getByRole('tab', { name: 'Cost & price' }).click(); await p.getByRole('heading', { name: 'Price breaks' }).waitFor(); }],
    ['workspace-documents', async (p) => { await p.getByRole('tab', { name: 'Documents' }).click(); await p.getByRole('heading', { name: 'Issued quotes' }).waitFor(); }],
    ['workspace-history', async (p) => { await p.getByRole('tab', { name: 'History' }).click(); await p.locator('table.history tbody tr').first().waitFor(); }],
    ['similar-jobs', async (p) => { await p.keyboard.press('Alt+S'); await p.getByRole('dialog').locator('tbody tr').first().waitFor(); }],
    ['settings', async (p) => { await p.keyboard.press('Escape'); await p.keyboard.press('Alt+3'); await p.getByRole('heading', { name: 'Machines & rates' }).waitFor(); }],
    ['data', async (p) => { await p.keyboard.press('Alt+4'); await p.getByRole('heading', { name: 'Back up the store' }).waitFor(); }],
    ['shortcuts', async (p) => { await p.keyboard.press('F1'); await p.getByRole('dialog', { name: 'Keyboard' }).waitFor(); }],
  ];

  it('gives every control on every screen an accessible name', async () => {
    const missing: Record<string, string[]> = {};
    for (const [name, open] of screens) {
      await open(page);
      const { count, unnamed } = await unnamedControls(page);
      expect(count, name).toBeGreaterThan(0);
      if (unnamed.length > 0) missing[name] = unnamed;
      await screenshot(page, name);
    }
    expect(missing).toEqual({});
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
