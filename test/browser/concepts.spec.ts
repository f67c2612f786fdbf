/**
 * Concepts in the window: a new concept from a kind of aircraft, a concept
 * file imported (problems listed by field, nothing saved), rename, delete
 * refused while versions exist, and configurations added, renamed and removed.
 */
import { mkdirSync } from 'node:fs';
import { DEMO_CONCEPTS, PRELIMINARY_CAUTION } from '../../core';
import { expect, test } from './window';

const SHOTS = '/tmp/loftpoint-window-shots';
mkdirSync(SHOTS, { recursive: true });

test('a new concept from a kind of aircraft, renamed, and its deletion refused while it has versions', async ({ window, page }) => {
  await window.byTest('open-concepts').click();
  const dialog = window.byTest('concepts-dialog');
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText(PRELIMINARY_CAUTION);
  await window.byTest('new-blank-concept-name').fill('LP-2 two-seat trainer');
  await expect(dialog.getByRole('alert')).toContainText('already exists');
  await expect(window.byTest('new-blank-concept-create')).toBeDisabled();
  await window.byTest('new-blank-concept-name').fill('Commuter study');
  await window.byTest('new-blank-concept-kind').selectOption({ label: 'Twin turboprop' });
  await page.screenshot({ path: `${SHOTS}/concepts-dialog-new.png` });
  await window.byTest('new-blank-concept-create').click();
  await expect(dialog).toHaveCount(0);
  await expect(window.byTest('concept-title')).toHaveText('Commuter study');
  await expect(window.byTest('status-message')).toContainText('New concept "Commuter study" saved as version');
  // The twin's starting values come with its one-engine-out configuration.
  await window.byTest('tab-assumptions').click();
  await expect(window.byTest('configuration-engine-out')).toBeVisible();
  await window.expectNoNaN();
  await page.screenshot({ path: `${SHOTS}/concepts-new-twin.png` });

  // Rename it; the concept list and the open concept follow.
  await window.byTest('open-concepts').click();
  const row = dialog.locator('[data-testid="concept-row"][data-name="Commuter study"]');
  await row.getByTestId('concept-rename').click();
  await row.getByTestId('concept-rename-input').fill('Commuter study B');
  await row.getByTestId('concept-rename-save').click();
  await expect(dialog.locator('[data-testid="concept-row"][data-name="Commuter study B"]')).toBeVisible();
  await expect(window.byTest('concept-select')).toHaveValue('Commuter study B');

  // Delete: refused, the concept has a saved version, and it stays.
  await dialog.locator('[data-testid="concept-row"][data-name="Commuter study B"]').getByTestId('concept-delete').click();
  await expect(window.byTest('concept-row-problem')).toContainText('has 1 saved version');
  await expect(dialog.locator('[data-testid="concept-row"][data-name="Commuter study B"]')).toHaveCount(1);
  await page.screenshot({ path: `${SHOTS}/concepts-delete-refused.png` });
  await window.byTest('concepts-close').click();
});

test('a concept file imported: problems listed by field and nothing saved, then a good file opens as a new concept', async ({ window, page }) => {
  const concepts = (await window.byTest('concept-select').locator('option').count());
  await window.byTest('open-concepts').click();
  const bad = structuredClone(DEMO_CONCEPTS[0].concept) as Record<string, any>;
  bad.aircraft.aero.aspectRatio = -2;
  bad.requirements[0].speed = 'fast';
  await window.byTest('import-concept-file').setInputFiles({ name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
  await window.byTest('import-concept-run').click();
  const problem = window.byTest('import-concept-problem');
  await expect(problem).toContainText('nothing was saved');
  await expect(problem).toContainText('aircraft.aero.aspectRatio');
  await expect(problem).toContainText('requirements[0].speed');
  await page.screenshot({ path: `${SHOTS}/concepts-import-problems.png` });
  await expect(window.byTest('concept-row')).toHaveCount(concepts);

  const good = { ...structuredClone(DEMO_CONCEPTS[3].concept), name: 'Survey drone, partner file' };
  await window.byTest('import-concept-file').setInputFiles({ name: 'partner.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(good, null, 2)) });
  await window.byTest('import-concept-run').click();
  await expect(window.byTest('concepts-dialog')).toHaveCount(0);
  await expect(window.byTest('concept-title')).toHaveText('Survey drone, partner file');
  await expect(window.byTest('concept-select').locator('option')).toHaveCount(concepts + 1);
  await window.expectNoNaN();
});

test('configurations: a trainer gets an engine-out configuration; removing landing is refused naming the requirement', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('tab-assumptions').click();
  await window.byTest('configuration-add-name').fill('engine-out');
  await window.byTest('configuration-add-from').selectOption('takeoff');
  await window.byTest('configuration-add').click();
  const engineOut = window.byTest('configuration-engine-out');
  await expect(engineOut).toBeVisible();
  await expect(window.byTest('unsaved')).toBeVisible();

  await window.byTest('configuration-landing').getByTestId('configuration-remove').click();
  await expect(window.byTest('configuration-landing').getByTestId('configuration-problem')).toContainText('requirements "stall", "landing-grass" (by its default) fly in it');
  await expect(window.byTest('configuration-landing')).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/configurations-remove-refused.png` });

  await engineOut.getByTestId('configuration-rename').click();
  await engineOut.getByTestId('configuration-rename-input').fill('one-engine-out');
  await engineOut.getByTestId('configuration-rename-save').click();
  const renamed = window.byTest('configuration-one-engine-out');
  await expect(renamed).toBeVisible();
  await renamed.getByTestId('configuration-remove').click();
  await expect(window.byTest('configuration-one-engine-out')).toHaveCount(0);
  await window.byTest('undo').click();
  await expect(window.byTest('configuration-one-engine-out')).toBeVisible();
  await window.expectNoNaN();
  await page.screenshot({ path: `${SHOTS}/configurations-after.png` });
});
