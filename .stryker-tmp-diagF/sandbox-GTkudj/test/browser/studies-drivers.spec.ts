/**
 * The Sensitivity tab (what moves the optimum, what each requirement costs)
 * and requirements from published rules, on the trainer demo. Reference
 * facts: 1 lbf/ft^2 = 47.880259 N/m^2 (NIST SP 811); 14 CFR 23.77(a) asks a
 * 3.3 % balked-landing climb gradient in the landing configuration.
 */
// @ts-nocheck

import { expect, test, type DesignerWindow } from './window';

const TRAINER = 'LP-2 two-seat trainer';

async function texts(window: DesignerWindow, id: string): Promise<string[]> {
  return (await window.byTest(id).allTextContents()).map((text) => text.trim());
}

test('the sensitivity tab shows what moves the optimum, largest first, in the chosen units', async ({ window }) => {
  await window.selectConcept(TRAINER);
  await window.byTest('tab-drivers').click();
  const rows = window.byTest('tornado-row');
  await expect(rows.first()).toBeVisible();
  expect(await rows.count()).toBeGreaterThan(1);
  await expect(window.byTest('tornado-panel')).toContainText('Preliminary sizing');
  await expect(window.byTest('tornado-ranges')).toContainText('typical values from the methods reference');
  await window.shot('wing-loading');

  // Largest swing first.
  const swings = (await rows.evaluateAll((nodes) => nodes.map((node) => node.getAttribute('data-swing')))).map(Number);
  for (let i = 1; i < swings.length; i++) expect(swings[i]).toBeLessThanOrEqual(swings[i - 1]);
  // A higher landing CLmax raises the stall-limited optimum wing loading (w = 1/2 rho V^2 CLmax, Anderson).
  const clMax = window.page.locator('[data-testid="tornado-row"][data-field="aircraft.aero.configurations.landing.clMax"]');
  await expect(clMax.getByTestId('tornado-high-change')).toHaveText(/^\+\d+ N\/m²$/);
  await expect(clMax.getByTestId('tornado-low-change')).toHaveText(/^−\d+ N\/m²$/);
  const siHigh = Number((await clMax.getByTestId('tornado-high-change').textContent())!.replace(/[^\d.]/g, ''));

  // The power-to-weight chart has its own order and numbers in W/N.
  await window.byTest('tornado-measure-loading').click();
  await expect(window.byTest('tornado-nominal')).toHaveText(/W\/N$/);
  await expect(window.byTest('tornado-high-change').first()).toHaveText(/W\/N$|^0$|nothing feasible/);
  const loadingSwings = (await rows.evaluateAll((nodes) => nodes.map((node) => node.getAttribute('data-swing')))).map(Number);
  for (let i = 1; i < loadingSwings.length; i++) expect(loadingSwings[i]).toBeLessThanOrEqual(loadingSwings[i - 1]);
  await window.shot('power-to-weight');

  // US units: hp/lb, and back on wing loading lb/ft² with the SI change divided by 47.88.
  const siNumbers = await texts(window, 'tornado-swing');
  await window.byTest('units-us').click();
  await expect(window.byTest('tornado-nominal')).toHaveText(/hp\/lb$/);
  expect(await texts(window, 'tornado-swing')).not.toEqual(siNumbers);
  await window.byTest('tornado-measure-wing-loading').click();
  await expect(clMax.getByTestId('tornado-high-change')).toHaveText(/^\+[\d.]+ lb\/ft²$/);
  const usHigh = Number((await clMax.getByTestId('tornado-high-change').textContent())!.replace(/[^\d.]/g, ''));
  expect(Math.abs(usHigh - siHigh / 47.880259)).toBeLessThanOrEqual(0.06);
  await window.shot('us-units');
  await window.expectNoNaN();
  await window.byTest('units-si').click();
});

test('changing the step changes what each requirement costs; one that cannot be met shows a dash', async ({ window }) => {
  await window.selectConcept(TRAINER);
  await window.byTest('tab-drivers').click();
  const stall = window.page.locator('[data-testid="cost-row"][data-id="stall"]');
  const tightened = stall.getByTestId('cost-tightened-loading');
  await expect(tightened).toHaveText(/^\+[\d.]+ W\/N/);
  const atTen = await tightened.textContent();
  await expect(window.byTest('cost-step-shown')).toHaveText('10 %');
  await window.byTest('costs-table').scrollIntoViewIfNeeded();
  await window.shot('step-10');

  const step = window.byTest('cost-step');
  await step.fill('20');
  await expect(window.byTest('cost-step-shown')).toHaveText('20 %');
  await expect(tightened).not.toHaveText(atTen!);
  // 45 kt less 20 % is 36 kt = 18.52 m/s (1 kt = 1852/3600 m/s, NIST SP 811).
  await expect(stall.getByTestId('cost-tightened').locator('td').nth(1)).toHaveText('18.5 m/s');

  // A word is refused with a message naming the field; the table keeps the last good step.
  await step.fill('lots');
  await expect(window.byTest('cost-step-error')).toContainText('Step: "lots" is not a number');
  await expect(window.byTest('cost-step-shown')).toHaveText('20 %');
  await window.shot('bad-step');

  // Half the stall speed caps the wing loading below the plotted range: no point meets every requirement.
  await step.fill('50');
  await expect(window.byTest('cost-step-error')).toHaveCount(0);
  await expect(tightened).toHaveText('——');
  await expect(stall.getByTestId('cost-infeasible')).toContainText('no point on the diagram meets every requirement');
  // Sorted by the size of the effect: the requirement that cannot be met comes first.
  await expect(window.byTest('cost-row').first()).toHaveAttribute('data-id', 'stall');
  await window.shot('step-50');
  await window.expectNoNaN();
});

test('a requirement from a published rule is added with its source, drawn, and can be undone', async ({ window, page }) => {
  await window.selectConcept(TRAINER);
  await window.byTest('rule-templates-toggle').click();
  const list = window.byTest('rule-templates');
  await expect(list).toContainText('Applicability depends on the certification basis');
  // A single-engine concept is offered no engine-out rule until asked.
  await expect(list.locator('[data-template="14cfr-23.67a1"]')).toHaveCount(0);
  const rule = list.locator('[data-template="14cfr-23.77a"]');
  await expect(rule.getByTestId('rule-template-source')).toHaveText('14 CFR 23.77(a)');
  await rule.scrollIntoViewIfNeeded();
  await window.shot('rule-list');

  await rule.getByTestId('rule-template-insert').click();
  const card = window.byTest('requirement-14cfr-23.77a');
  await expect(card).toBeVisible();
  await expect(card.getByTestId('requirement-source')).toHaveText('14 CFR 23.77(a)');
  await expect(card.getByTestId('requirement-note')).toContainText('Applicability depends on the certification basis');
  await expect(card.getByLabel('Climb gradient')).toHaveValue(/^3\.3/);
  await expect(window.byTest('curve-14cfr-23.77a')).toBeVisible();
  await expect(window.byTest('rule-template-message')).toContainText('Added 14 CFR 23.77(a)');
  await card.scrollIntoViewIfNeeded();
  await window.shot('rule-inserted');

  // One undo step takes it out again.
  await page.getByTestId('undo').click();
  await expect(card).toHaveCount(0);
  await expect(window.byTest('curve-14cfr-23.77a')).toHaveCount(0);
  await window.expectNoNaN();
});
