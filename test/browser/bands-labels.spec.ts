/**
 * Bands by choice and labels: one boundary banded, then a few, then all; the
 * optimum and the design point labelled on screen; a second boundary of one
 * kind drawn in a shade of the kind's colour.
 */
import { mkdirSync } from 'node:fs';
import { kindColour, kindShade } from '../../app/chart/palette';
import { expect, test } from './window';

const SHOTS = '/tmp/loftpoint-window-shots';
mkdirSync(SHOTS, { recursive: true });

test('band one boundary, then two, then every one; the points carry labels', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  const plot = window.byTest('diagram');
  await expect(plot.locator('[data-role="note"][data-id="optimum"]')).toContainText('Optimum');
  await expect(plot.locator('[data-role="note"][data-id="design-point"]')).toContainText('Design point');

  await window.byTest('choose-bands').click();
  await window.byTest('bands-list').locator('[data-testid="band-only"][data-id="cruise"]').click();
  const bands = window.byTest('bands');
  await expect(bands.locator('[data-role="band"]')).toHaveCount(1);
  await expect(bands.locator('[data-role="band"]')).toHaveAttribute('data-id', 'cruise');
  await expect(window.byTest('toggle-bands')).toHaveText('Bands (1)');
  await page.screenshot({ path: `${SHOTS}/bands-one.png` });

  await window.byTest('bands-list').locator('[data-testid="band-toggle"][data-id="stall"]').check();
  await expect(bands.locator('[data-role="band"]')).toHaveCount(2);
  await window.byTest('band-all').check();
  await expect(window.byTest('toggle-bands')).toHaveText('Bands');
  expect(await bands.locator('[data-role="band"]').count()).toBeGreaterThan(2);
  await window.expectNoNaN();
  await window.byTest('bands-list').getByRole('button', { name: 'Done' }).click();
  await window.byTest('toggle-bands').click();
  await expect(window.byTest('bands')).toHaveCount(0);
});

test('a second climb-gradient boundary is a shade of the first, on the diagram and its card', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('tab-requirements').click();
  await window.byTest('new-requirement-kind').selectOption('climb-gradient');
  await window.byTest('add-requirement').click();
  await expect(window.byTest('diagram').locator('[data-role="curve"][data-id="climb-gradient"]')).toHaveCount(1);
  const first = await window.byTest('diagram').locator('[data-role="curve"][data-id="climb-83"]').getAttribute('stroke');
  const second = await window.byTest('diagram').locator('[data-role="curve"][data-id="climb-gradient"]').getAttribute('stroke');
  expect(first).toBe(kindColour('climb-gradient'));
  expect(second).toBe(kindShade(kindColour('climb-gradient'), 1));
  await expect(window.byTest('requirement-climb-gradient').locator('.swatch line')).toHaveAttribute('stroke', second!);
  await window.expectNoNaN();
  await page.screenshot({ path: `${SHOTS}/second-climb-shade.png` });
  await window.byTest('undo').click();
});
