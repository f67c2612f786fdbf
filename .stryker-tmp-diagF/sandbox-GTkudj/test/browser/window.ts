/**
 * The browser tests' fixture: the designer window opened at the address
 * browser mode printed, with every console error and page error collected
 * (a content-security-policy violation is one), and screenshots of each step
 * saved to test/browser/screenshots/.
 */
// @ts-nocheck

import { test as base, expect, type Locator, type Page, type TestInfo } from '@playwright/test';
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SCREENSHOTS = fileURLToPath(new URL('./screenshots', import.meta.url));

export function serverAddress(): string {
  const file = process.env.LOFTPOINT_TEST_ADDRESS_FILE;
  if (!file) throw new Error('LOFTPOINT_TEST_ADDRESS_FILE is not set; run through test/browser/playwright.config.ts');
  return readFileSync(file, 'utf8').trim();
}

export class DesignerWindow {
  #step = 0;

  constructor(
    readonly page: Page,
    private readonly info: TestInfo,
  ) {}

  async shot(name: string): Promise<void> {
    mkdirSync(SCREENSHOTS, { recursive: true });
    this.#step += 1;
    const slug = this.info.title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
    await this.page.screenshot({ path: join(SCREENSHOTS, `${slug}-${String(this.#step).padStart(2, '0')}-${name}.png`) });
  }

  byTest(id: string): Locator {
    return this.page.getByTestId(id);
  }

  async ready(): Promise<void> {
    await expect(this.byTest('window')).toHaveAttribute('data-ready', 'true');
    await expect(this.byTest('design-point-marker')).toBeVisible();
  }

  /** The page never shows NaN, in text or in drawing attributes. */
  async expectNoNaN(): Promise<void> {
    const html = await this.page.evaluate(() => document.body.outerHTML);
    expect(html).not.toMatch(/NaN|undefined W|Infinity/);
  }

  async selectConcept(name: string): Promise<void> {
    await this.byTest('concept-select').selectOption({ label: name });
    await expect(this.byTest('concept-title')).toHaveText(name);
  }

  async openRequirement(id: string): Promise<Locator> {
    const card = this.byTest(`requirement-${id}`);
    const toggle = card.getByTestId('requirement-toggle');
    if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
    return card;
  }

  async margins(): Promise<Record<string, string>> {
    const rows = this.byTest('margin-row');
    const out: Record<string, string> = {};
    for (const row of await rows.all()) {
      out[(await row.getAttribute('data-id')) ?? ''] = (await row.getByTestId('margin-value').textContent())?.trim() ?? '';
    }
    return out;
  }

  /** Drags the design point by (dx, dy) pixels with the mouse. */
  async dragPoint(dx: number, dy: number, steps = 12): Promise<void> {
    const box = await this.byTest('design-point-marker').boundingBox();
    if (!box) throw new Error('design point marker is not on screen');
    const x = box.x + box.width / 2;
    const y = box.y + box.height / 2;
    await this.page.mouse.move(x, y);
    await this.page.mouse.down();
    await this.page.mouse.move(x + dx, y + dy, { steps });
    await this.page.mouse.up();
  }
}

/**
 * Browser mode keeps unsaved drafts per project file on the server, across
 * page loads; every test starts from the saved versions alone, as a first
 * visit would.
 */
async function forgetKeptDrafts(page: Page): Promise<void> {
  const address = new URL(serverAddress());
  const token = /token=([A-Za-z0-9_-]+)/.exec(address.hash)?.[1] ?? '';
  const response = await page.request.post(new URL('/api/keepDrafts', address.origin).href, {
    headers: { 'X-Loftpoint-Token': token },
    data: { drafts: {} },
  });
  expect(response.ok(), 'the server forgets its kept drafts').toBe(true);
}

export const test = base.extend<{ window: DesignerWindow }>({
  window: async ({ page }, use, testInfo) => {
    const problems: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') problems.push(message.text());
    });
    page.on('pageerror', (error) => problems.push(error.message));
    await forgetKeptDrafts(page);
    await page.goto(serverAddress());
    const window = new DesignerWindow(page, testInfo);
    await window.ready();
    await use(window);
    expect(problems, 'console errors and page errors').toEqual([]);
  },
});

export { expect };
