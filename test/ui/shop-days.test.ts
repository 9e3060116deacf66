/**
 * The shop's time zone, chosen under Shop settings, decides the days the Jobs screen shows and filters by. The zone
 * is picked so its day differs from the UTC day at the moment the test runs: Kiritimati is UTC+14, Pago Pago UTC−11.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { calendarDay } from '../../core/calendar';
import { field, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

const zoneOffTheUtcDay = (now: Date) => (now.getUTCHours() >= 10 ? 'Pacific/Kiritimati' : 'Pacific/Pago_Pago');
const lastSaved = (page: Page) => page.locator('table.jobs tbody tr td.nowrap').allTextContents();

/** The listed jobs' last-saved stamps, newest first, as the store keeps them (UTC instants). */
async function savedStamps(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const r = await fetch('/api/listJobs', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ limit: 50 }), credentials: 'same-origin' });
    const answer = await r.json() as { ok: boolean; value: { jobs: { updatedAt: string }[] } };
    return answer.value.jobs.map((j) => j.updatedAt);
  });
}

const jobsLine = (n: number) => (n === 1 ? '1 job' : `${n} jobs`);

describe('the shop\'s days on the Jobs screen', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  beforeAll(() => { ({ page, errors } = session); });

  it('shows and filters the jobs by their day in the zone the shop chose', async () => {
    const zone = zoneOffTheUtcDay(new Date());
    await page.keyboard.press('Alt+3');
    await page.getByRole('heading', { name: 'Shop settings', level: 1 }).waitFor();
    await field(page, 'Shop\'s time zone').selectOption(zone);
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByRole('status').filter({ hasText: 'Settings saved.' }).waitFor();

    await page.keyboard.press('Alt+1');
    await page.locator('table.jobs tbody tr').first().waitFor();
    const stamps = await savedStamps(page);
    const shopDays = stamps.map((s) => calendarDay(s, zone));
    // The newest job was saved minutes ago: its day in the zone is not its UTC day.
    expect(shopDays[0]).not.toBe(stamps[0]!.slice(0, 10));
    await expect.poll(() => lastSaved(page)).toEqual(shopDays);

    const day = shopDays[0]!;
    await page.getByRole('combobox', { name: 'Date', exact: true }).selectOption('updated');
    await page.getByLabel('From', { exact: true }).fill(day);
    await page.getByLabel('To', { exact: true }).fill(day);
    await page.getByRole('status').filter({ hasText: new RegExp(`^${jobsLine(shopDays.filter((d) => d === day).length)}$`) }).waitFor();
    const utcDay = stamps[0]!.slice(0, 10);
    await page.getByLabel('From', { exact: true }).fill(utcDay);
    await page.getByLabel('To', { exact: true }).fill(utcDay);
    await page.getByRole('status').filter({ hasText: new RegExp(`^${jobsLine(shopDays.filter((d) => d === utcDay).length)}$`) }).waitFor();
    await screenshot(page, 'jobs-shop-days');
    expect(errors).toEqual([]);
  });
});
