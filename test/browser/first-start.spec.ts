import { expect, serverAddress, test } from './window';

test('first start shows a full diagram of a demo concept', async ({ window, page }) => {
  await window.shot('opened');
  // The address bar no longer carries the token once the page has read it.
  expect(page.url()).not.toContain('token=');
  await expect(window.byTest('caution')).toContainText('Preliminary sizing');
  await expect(window.byTest('caution')).toContainText('applicable authority');
  await expect(window.byTest('caution')).toContainText('licensed engineering review');
  await expect(window.byTest('x-title')).toHaveText('Wing loading W/S [N/m²]');
  await expect(window.byTest('y-title')).toHaveText('Power-to-weight P/W [W/N]');
  // Every requirement of the demo has a boundary on the plot, each labelled.
  const ids = await window.page.locator('li[data-testid^="requirement-"]').evaluateAll((items) => items.map((item) => item.getAttribute('data-testid')!.slice('requirement-'.length)));
  expect(ids.length).toBeGreaterThan(3);
  for (const id of ids) {
    await expect(page.locator(`[data-testid="curve-${id}"], [data-testid="limit-${id}"]`)).toHaveCount(1);
    await expect(window.byTest(`label-${id}`)).toBeVisible();
  }
  await expect(window.byTest('feasible-region').first()).toBeVisible();
  await expect(window.byTest('optimum-marker')).toBeVisible();
  await expect(window.byTest('margin-row')).toHaveCount(ids.length);
  await expect(window.byTest('sizing-wing-area')).toHaveText(/^\d[\d,.]* m²$/);
  await expect(window.byTest('sizing-installed')).toHaveText(/^\d[\d,.]* kW$/);
  await window.expectNoNaN();

  // Hovering reads every boundary at the pointer's wing loading and names the one that binds.
  const plot = await window.byTest('diagram').boundingBox();
  await page.mouse.move(plot!.x + plot!.width * 0.45, plot!.y + plot!.height * 0.5);
  await expect(window.byTest('readout')).toBeVisible();
  await expect(window.byTest('readout')).toContainText('W/S');
  await expect(window.byTest('readout')).toContainText('binds here');
  await window.shot('hover-readout');
});

test('the server refuses API calls without the token or from another origin', async ({ window, page }) => {
  const base = new URL(page.url()).origin;
  const noToken = await page.request.post(`${base}/api/getProject`, { data: {}, headers: { 'Content-Type': 'application/json' } });
  expect(noToken.status()).toBe(401);
  const token = new URL(serverAddress()).hash.replace('#token=', '');
  const otherOrigin = await page.request.post(`${base}/api/getProject`, {
    data: {},
    headers: { 'Content-Type': 'application/json', 'X-Loftpoint-Token': token, Origin: 'http://evil.example' },
  });
  expect(otherOrigin.status()).toBe(403);
  const rebound = await page.request.post(`${base}/api/getProject`, {
    data: {},
    headers: { 'Content-Type': 'application/json', 'X-Loftpoint-Token': token, Host: 'evil.example' },
  });
  expect(rebound.status()).toBe(403);
  const fine = await page.request.post(`${base}/api/getProject`, { data: {}, headers: { 'Content-Type': 'application/json', 'X-Loftpoint-Token': token } });
  expect(fine.status()).toBe(200);
  expect((await fine.json()).ok).toBe(true);
  void window;
});

test('the first calls go out from the small module loaded ahead of the window, and nothing is asked twice', async ({ page }) => {
  const asked: string[] = [];
  page.on('request', (request) => {
    const [, method] = request.url().split('/api/');
    if (method) asked.push(`${method} ${request.postData() ?? ''}`);
  });
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(error.message));
  await page.goto(serverAddress());
  await expect(page.getByTestId('window')).toHaveAttribute('data-ready', 'true');
  await expect(page.locator('[data-testid^="curve-"]').first()).toBeVisible();
  // The module that sends them is the first script of the page, loaded on its own (async), ahead of the window's.
  const scripts = await page.locator('head script[src]').evaluateAll((tags) => tags.map((tag) => `${tag.getAttribute('src')} ${tag.hasAttribute('async') ? 'async' : ''}`.trim()));
  expect(scripts[0]).toMatch(/^\.\/assets\/early-requests-[\w-]+\.js async$/);
  expect(scripts.length).toBe(2);
  // The window's start is one script besides it: the page names no further module for the first view (the later
  // tabs add their own files once the diagram is drawn).
  const named = await page.locator('head link[rel="modulepreload"]').evaluateAll((links) => links.map((link) => link.getAttribute('href')));
  expect(named.filter((href) => href?.startsWith('./'))).toEqual([scripts[0]!.replace(' async', '')]);
  // And it asks Chromium to compile all of it while it streams in (V8's explicit compile hint, the file's first line).
  const windowScript = await page.evaluate(async (src) => (await fetch(src)).text(), scripts[1]!);
  expect(windowScript.split('\n')[0]).toBe('//# allFunctionsCalledOnLoad');
  for (const first of ['getProject {}', 'keptDrafts {}', 'listConcepts {}']) expect(asked).toContain(first);
  expect(asked.some((call) => call.startsWith('getVersion '))).toBe(true);
  expect(asked.some((call) => call.startsWith('listVersions '))).toBe(true);
  // Each call once: the window took the answers sent ahead instead of asking again.
  expect(asked.length).toBe(new Set(asked).size);
  expect(problems).toEqual([]);
});
