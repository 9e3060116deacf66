import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fillSpring, screenshot, shopSession, UI_TEST_TIMEOUT } from './support';

/** The cautions show where they matter: always stored energy and review; near solid, plating and stops when they apply. */
describe('cautions beside the results', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  let errors: string[];

  beforeAll(() => { ({ page, errors } = session); });

  const caution = (title: string) => page.getByRole('complementary', { name: `Caution: ${title}` });

  it('names stored energy and the limits of the results even before there are results', async () => {
    await page.keyboard.press('Alt+N');
    await caution('Stored energy').waitFor();
    await caution('Results support review; they do not replace it').waitFor();
    await expect(caution('Results support review; they do not replace it').textContent()).resolves.toContain('qualified engineer');
  });

  it('warns of stress near solid and of hydrogen embrittlement for an electroplated finish', async () => {
    await page.getByLabel('Metric').check();
    // 2 × 22 mm, 10 coils closed and ground: solid at 20 mm; from about 72 mm free the Ks stress at solid passes
    // 45 % of Rm (Shigley 9e Table 10-6), so 78 mm needs set removal.
    await fillSpring(page, { grade: 'en10270-1-dh', d: '2', od: '22', coils: '10', l0: '78' });
    await caution('Stress near solid').waitFor();
    await expect(caution('Stress near solid').textContent()).resolves.toContain('set removal');
    await expect.poll(() => caution('Hydrogen embrittlement').count(), { timeout: 10_000 }).toBe(0);
    await field(page, 'Finish').selectOption('zinc-yellow');
    await caution('Hydrogen embrittlement').waitFor();
    await expect(caution('Hydrogen embrittlement').textContent()).resolves.toContain('Bake to ASTM B850, 22 h at 200 °C');
    await field(page, 'Free length L0 (mm)').fill('40');
    await caution('Stress near solid').waitFor({ state: 'detached' });
    await screenshot(page, 'cautions');
  });

  it('asks for a mechanical stop on an extension spring, and keeps the compression values', async () => {
    await field(page, 'Kind of spring').selectOption('extension');
    await field(page, 'Body coils').fill('18');
    await page.locator('.results[data-state="ok"]').waitFor();
    await caution('No mechanical stop').waitFor();
    await caution('Plating extension springs').waitFor();
    await page.getByLabel('The assembly has a mechanical stop (limits the extension)').check();
    await caution('No mechanical stop').waitFor({ state: 'detached' });
    await field(page, 'Kind of spring').selectOption('compression');
    await expect(field(page, 'Free length L0 (mm)').inputValue()).resolves.toBe('40');
  });

  it('logged no console or page error', () => {
    expect(errors).toEqual([]);
  });
});
