import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, shopSession, UI_TEST_TIMEOUT } from './support';

/** The label of the focused control. */
const focusedLabel = (page: Page) => page.evaluate(() => {
  const el = document.activeElement as HTMLElement | null;
  if (!el) return '';
  return ((el.id ? document.querySelector(`label[for="${el.id}"]`)?.textContent : null) ?? el.getAttribute('aria-label') ?? el.textContent ?? '').trim();
});

/** Counts every key pressed: Tab to each field, the characters typed, ArrowDown in a select list. */
class KeyCounter {
  presses = 0;
  constructor(private readonly page: Page) {}
  async press(key: string) { this.presses += 1; await this.page.keyboard.press(key); }
  async tabTo(label: RegExp, limit = 80) {
    for (let i = 0; i < limit; i++) {
      await this.press('Tab');
      if (label.test(await focusedLabel(this.page))) return;
    }
    throw new Error(`${label} not reached with Tab`);
  }
  async type(text: string) { for (const ch of text) await this.press(ch); }
  async pick(value: string) {
    const selected = () => this.page.evaluate(() => (document.activeElement as HTMLSelectElement).value);
    for (let i = 0; i < 60 && (await selected()) !== value; i++) await this.press('ArrowDown');
    expect(await selected()).toBe(value);
  }
}

describe('keystrokes for one compression spring from a drawing', { timeout: UI_TEST_TIMEOUT }, () => {
  const session = shopSession();
  let page: Page;
  beforeAll(() => { ({ page } = session); });

  it('counts a clean keyboard entry', async () => {
    const keys = new KeyCounter(page);
    await keys.press('Alt+N');
    await page.getByRole('heading', { name: 'New job' }).waitFor();
    await keys.tabTo(/^Part number$/);
    await keys.type('QG-7731');
    await keys.tabTo(/^Wire grade$/);
    await keys.pick('en10270-1-sh');
    for (const [label, text] of [
      [/^Wire diameter d/, '1.6'], [/^Outside diameter OD/, '14'], [/^Total coils Nt/, '9'], [/^Free length L0/, '38'],
      [/^Test length L1/, '30'], [/^Force F1/, '12'],
    ] as const) {
      await keys.tabTo(label);
      await keys.type(text);
    }
    await page.locator('.results[data-state="ok"]').waitFor();
    console.log(`keystrokes: ${keys.presses}`);
    await expect(field(page, 'Part number').inputValue()).resolves.toBe('QG-7731');
  });
});
