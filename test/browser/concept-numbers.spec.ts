import { expect, test } from './window';

// The utility-twin demo's design point, 1,850 N/m^2 and aspect ratio 9.6, sized at the 5,770.4 kg its mission
// closes to (the closure has its own tests in test/core/mission). By hand: S = 5770.4 x 9.80665 / 1850 = 30.588 m^2
// (g0, CGPM 1901); b = sqrt(9.6 x 30.588) = 17.136 m; c = S/b = 1.7850 m (AR = b^2/S, Anderson, Introduction to
// Flight); 1 ft = 0.3048 m (NIST SP 811): b = 56.22 ft, c = 5.86 ft.
test('the design-point panel shows span and mean chord; the history counts versions per concept', async ({ window, page }) => {
  await window.selectConcept('LP-19 utility twin');
  await window.byTest('tab-point').click();
  await expect(window.byTest('sizing-span')).toHaveText('17.14 m');
  await expect(window.byTest('sizing-mean-chord')).toHaveText('1.79 m');
  await window.shot('span-and-chord');
  await window.byTest('units-us').click();
  await expect(window.byTest('sizing-span')).toHaveText('56.2 ft');
  await expect(window.byTest('sizing-mean-chord')).toHaveText('5.9 ft');
  await window.byTest('units-si').click();

  // Save a second version of the twin: its versions read v1 and v2, whatever their numbers in the project file.
  const card = await window.openRequirement('cruise');
  await card.getByLabel('Cruise speed (TAS)').fill('240 kt');
  await window.byTest('open-save').click();
  await window.byTest('version-note').fill('Faster cruise');
  await window.byTest('save-version').click();
  await window.byTest('tab-history').click();
  const list = window.byTest('version-list');
  await expect(list.locator('li')).toHaveCount(2);
  await expect(list.getByTestId('version-number')).toHaveText(['v2', 'v1']);
  // The project-wide number stays in the store (the test id and the tooltip), and is larger than 2 for the twin's second version.
  const newest = Number((await list.locator('li').first().getAttribute('data-testid'))!.replace('version-', ''));
  expect(newest).toBeGreaterThan(2);
  await expect(list.getByTestId('version-number').first()).toHaveAttribute('title', `Version ${newest} of the project file`);
  await expect(list.locator('li').first()).toContainText('from v1');
  await window.shot('history-per-concept');
  await window.expectNoNaN();
  void page;
});
