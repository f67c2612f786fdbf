// @ts-nocheck
import { expect, test } from './window';

test('editing a requirement moves its curve, and undo moves it back', async ({ window, page }) => {
  const curve = window.byTest('curve-cruise');
  const before = await curve.getAttribute('d');
  const marginBefore = (await window.margins()).cruise;
  const card = await window.openRequirement('cruise');
  const speed = card.getByLabel('Cruise speed (TAS)');
  await expect(speed).toHaveValue(/^\d/);
  await window.shot('cruise-open');

  // A faster cruise needs more power: the curve rises, the margin there shrinks.
  await speed.fill('140 kt');
  await expect(curve).not.toHaveAttribute('d', before!);
  const after = await curve.getAttribute('d');
  const marginAfter = (await window.margins()).cruise;
  expect(marginAfter).not.toBe(marginBefore);
  expect(parseFloat(marginAfter.replace('−', '-'))).toBeLessThan(parseFloat(marginBefore.replace('−', '-')));
  await expect(window.byTest('unsaved')).toBeVisible();
  await window.shot('cruise-140-kt');

  // At the same wing loading the curve now sits higher on screen (smaller pixel y).
  const yNear = (d: string, x: number) => {
    const points = [...d.matchAll(/(-?[\d.]+),(-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    return points.reduce((best, p) => (Math.abs(p[0] - x) < Math.abs(best[0] - x) ? p : best))[1];
  };
  const box = await window.byTest('diagram').boundingBox();
  const middle = box!.width * 0.6;
  expect(yNear(after!, middle)).toBeLessThan(yNear(before!, middle));

  await page.getByTestId('undo').click();
  await expect(curve).toHaveAttribute('d', before!);
  await window.page.getByTestId('redo').click();
  await expect(curve).toHaveAttribute('d', after!);
  await window.expectNoNaN();
});

test('a bad value shows a message naming the field and the rest keeps working', async ({ window }) => {
  const card = await window.openRequirement('stall');
  const speed = card.getByLabel('Stall speed (CAS)');
  const limit = window.byTest('limit-stall');
  const x = await limit.getAttribute('x1');

  await speed.fill('fast');
  const message = card.getByTestId('field-error');
  await expect(message).toContainText('Stall speed (CAS)');
  await expect(speed).toHaveAttribute('aria-invalid', 'true');
  await window.shot('bad-word');
  // The last good value stays in force: the stall line has not moved.
  await expect(limit).toHaveAttribute('x1', x!);

  await speed.fill('-40 kt');
  await expect(message).toContainText('greater than 0');
  await speed.fill('45 knots per hour');
  await expect(message).toContainText('Stall speed (CAS)');
  await window.shot('bad-unit');

  // Everything else still works while the field is wrong.
  const cruise = await window.openRequirement('cruise');
  const cruiseCurve = window.byTest('curve-cruise');
  const cruiseBefore = await cruiseCurve.getAttribute('d');
  await cruise.getByLabel('Cruise speed (TAS)').fill('100 kt');
  await expect(cruiseCurve).not.toHaveAttribute('d', cruiseBefore!);
  const marginsBefore = await window.margins();
  await window.dragPoint(-40, -30);
  expect(await window.margins()).not.toEqual(marginsBefore);
  await expect(message).toBeVisible();
  await window.shot('rest-still-works');

  // A half-typed value never breaks anything; a good one clears the message and moves the line.
  await speed.fill('5');
  await speed.fill('50');
  await expect(message).toHaveCount(0);
  await expect(limit).not.toHaveAttribute('x1', x!);
  await window.expectNoNaN();
});

test('requirements can be added, switched off and removed; assumptions warn outside their typical range', async ({ window, page }) => {
  await window.byTest('new-requirement-kind').selectOption('sustained-turn');
  await window.byTest('add-requirement').click();
  await expect(window.byTest('curve-sustained-turn')).toHaveCount(1);
  await expect(window.byTest('label-sustained-turn')).toBeVisible();
  await window.shot('turn-added');

  const card = window.byTest('requirement-sustained-turn');
  await card.getByTestId('requirement-enabled').uncheck();
  await expect(window.byTest('curve-sustained-turn')).toHaveCount(0);
  await card.getByTestId('requirement-enabled').check();
  await expect(window.byTest('curve-sustained-turn')).toHaveCount(1);
  await card.getByTestId('requirement-remove').click();
  await expect(card).toHaveCount(0);
  await expect(window.byTest('curve-sustained-turn')).toHaveCount(0);

  await window.byTest('tab-assumptions').click();
  const oswald = page.locator('#field-aircraft-aero-configurations-clean-oswaldEfficiency');
  await expect(oswald).toBeVisible();
  const field = window.byTest('field-aircraft-aero-configurations-clean-oswaldEfficiency');
  await expect(field).toContainText('typical 0.7–0.95');
  await oswald.fill('0.55');
  await expect(field.getByTestId('field-warning')).toContainText(/typical/);
  await window.shot('oswald-outside-range');
  await oswald.fill('1.4');
  await expect(field.getByTestId('field-error')).toContainText('Oswald efficiency');
  await oswald.fill('0.8');
  await expect(field.getByTestId('field-warning')).toHaveCount(0);
  await expect(field.getByTestId('field-error')).toHaveCount(0);
  await window.expectNoNaN();
});

test('a landing distance over 50 ft edits like any requirement and lists its speed and segments at the optimum', async ({ window }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  const card = await window.openRequirement('landing-grass');
  const distance = card.getByLabel('Landing distance (field length with a factor)');
  await expect(distance).toHaveValue(/^420$/);
  const limit = window.byTest('limit-landing-grass');
  const x = Number(await limit.getAttribute('x1'));

  // A shorter landing distance allows less wing loading: the limit moves left.
  await distance.fill('380');
  await expect.poll(async () => Number(await limit.getAttribute('x1'))).toBeLessThan(x);
  const shorter = Number(await limit.getAttribute('x1'));

  // Lift dumping (a yes/no field under More) shortens the braking roll: the limit moves right again.
  await card.locator('details').first().locator('summary').click();
  await card.getByLabel('Lift dumping').selectOption('yes');
  await expect.poll(async () => Number(await limit.getAttribute('x1'))).toBeGreaterThan(shorter);

  // The design-point panel lists each requirement's speed at the optimum, and the landing's segments.
  const row = window.page.locator('[data-testid="speed-at-optimum-row"][data-id="landing-grass"]');
  await expect(row).toContainText(/\d+(\.\d+)? m\/s|kt/);
  await expect(row.getByTestId('segments-at-optimum')).toContainText(/approach .* \+ flare .* \+ free roll .* \+ braking .* = /);
  await window.shot('landing-distance');
  await window.expectNoNaN();
});
