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

/** "1,234.5 kg" -> 1234.5. */
const numberIn = (text: string | null) => parseFloat((text ?? '').replace(/,/g, ''));

test('a mission closes the take-off mass, the wing area follows it, and a longer range grows it', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await openWithoutMission(window);
  // Without a mission the sizing is at the written take-off mass.
  await expect(window.byTest('mass-breakdown')).toHaveCount(0);
  const areaWritten = numberIn(await window.byTest('sizing-wing-area').textContent());

  await window.byTest('mission-add').click();
  await expect(window.byTest('mission-closes')).toBeVisible();
  const takeoff = numberIn(await window.byTest('mass-takeoff').textContent());
  expect(takeoff).toBeGreaterThan(0);
  // The parts add up to the take-off mass (m0 = empty + fuel + payload + crew, the closure's balance; shown to whole kg).
  const parts = await window.byTest('mass-part-value').allTextContents();
  expect(Math.abs(parts.map(numberIn).reduce((a, b) => a + b, 0) - takeoff)).toBeLessThanOrEqual(parts.length);
  await expect(window.byTest('mass-bar').locator('rect[data-part]')).toHaveCount(parts.length);
  // Growth factor: more than 1, since each kilogram of payload also needs structure and fuel to carry it (common practice).
  expect(numberIn(await window.byTest('mass-growth').textContent())).toBeGreaterThan(1);
  // Each cruise, loiter or reserve shows its lift-to-drag ratio from the concept's own polar.
  await expect(window.byTest('mass-segment').filter({ has: page.locator('[data-kind="cruise"]') }).or(window.byTest('mass-segment').and(page.locator('[data-kind="cruise"]'))).getByTestId('mass-segment-ld')).toHaveText(/^\d+(\.\d+)?$/);
  // Wing area at the same wing loading scales with the mass (S = m g0 / (W/S)).
  const area = numberIn(await window.byTest('sizing-wing-area').textContent());
  expect(area).not.toBeCloseTo(areaWritten, 1);
  expect(area / areaWritten).toBeCloseTo(takeoff / 750, 2);
  await shot(window, page, 'mission-closed');

  // Twice the range needs more fuel, so more take-off mass.
  const cruise = window.byTest('mission-segment').nth(1);
  await cruise.getByTestId('segment-toggle').click();
  await cruise.getByLabel('Range').fill('1600 km');
  await expect.poll(async () => numberIn(await window.byTest('mass-takeoff').textContent())).toBeGreaterThan(takeoff);
  expect(numberIn(await window.byTest('sizing-wing-area').textContent())).toBeGreaterThan(area);
  await shot(window, page, 'mission-longer-range');

  // What moves the take-off mass: largest first, the field on hover.
  await window.byTest('tab-drivers').click();
  const drivers = window.byTest('mass-driver');
  await expect(drivers.first()).toBeVisible();
  const values = (await window.byTest('mass-driver-value').allTextContents()).map((text) => Math.abs(parseFloat(text.replace('−', '-'))));
  expect([...values].sort((a, b) => b - a)).toEqual(values);
  await expect(drivers.filter({ hasText: /payload/i }).first()).toHaveAttribute('title', 'mission.payload');
  await shot(window, page, 'mission-drivers');
  await window.expectNoNaN();
});

test('a mission that cannot close says so in the engine’s words, naming the fraction, and never shows NaN', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await openWithoutMission(window);
  await window.byTest('mission-add').click();
  await expect(window.byTest('mission-closes')).toBeVisible();
  const panel = window.byTest('mission-panel');
  await panel.getByLabel('Empty-mass fraction').fill('0.95');
  await expect(window.byTest('mission-problem')).toContainText('The mission does not close: empty-mass fraction 0.95');
  await expect(window.byTest('mass-problem')).toContainText('fraction');
  await expect(window.byTest('mass-breakdown')).toHaveCount(0);
  await shot(window, page, 'mission-cannot-close');
  await window.expectNoNaN();
  // Back to a fraction that closes: the mass is back.
  await panel.getByLabel('Empty-mass fraction').fill('');
  await expect(window.byTest('mission-closes')).toBeVisible();
  await expect(window.byTest('mass-breakdown')).toBeVisible();
});

test('mission fields and the closed mass follow the units: SI, US customary, knots and feet', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await openWithoutMission(window);
  await window.byTest('mission-add').click();
  const panel = window.byTest('mission-panel');
  const cruise = window.byTest('mission-segment').nth(1);
  await cruise.getByTestId('segment-toggle').click();
  await cruise.getByLabel('Range').fill('800');
  await expect(cruise.getByLabel('Range')).toHaveValue('800');
  const kg = numberIn(await window.byTest('mass-takeoff').textContent());
  await expect(window.byTest('mass-takeoff')).toContainText('kg');

  await page.getByTestId('units-us').click();
  // 800 km = 431.97 nmi (1 nmi = 1852 m exactly, NIST SP 811); 1 lb = 0.45359237 kg exactly.
  await expect(cruise.getByLabel('Range')).toHaveValue('800 km');
  await expect(cruise.getByTestId('field-converted')).toHaveText('= 432 nmi');
  await expect(window.byTest('mass-takeoff')).toContainText('lb');
  expect(numberIn(await window.byTest('mass-takeoff').textContent())).toBeCloseTo(kg / 0.45359237, -1);
  await expect(panel.getByLabel('Payload')).toHaveValue(/kg$/);
  await shot(window, page, 'mission-us');

  // Typed in nautical miles, the value goes into the file with its unit.
  await cruise.getByLabel('Range').fill('500');
  await expect(cruise.getByTestId('segment-summary')).toContainText('500 nmi');

  await page.getByTestId('units-kt-ft').click();
  // The working mix: lengths in nmi and ft, speeds in kt, masses in kg.
  await expect(cruise.getByLabel('Range')).toHaveValue('500');
  await expect(window.byTest('mass-takeoff')).toContainText('kg');
  await shot(window, page, 'mission-kt-ft');
  await window.expectNoNaN();
});

test('a demo’s own mission: the survey drone closes by battery, and moving the design point closes the mass again', async ({ window, page }) => {
  await window.selectConcept('LP-S4 survey drone');
  await window.byTest('tab-mission').click();
  await expect(window.byTest('mission-energy')).toHaveText('Battery');
  // A battery does not burn off: the breakdown has a battery, no fuel, and the segments draw energy in kWh.
  await expect(window.byTest('mass-part').and(page.locator('[data-part="battery"]'))).toHaveCount(1);
  await expect(window.byTest('mass-part').and(page.locator('[data-part="fuel"]'))).toHaveCount(0);
  await expect(window.byTest('mass-segments')).toContainText('kWh');
  const takeoff = await window.byTest('mass-takeoff').textContent();
  const area = await window.byTest('sizing-wing-area').textContent();
  await shot(window, page, 'mission-drone');

  // The mission flies the wing the wing loading gives: a new point, a new lift-to-drag ratio, a new mass and wing.
  await window.dragPoint(70, -30);
  await expect(window.byTest('mass-takeoff')).not.toHaveText(takeoff!);
  await expect(window.byTest('sizing-wing-area')).not.toHaveText(area!);
  await shot(window, page, 'mission-drone-moved');
  await window.byTest('undo').click();
  await expect(window.byTest('mass-takeoff')).toHaveText(takeoff!);
  await window.expectNoNaN();
});
