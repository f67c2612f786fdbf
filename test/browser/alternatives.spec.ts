/**
 * Alternatives: other concepts drawn over the diagram in their own colours,
 * with a legend, in the window and its SVG export; a version compared with
 * another concept's version.
 */
import { mkdirSync } from 'node:fs';
import { exportOne } from './diagram-census';
import { PRELIMINARY_CAUTION } from '../../core';
import { ALTERNATIVE_INKS } from '../../app/chart/palette';
import { expect, test } from './window';

const SHOTS = '/tmp/loftpoint-window-shots';
mkdirSync(SHOTS, { recursive: true });

test('two alternatives overlaid on the trainer, each in its own colour with a legend, and in the exported SVG', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('toggle-alternatives').click();
  const list = window.byTest('alternatives-list');
  await list.locator('[data-name="LP-19 utility twin"]').check();
  await list.locator('[data-name="LP-S4 survey drone"]').check();
  await list.locator('[data-name="LP-60 light business jet"]').check();
  const plot = window.byTest('plot');
  await expect(plot.locator('[data-role="alternative-optimum"]')).toHaveCount(2);
  await expect(plot.locator('[data-role="alternative"]')).not.toHaveCount(0);
  const strokes = await plot.locator('[data-role="alternative-optimum"]').evaluateAll((nodes) => nodes.map((node) => node.getAttribute('stroke')));
  expect(strokes).toEqual(ALTERNATIVE_INKS.slice(0, 2));
  const legend = window.byTest('alternatives-legend');
  await expect(legend).toContainText('LP-19 utility twin');
  await expect(legend).toContainText('LP-S4 survey drone');
  // The jet's diagram is thrust-to-weight: listed, not drawn on a power-to-weight plot.
  await expect(legend).toContainText('not drawn: other vertical axis');
  await page.screenshot({ path: `${SHOTS}/alternatives-menu.png` });
  await list.getByRole('button', { name: 'Done' }).click();
  await expect(window.byTest('toggle-alternatives')).toHaveText('Alternatives (3)');
  await window.expectNoNaN();
  await expect(page.getByText(PRELIMINARY_CAUTION).first()).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/alternatives-pw.png` });

  // The power-loading view keeps them.
  await window.byTest('axis-wp').click();
  await expect(plot.locator('[data-role="alternative-optimum"]')).toHaveCount(2);
  await window.expectNoNaN();
  await page.screenshot({ path: `${SHOTS}/alternatives-wp.png` });
  await window.byTest('axis-pw').click();

  // The exported SVG draws the same outlines and names them in its legend.
  const svg = (await exportOne(window, 'export-svg')).bytes.toString('utf8');
  expect(svg.match(/data-role="alternative-optimum"/g)).toHaveLength(2);
  expect(svg).toContain('LP-19 utility twin');
  expect(svg).toContain('LP-S4 survey drone');
  expect(svg).not.toMatch(/NaN|Infinity/);

  // Switching them off empties the plot of them.
  await window.byTest('toggle-alternatives').click();
  for (const name of ['LP-19 utility twin', 'LP-S4 survey drone', 'LP-60 light business jet']) await list.locator(`[data-name="${name}"]`).uncheck();
  await expect(plot.locator('[data-role^="alternative"]')).toHaveCount(0);
  await expect(window.byTest('alternatives-legend')).toHaveCount(0);
});

test("a version compared with another concept's version", async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('tab-history').click();
  const select = window.byTest('compare-with');
  const twin = select.locator('optgroup[label="LP-19 utility twin"] option').first();
  await select.selectOption(await twin.getAttribute('value') as string);
  await window.byTest('compare-across').click();
  await expect(window.byTest('viewing-banner')).toContainText('of LP-2 two-seat trainer');
  await expect(window.byTest('viewing-banner')).toContainText('of LP-19 utility twin');
  await expect(window.byTest('changes-concepts')).toContainText('LP-2 two-seat trainer');
  await expect(window.byTest('changes')).toContainText('Assumptions');
  await expect(window.byTest('diagram').locator('[data-role="overlay"]')).not.toHaveCount(0);
  await window.expectNoNaN();
  await page.screenshot({ path: `${SHOTS}/compare-across-concepts.png` });
  await window.byTest('back-to-draft').click();
});

test('comparing across concepts names versions by their number within their concept, as the version list does', async ({ window }) => {
  // The business jet is the project's third version but its concept's first: v1, as the list shows it.
  await window.selectConcept('LP-60 light business jet');
  await window.byTest('tab-history').click();
  await expect(window.byTest('version-list').getByTestId('version-number').first()).toHaveText('v1');
  await expect(window.page.locator('label[for="compare-with"]')).toHaveText('Compare v1 with');
  // The twin is the project's second version and its concept's first.
  const twin = window.byTest('compare-with').locator('optgroup[label="LP-19 utility twin"] option').first();
  await expect(twin).toHaveText(/^v1 · LP-19 utility twin/);
  expect(Number(await twin.getAttribute('value'))).toBeGreaterThan(1);
});
