// @ts-nocheck
import { expect, test } from './window';

test('the knots-and-feet working units: values as typed, converted beside, flight levels in the requirement list', async ({ window, page }) => {
  await window.selectConcept('LP-60 light business jet');
  await page.getByTestId('units-kt-ft').click();
  await expect(page.getByTestId('units-kt-ft')).toHaveAttribute('aria-pressed', 'true');
  // The demo's cruise is written "M0.72" at "FL370": M0.72 x 295.07 m/s (USSA 1976) = 413 kt.
  const cruise = window.byTest('requirement-cruise');
  await expect(cruise.getByTestId('requirement-values')).toContainText('M0.72 (413 kt TAS) at FL370');
  await expect(window.byTest('requirement-ceiling').getByTestId('requirement-values')).toContainText('at FL430');
  await window.shot('kt-ft-requirements');
  // A field written in metres shows as typed, with whole feet beside it (1,800 m = 5,906 ft, 1 ft = 0.3048 m).
  const field = await window.openRequirement('takeoff-field');
  const converted = field.getByTestId('field-converted').first();
  await expect(converted).toHaveText('= 5,906 ft');
  await expect(field.locator('input.num').first()).toHaveValue('1800 m');
  await window.shot('kt-ft-fields');
  await expect(page.getByText(/licensed engineering review/).first()).toBeVisible();
  await window.expectNoNaN();
});
