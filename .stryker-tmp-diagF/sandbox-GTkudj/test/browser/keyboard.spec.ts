// @ts-nocheck
import { expect, test } from './window';

test('the main flow works from the keyboard', async ({ window, page }) => {
  // Tab from the top of the page reaches the requirements, the diagram and the design point.
  await page.keyboard.press('Tab');
  await expect(window.byTest('concept-select')).toBeFocused();
  let reached = false;
  for (let i = 0; i < 80 && !reached; i += 1) {
    await page.keyboard.press('Tab');
    reached = await window.byTest('design-point-marker').evaluate((element) => element === document.activeElement);
  }
  expect(reached).toBe(true);
  await window.shot('point-focused');

  // Arrow keys move the design point; Shift moves it further.
  const wingLoading = await window.byTest('point-wing-loading').textContent();
  const margins = await window.margins();
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('Shift+ArrowUp');
  await expect(window.byTest('point-wing-loading')).not.toHaveText(wingLoading!);
  expect(await window.margins()).not.toEqual(margins);
  await window.shot('point-moved-by-keys');

  // Undo by shortcut; O snaps to the optimum.
  await page.keyboard.press('Control+z');
  await expect(window.byTest('point-wing-loading')).toHaveText(wingLoading!);
  await page.keyboard.press('Control+Shift+z');
  await expect(window.byTest('point-wing-loading')).not.toHaveText(wingLoading!);
  await page.keyboard.press('o');
  await expect(window.byTest('margin-value').first()).toHaveText('0.0 %');

  // Open a requirement and edit it without the mouse.
  await window.byTest('requirement-cruise').getByTestId('requirement-toggle').focus();
  await page.keyboard.press('Enter');
  const speed = window.byTest('requirement-cruise').getByLabel('Cruise speed (TAS)');
  await expect(speed).toBeVisible();
  await page.keyboard.press('Tab');
  await page.keyboard.press('Tab');
  await expect(speed).toBeFocused();
  await page.keyboard.press('Control+a');
  await page.keyboard.type('120 kt');
  await expect(window.byTest('unsaved')).toBeVisible();

  // Save a version: Ctrl+S goes to the note, Ctrl+Enter saves it.
  await page.keyboard.press('Control+s');
  await expect(window.byTest('version-note')).toBeFocused();
  await page.keyboard.type('Cruise 120 kt, typed from the keyboard');
  await page.keyboard.press('Control+Enter');
  await expect(window.byTest('unsaved')).toHaveCount(0);
  await expect(window.byTest('status-message')).toContainText('Saved version');
  await window.shot('saved-by-keyboard');

  // Units by keyboard.
  await window.byTest('units-us').focus();
  await page.keyboard.press('Enter');
  await expect(window.byTest('x-title')).toContainText('lb/ft²');
  await page.keyboard.press('Shift+Tab');
  await page.keyboard.press('Enter');
  await expect(window.byTest('x-title')).toContainText('N/m²');
});
