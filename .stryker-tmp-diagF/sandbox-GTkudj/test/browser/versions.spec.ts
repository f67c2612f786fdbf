// @ts-nocheck
import { expectSameDrawing, exportOne, fileCensus, windowCensus } from './diagram-census';
import { expect, test } from './window';

const NOTE = 'Faster cruise <b>asked</b> by sales & "marketing"';

test('save a version with a note, reload, reopen the older version and compare the two', async ({ window, page }) => {
  await window.selectConcept('LP-19 utility twin');
  await window.byTest('tab-history').click();
  const list = window.byTest('version-list');
  const countBefore = await list.locator('li').count();
  const newestBefore = Number((await list.locator('li').first().getAttribute('data-testid'))!.replace('version-', ''));

  // Edit: a faster cruise.
  await window.byTest('tab-point').click();
  const card = await window.openRequirement('cruise');
  await card.getByLabel('Cruise speed (TAS)').fill('250 kt');
  await expect(window.byTest('unsaved')).toBeVisible();

  // Save with a note (the note may hold HTML; it is shown as text).
  await window.byTest('open-save').click();
  await expect(window.byTest('version-note')).toBeFocused();
  await window.byTest('version-note').fill(NOTE);
  await window.shot('note-typed');
  await window.byTest('save-version').click();
  await expect(list.locator('li')).toHaveCount(countBefore + 1);
  await expect(window.byTest('unsaved')).toHaveCount(0);
  // Version numbers run across the whole project: the new one is the newest in the list.
  const newest = Number((await list.locator('li').first().getAttribute('data-testid'))!.replace('version-', ''));
  expect(newest).toBeGreaterThan(newestBefore);
  await expect(window.byTest(`version-${newest}`).getByTestId('version-note-text')).toHaveText(NOTE);
  await expect(window.byTest(`version-${newest}`).locator('b')).toHaveCount(0);

  // Reload: the saved version and its note are still there, and the draft is that version.
  await page.reload();
  await window.ready();
  await expect(window.byTest('concept-title')).toHaveText('LP-19 utility twin');
  await window.byTest('tab-history').click();
  await expect(window.byTest(`version-${newest}`).getByTestId('version-note-text')).toHaveText(NOTE);
  await window.shot('after-reload');

  // Reopen the older version: read-only, with its own values.
  await window.byTest(`version-${newestBefore}`).getByTestId('version-open').click();
  await expect(window.byTest('viewing-banner')).toContainText(`Version ${newestBefore}`);
  await expect(window.byTest('viewing-banner')).toContainText('read-only');
  await window.byTest('tab-point').click();
  const older = await window.openRequirement('cruise');
  await expect(older.getByLabel('Cruise speed (TAS)')).toHaveJSProperty('readOnly', true);
  await expect(window.byTest('save-version')).toHaveCount(0);
  await expect(window.byTest('open-save')).toBeDisabled();
  await window.shot('older-version-read-only');

  // Compare the two: the older boundaries drawn faintly behind, and a list of what changed.
  await window.byTest('tab-history').click();
  await window.byTest(`version-${newestBefore}`).getByTestId('version-select').check();
  await window.byTest(`version-${newest}`).getByTestId('version-select').check();
  await window.byTest('compare-selected').click();
  await expect(window.byTest('viewing-banner')).toContainText('Comparing');
  await expect(window.byTest('diagram').locator('[data-role="overlay"]')).not.toHaveCount(0);
  const changes = window.byTest('changes');
  await expect(changes).toContainText(`Version ${newestBefore} → version ${newest}`);
  await expect(changes.getByTestId('change-requirement')).toContainText('cruise.speed');
  await expect(changes.getByTestId('change-requirement')).toContainText('250 kt');
  await window.shot('compare');
  // The exported diagram draws the older version behind as the window does: its boundaries and its optimum's open diamond.
  const shown = await windowCensus(window);
  expect(shown.counts['overlay-optimum']).toBe(1);
  const exported = await exportOne(window, 'export-svg');
  expectSameDrawing(await fileCensus(window, exported.bytes.toString('utf8')), shown);

  // Continue from the older version: it becomes the draft, editable again.
  await window.byTest('continue-from-version').click();
  await expect(window.byTest('viewing-banner')).toHaveCount(0);
  await expect(window.byTest('version-note')).toBeEnabled();
  await expect(window.byTest('status-message')).toContainText(`Continuing from version ${newest}`);
  await window.expectNoNaN();
});

test('a saved version starts a new concept, a design alternative that keeps the old one as it was', async ({ window }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('tab-history').click();
  const list = window.byTest('version-list');
  const source = Number((await list.locator('li').first().getAttribute('data-testid'))!.replace('version-', ''));
  const conceptsBefore = await window.byTest('concept-select').locator('option').count();

  await window.byTest(`version-${source}`).getByTestId('version-open').click();
  await window.byTest('new-concept-from-version').click();
  await expect(window.byTest('new-concept-name')).toBeFocused();
  // A name already in use is refused before anything is written.
  await window.byTest('new-concept-name').fill('LP-2 two-seat trainer');
  await expect(window.byTest('new-concept-problem')).toContainText('already exists');
  await expect(window.byTest('new-concept-start')).toBeDisabled();
  await window.byTest('new-concept-name').fill('LP-2 high-wing variant');
  await window.byTest('new-concept-note').fill('Try a high wing for grass-strip clearance');
  await window.shot('new-concept-form');
  await window.byTest('new-concept-start').click();

  await expect(window.byTest('viewing-banner')).toHaveCount(0);
  await expect(window.byTest('concept-select')).toHaveValue('LP-2 high-wing variant');
  await expect(window.byTest('concept-title')).toHaveText('LP-2 high-wing variant');
  await expect(window.byTest('concept-select').locator('option')).toHaveCount(conceptsBefore + 1);
  await expect(window.byTest('status-message')).toContainText(`from version ${source}`);
  // Its one version has the source version as parent and carries the note.
  await expect(list.locator('li')).toHaveCount(1);
  await expect(list.locator('li').first().getByTestId('version-note-text')).toHaveText('Try a high wing for grass-strip clearance');
  await expect(window.byTest('unsaved')).toHaveCount(0);
  await window.shot('new-concept-started');

  // The original concept is untouched.
  await window.selectConcept('LP-2 two-seat trainer');
  await expect(window.byTest(`version-${source}`)).toBeVisible();
  await window.expectNoNaN();
});
