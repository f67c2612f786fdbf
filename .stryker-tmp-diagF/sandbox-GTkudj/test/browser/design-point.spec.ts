// @ts-nocheck
import { expect, test } from './window';

test('dragging the design point changes the margins and the sizing; undo puts it back', async ({ window, page }) => {
  const margins = await window.margins();
  const area = await window.byTest('sizing-wing-area').textContent();
  const wingLoading = await window.byTest('point-wing-loading').textContent();
  await window.shot('before-drag');

  // Right and up: higher wing loading (smaller wing) and more power.
  await window.dragPoint(60, -50);
  await expect(window.byTest('point-wing-loading')).not.toHaveText(wingLoading!);
  const moved = await window.margins();
  expect(moved).not.toEqual(margins);
  await expect(window.byTest('sizing-wing-area')).not.toHaveText(area!);
  const areaBefore = parseFloat(area!.replace(/,/g, ''));
  const areaAfter = parseFloat((await window.byTest('sizing-wing-area').textContent())!.replace(/,/g, ''));
  expect(areaAfter).toBeLessThan(areaBefore);
  await window.shot('after-drag');

  // Tightest first: the listed margins are in ascending order.
  const values = Object.values(moved).map((text) => parseFloat(text.replace('−', '-').replace('+', '')));
  expect([...values].sort((a, b) => a - b)).toEqual(values);

  await page.getByTestId('undo').click();
  await expect(window.byTest('point-wing-loading')).toHaveText(wingLoading!);
  expect(await window.margins()).toEqual(margins);

  // Snap to the optimum: the tightest margin becomes zero.
  await window.byTest('snap-to-optimum').click();
  await expect(window.byTest('margin-value').first()).toHaveText('0.0 %');
  await expect(window.byTest('point-feasible')).toHaveText('meets every requirement');
  await window.shot('snapped');

  // Zoom in and reset the view.
  const xTicks = await window.byTest('x-axis').textContent();
  await window.byTest('zoom-in').click();
  await window.byTest('zoom-in').click();
  await expect(window.byTest('x-axis')).not.toHaveText(xTicks!);
  await window.shot('zoomed');
  await window.byTest('reset-view').click();
  await expect(window.byTest('x-axis')).toHaveText(xTicks!);

  // The wheel zooms about the pointer; dragging the background pans.
  const plot = (await window.byTest('diagram').boundingBox())!;
  await page.mouse.move(plot.x + plot.width * 0.3, plot.y + plot.height * 0.7);
  await page.mouse.wheel(0, -400);
  await expect(window.byTest('x-axis')).not.toHaveText(xTicks!);
  await expect(window.byTest('reset-view')).toBeEnabled();
  const zoomedTicks = await window.byTest('x-axis').textContent();
  await page.mouse.down();
  await page.mouse.move(plot.x + plot.width * 0.5, plot.y + plot.height * 0.6, { steps: 5 });
  await page.mouse.up();
  await expect(window.byTest('x-axis')).not.toHaveText(zoomedTicks!);
  await window.shot('wheel-and-pan');
  await window.byTest('reset-view').click();
  await expect(window.byTest('x-axis')).toHaveText(xTicks!);
  await window.expectNoNaN();
});

test('switching units changes every panel and the diagram at once', async ({ window }) => {
  const card = await window.openRequirement('stall');
  const speed = card.getByLabel('Stall speed (CAS)');
  const siSpeed = await speed.inputValue();
  await expect(window.byTest('x-title')).toContainText('N/m²');
  await window.byTest('units-us').click();
  await expect(window.byTest('x-title')).toHaveText('Wing loading W/S [lb/ft²]');
  await expect(window.byTest('y-title')).toHaveText('Power-to-weight P/W [hp/lb]');
  await expect(window.byTest('point-wing-loading')).toContainText('lb/ft²');
  await expect(window.byTest('point-loading')).toContainText('hp/lb');
  await expect(window.byTest('sizing-wing-area')).toContainText('ft²');
  await expect(window.byTest('sizing-installed')).toContainText('hp');
  await expect(window.byTest('speed-stall')).toContainText('kt');
  await expect(speed).not.toHaveValue(siSpeed);
  await expect(card).toContainText('kt');
  await window.shot('us-units');

  // Power loading, the inverse of power-to-weight: feasible below the curves.
  await window.byTest('axis-wp').click();
  await expect(window.byTest('y-title')).toHaveText('Power loading W/P [lb/hp]');
  await expect(window.byTest('feasible-region').first()).toBeVisible();
  await window.shot('power-loading');
  await window.byTest('axis-pw').click();
  await window.byTest('units-si').click();
  await expect(window.byTest('x-title')).toHaveText('Wing loading W/S [N/m²]');
  await expect(speed).toHaveValue(siSpeed);
  await window.expectNoNaN();
});

test('a jet is drawn as thrust-to-weight', async ({ window }) => {
  await window.selectConcept('LP-60 light business jet');
  await expect(window.byTest('y-title')).toHaveText('Thrust-to-weight T/W [–]');
  await expect(window.byTest('axis-wp')).toHaveCount(0);
  await expect(window.byTest('sizing-installed')).toContainText('kN');
  await window.shot('business-jet');
  await window.expectNoNaN();
});
