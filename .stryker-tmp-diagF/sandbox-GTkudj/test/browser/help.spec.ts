// @ts-nocheck
import { expect, test } from './window';

test('Help shows the methods reference with its numbered sections and the caution', async ({ window, page }) => {
  await page.getByTestId('open-methods-help').click();
  const help = window.byTest('methods-help');
  await expect(help).toBeVisible();
  await expect(help.getByRole('heading', { name: '6. Constraint boundaries' })).toBeVisible();
  // The kinds' sections come from their descriptors (core/requirements).
  await expect(help.getByRole('heading', { name: /Take-off ground roll \(takeoff-ground-roll\)/ })).toBeAttached();
  await expect(help).toContainText('licensed engineering review');
  await window.shot('methods-help');
  await page.getByTestId('methods-help-close').click();
  await expect(help).toHaveCount(0);
});

test('each requirement card states its values in one line, from its kind', async ({ window }) => {
  // The trainer demo's stall speed: 45 kt CAS in landing flaps (core/concept/demos/trainer.ts).
  const stall = window.byTest('requirement-stall');
  await expect(stall.getByTestId('requirement-values')).toContainText('CAS');
  await expect(stall.getByTestId('requirement-values')).toContainText('landing configuration');
  await window.expectNoNaN();
});
