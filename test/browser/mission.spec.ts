/**
 * The Mission panel: a mission added, edited segment by segment and removed
 * through the same undoable edits as every other field; the closed take-off
 * mass in the design-point panel, and what moves it. Screenshots of each step
 * also go to $LOFTPOINT_MISSION_SHOTS (default /tmp/mission-shots).
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from '@playwright/test';
import { expect, test, type DesignerWindow } from './window';

const SHOTS = process.env.LOFTPOINT_MISSION_SHOTS ?? '/tmp/mission-shots';

async function shot(window: DesignerWindow, page: Page, name: string): Promise<void> {
  await window.shot(name);
  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: join(SHOTS, `${name}.png`) });
}

/** The Mission tab, with the mission the concept has removed, so the test starts from none. */
async function openWithoutMission(window: DesignerWindow): Promise<void> {
  await window.byTest('tab-mission').click();
  const remove = window.byTest('mission-remove');
  if (await remove.isVisible()) await remove.click();
  await expect(window.byTest('mission-none')).toBeVisible();
}

const kinds = (window: DesignerWindow) => window.byTest('mission-segment').evaluateAll((items) => items.map((item) => item.getAttribute('data-kind')));

test('a mission is added, its segments added, moved, edited and removed, and the mission removed; undo steps back', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await openWithoutMission(window);
  await shot(window, page, 'mission-none');

  await window.byTest('mission-add').click();
  const panel = window.byTest('mission-panel');
  // A piston aircraft burns fuel at a brake-specific rate through a propeller (common practice).
  await expect(window.byTest('mission-energy')).toHaveText('Fuel, propeller (BSFC)');
  expect(await kinds(window)).toEqual(['takeoff-climb', 'cruise', 'descent-landing', 'reserve']);
  await expect(panel.getByLabel('Brake specific fuel consumption')).toHaveValue('0.26');
  await shot(window, page, 'mission-added');

  // A loiter goes in before the descent, opened for editing.
  await window.byTest('new-segment-kind').selectOption('loiter');
  await window.byTest('segment-add').click();
  expect(await kinds(window)).toEqual(['takeoff-climb', 'cruise', 'loiter', 'descent-landing', 'reserve']);
  const loiter = window.byTest('mission-segment').nth(2);
  await loiter.getByLabel('Endurance').fill('40');
  await expect(loiter.getByTestId('segment-summary')).toContainText('40 min');
  await loiter.getByTestId('segment-up').click();
  expect(await kinds(window)).toEqual(['takeoff-climb', 'loiter', 'cruise', 'descent-landing', 'reserve']);
  await shot(window, page, 'mission-loiter-moved');

  // A reserve kept as a share of the fuel has no speed or altitude.
  const reserve = window.byTest('mission-segment').nth(4);
  await reserve.getByTestId('segment-toggle').click();
  await reserve.getByTestId('segment-basis').selectOption('fraction');
  await expect(reserve.getByLabel('Speed (TAS)')).toHaveCount(0);
  await expect(reserve.getByTestId('segment-summary')).toHaveText('5 % of the fuel or energy');

  await window.byTest('mission-segment').nth(1).getByTestId('segment-remove').click();
  expect(await kinds(window)).toEqual(['takeoff-climb', 'cruise', 'descent-landing', 'reserve']);
  await window.byTest('undo').click();
  expect(await kinds(window)).toEqual(['takeoff-climb', 'loiter', 'cruise', 'descent-landing', 'reserve']);

  await window.byTest('mission-remove').click();
  await expect(window.byTest('mission-none')).toBeVisible();
  await window.byTest('undo').click();
  await expect(window.byTest('mission-segment')).toHaveCount(5);
  await expect(page.getByText(/licensed engineering review/).first()).toBeVisible();
  await window.expectNoNaN();
});

test('a bad mission value names its field and leaves what is saved alone', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await openWithoutMission(window);
  await window.byTest('mission-add').click();
  const panel = window.byTest('mission-panel');
  const payload = panel.getByLabel('Payload');
  const good = await payload.inputValue();

  await payload.fill('heavy');
  const message = panel.getByTestId('field-error');
  await expect(message).toContainText('Payload');
  await expect(payload).toHaveAttribute('aria-invalid', 'true');
  await payload.fill('-20 kg');
  await expect(message).toContainText('Payload');
  await shot(window, page, 'mission-bad-payload');
  // The last good value stays in force: the mission still reads it.
  await page.keyboard.press('Escape');
  await expect(payload).toHaveValue(good);
  await window.expectNoNaN();
});
