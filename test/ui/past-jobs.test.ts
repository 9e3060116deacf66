import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** Calls the page's own API (the web transport) and returns the value, as the screens do. */
async function call<T>(page: Page, name: string, input: unknown): Promise<T> {
  return page.evaluate(async ([n, i]) => {
    const r = await fetch(`/api/${n}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(i), credentials: 'same-origin' });
    const body = await r.json();
    if (!body.ok) throw new Error(JSON.stringify(body.error));
    return body.value;
  }, [name, input] as const) as Promise<T>;
}

const row = (page: Page, text: string) => page.locator('table.jobs tbody tr', { hasText: text });

/** Jobs from past jobs, the archive and deleting a draft, on the demo shop (invented data). */
describe('jobs from past jobs and the archive', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];
  let source: { id: number; number: string };
  let neighbour: { id: number; number: string };
  let quoted: { number: string; prices: { breaks: { quantity: number; unitPrice: number }[] } };

  beforeAll(async () => {
    ({ page, errors } = session);
    // A metric spring with no load specified (its free length is toleranced from the shop's table), made for these tests.
    source = await call(page, 'createJob', {
      customer: { name: 'Demo: Ashgrove Hinges (invented)' }, partNumber: 'AH-PAST-1', drawingNumber: 'AH-D-1', drawingRevision: 'B',
      orderQuantity: 500, status: 'done',
      spec: { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50 },
    });
    // A quoted neighbour: 5 % heavier wire at the same OD, priced by the demo shop.
    neighbour = await call(page, 'createJob', {
      customer: { name: 'Demo: Ashgrove Hinges (invented)' }, partNumber: 'AH-NEAR-2', orderQuantity: 1000,
      spec: { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2.1, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50 },
    });
    quoted = await call(page, 'issueQuote', { jobId: neighbour.id, accept: 'demo job for the similar list' });
    await page.reload();
    await page.locator('table.jobs tbody tr').first().waitFor();
  });

  it('makes a new job from a past one, and each job shows the link to the other', async () => {
    await row(page, 'AH-PAST-1').getByRole('button', { name: `Open job ${source.number}` }).click();
    await page.locator('.toolbar__number', { hasText: source.number }).waitFor();
    await page.getByRole('button', { name: 'New job from this one' }).click();
    await expect.poll(async () => page.locator('.toolbar__number').textContent()).not.toBe(source.number);
    const copy = (await page.locator('.toolbar__number').textContent())!;
    expect(copy).toMatch(/^J-\d\d-\d{4}$/);
    await page.locator('.toolbar__sub', { hasText: 'AH-PAST-1' }).waitFor();
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByRole('list', { name: 'Copies' }).getByText(`Made from job ${source.number}`).waitFor();
    await expect(page.locator('table.history tbody tr').first().textContent()).resolves.toContain(`copied from ${source.number}`);
    await screenshot(page, 'job-from-past-job');
    await page.getByRole('list', { name: 'Copies' }).getByRole('button', { name: `Open job ${source.number}` }).click();
    await page.locator('.toolbar__number', { hasText: source.number }).waitFor();
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByRole('list', { name: 'Copies' }).getByText(`Copied to job ${copy}`).waitFor();
  });

  it('lists similar jobs with status, date, match in words and last quoted price, and copies from a hit', async () => {
    await page.getByRole('tab', { name: 'Spec & results' }).click();
    await page.getByRole('button', { name: 'Find similar' }).click();
    const dialog = page.getByRole('dialog');
    const hit = dialog.locator('table.similar tbody tr').first();
    await hit.waitFor();
    // The copy made above is the same spring: the nearest hit, in words.
    await expect(hit.locator('.match').textContent()).resolves.toBe('same spring');
    await expect(hit.textContent()).resolves.toMatch(/Draft.*\d{4}-\d\d-\d\d/);
    await expect(hit.textContent()).resolves.toContain('never quoted');
    const near = dialog.locator('table.similar tbody tr', { hasText: neighbour.number });
    await expect(near.locator('.match').textContent()).resolves.toBe('close');
    await expect(near.textContent()).resolves.toContain('most different: rate 24 % stiffer');
    // The copy's order quantity is 500: the neighbour's quote is read at its break nearest 500.
    const nearest = [...quoted.prices.breaks].sort((a, b) => Math.abs(Math.log(a.quantity / 500)) - Math.abs(Math.log(b.quantity / 500)))[0]!;
    await expect(near.textContent()).resolves.toContain(`each at ${nearest.quantity.toLocaleString('en-US')} pcs`);
    await expect(near.textContent()).resolves.toContain('Quoted');
    await screenshot(page, 'similar-jobs-in-words');
    const hitNumber = (await hit.getByRole('button').first().textContent())!;
    await hit.getByRole('button', { name: `New job from ${hitNumber}` }).click();
    await expect.poll(async () => page.locator('.toolbar__number').textContent()).not.toMatch(new RegExp(`^(${source.number}|${hitNumber})$`));
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByRole('list', { name: 'Copies' }).getByText(`Made from job ${hitNumber}`).waitFor();
  });

  it('deletes a draft never quoted and brings it back with Undo', async () => {
    const draft = await call<{ number: string }>(page, 'createJob', {
      partNumber: 'AH-DRAFT-9', spec: { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1, outerDiameter: 9, totalCoils: 8, ends: 'closed-ground', freeLength: 25 },
    });
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: /^Jobs/ }).click();
    await page.getByRole('searchbox', { name: 'Search' }).fill('AH-DRAFT-9');
    await row(page, 'AH-DRAFT-9').waitFor();
    await row(page, 'AH-DRAFT-9').getByRole('button', { name: `Delete draft ${draft.number}` }).click();
    await page.getByRole('status').filter({ hasText: `Draft ${draft.number} deleted.` }).waitFor();
    await expect.poll(async () => row(page, 'AH-DRAFT-9').count()).toBe(0);
    await screenshot(page, 'job-deleted-undo');
    await page.getByRole('button', { name: 'Undo', exact: true }).click();
    await page.getByRole('status').filter({ hasText: `Job ${draft.number} is back, with its history.` }).waitFor();
    await row(page, 'AH-DRAFT-9').waitFor();
    // A job that is not a draft offers no delete: it is archived instead.
    await page.getByRole('searchbox', { name: 'Search' }).fill('AH-PAST-1');
    await row(page, source.number).waitFor();
    await expect.poll(() => row(page, source.number).getByRole('button', { name: /^Delete/ }).count(), { timeout: 10_000 }).toBe(0);
  });

  it('archives a job out of the list; the archived list and search still find it', async () => {
    await page.getByRole('searchbox', { name: 'Search' }).fill('');
    await row(page, source.number).waitFor();
    await row(page, source.number).getByRole('button', { name: `Archive job ${source.number}` }).click();
    await page.getByRole('status').filter({ hasText: `Job ${source.number} archived` }).waitFor();
    await expect.poll(async () => row(page, source.number).count()).toBe(0);
    await page.getByRole('combobox', { name: 'List' }).selectOption('archived');
    await row(page, source.number).waitFor();
    await expect(row(page, source.number).textContent()).resolves.toMatch(/archived \d{4}-\d\d-\d\d/);
    await screenshot(page, 'jobs-archived');
    await page.getByRole('combobox', { name: 'List' }).selectOption('');
    await page.getByRole('searchbox', { name: 'Search' }).fill('2.00 AH-PAST');
    await expect.poll(async () => row(page, source.number).count()).toBe(0); // "2.00" is not how the index writes 2 mm
    await page.getByRole('searchbox', { name: 'Search' }).fill('AH-PAST-1 steel wire SH');
    await row(page, source.number).waitFor();
    await page.getByRole('searchbox', { name: 'Search' }).fill('');
  });

  it('edits the shop\'s free-length table in settings and the plan uses it', async () => {
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: /^Shop settings/ }).click();
    await page.getByRole('heading', { name: 'Tolerances', level: 2 }).scrollIntoViewIfNeeded();
    // The published tables sit beside the shop's own, read-only, each with its source.
    await page.getByText('EN 15800 coil diameter A_D (± mm)').click();
    await expect.poll(() => page.getByRole('table', { name: 'EN 15800 coil diameter A_D (± mm)' }).getByRole('textbox').count(), { timeout: 10_000 }).toBe(0);
    await screenshot(page, 'settings-tolerances');
    const table = page.getByRole('group', { name: 'The shop\'s free length table' });
    await table.scrollIntoViewIfNeeded();
    const band = table.getByRole('group', { name: 'Grade 2, w over 8 up to 15' });
    await band.getByRole('textbox', { name: '± (%)' }).fill('2');
    await screenshot(page, 'settings-tolerance-tables');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByRole('status').filter({ hasText: 'Settings saved.' }).waitFor();

    // The spring: d 2, OD 20, so w = 18/2 = 9 (grade 2, band over 8 up to 15); L0 50 mm × 2 % = ±1.00 mm.
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('button', { name: /^Jobs/ }).click();
    await page.getByRole('searchbox', { name: 'Search' }).fill('AH-PAST-1');
    await row(page, source.number).getByRole('button', { name: `Open job ${source.number}` }).click();
    await page.getByRole('tab', { name: 'Manufacturing plan' }).click();
    const free = page.locator('section[aria-labelledby="inspection-title"] tbody tr', { hasText: 'Free length' });
    await free.waitFor();
    await expect(free.locator('td').nth(2).textContent()).resolves.toBe('49.00 mm');
    await expect(free.locator('td').nth(3).textContent()).resolves.toBe('51.00 mm');
    await expect(free.locator('td').nth(5).textContent()).resolves.toBe('the shop\'s free length table (Settings → Tolerances)');
    // The demo stock holds EN 10270-1 SH at 2 mm with its heat number.
    await expect(page.locator('[data-stock]').textContent()).resolves.toMatch(/^Use stock: 250 kg on hand at 2\.00 mm for the .* kg the lot needs, heat\/lot DEMO-H2040\.$/);
    await page.locator('[data-stock]').scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-shop-table-and-stock');
    await free.scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-inspection-shop-table');
    expect(errors).toEqual([]);
  });
});
