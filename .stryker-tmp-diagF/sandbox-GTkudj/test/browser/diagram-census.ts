/**
 * The diagram's marks counted by role (data-role), in the window and in an
 * exported SVG file parsed by the browser's XML parser: what must match
 * between the two drawings of the same state; and one export from the menu.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { expect, type DesignerWindow } from './window';

/** Runs one export from the menu and returns the download. */
export async function exportOne(window: DesignerWindow, testId: string): Promise<{ name: string; bytes: Buffer }> {
  await expect(window.byTest('export')).toBeEnabled({ timeout: 60_000 });
  await window.byTest('export').click();
  const arriving = window.page.waitForEvent('download', { timeout: 90_000 });
  await window.byTest(testId).click();
  const download = await arriving;
  const failure = await download.failure();
  expect(failure, `download of ${testId}`).toBeNull();
  return { name: download.suggestedFilename(), bytes: readFileSync((await download.path())!) };
}

/** The diagram's marks by role (data-role), with the ids of the boundaries and labels and the axis titles: what must match. */
export interface MarkCensus {
  counts: Record<string, number>;
  curves: string[];
  limits: string[];
  labels: string[];
  titles: string[];
  designPointRings: number;
}

function census(root: ParentNode): MarkCensus {
  const all = [...root.querySelectorAll('[data-role]')];
  const counts: Record<string, number> = {};
  for (const mark of all) {
    const role = mark.getAttribute('data-role')!;
    counts[role] = (counts[role] ?? 0) + 1;
  }
  const ids = (role: string) => [...root.querySelectorAll(`[data-role="${role}"]`)].map((mark) => mark.getAttribute('data-id') ?? '').sort();
  return {
    counts,
    curves: ids('curve'),
    limits: ids('limit'),
    labels: ids('label'),
    titles: [...root.querySelectorAll('[data-role="axis-title"]')].map((mark) => mark.textContent ?? ''),
    designPointRings: root.querySelectorAll('[data-role="design-point"] circle').length,
  };
}

/** The marks the window's diagram shows now. */
export function windowCensus(window: DesignerWindow): Promise<MarkCensus> {
  return window.byTest('diagram').locator('svg').first().evaluate(census);
}

/** The marks of an SVG document, parsed by the page's XML parser (placed in a hidden holder, counted, then removed). */
export async function fileCensus(window: DesignerWindow, svg: string): Promise<MarkCensus> {
  await window.page.evaluate((text) => {
    const parsed = new DOMParser().parseFromString(text, 'image/svg+xml');
    const holder = document.createElement('div');
    holder.id = 'exported-copy';
    holder.hidden = true;
    holder.append(document.adoptNode(parsed.documentElement));
    document.body.append(holder);
  }, svg);
  const counted = await window.page.locator('#exported-copy').evaluate(census);
  await window.page.evaluate(() => document.getElementById('exported-copy')?.remove());
  return counted;
}

/** The written file draws what the window draws; only the file's notes beside its two points (the window's panels say the same) are its own. */
export function expectSameDrawing(written: MarkCensus, shown: MarkCensus): void {
  const { note: _note, leader: _leader, ...writtenCounts } = written.counts;
  expect(written.counts.note).toBe(2);
  expect(writtenCounts).toEqual(shown.counts);
  expect(written.curves).toEqual(shown.curves);
  expect(written.limits).toEqual(shown.limits);
  expect(written.labels).toEqual(shown.labels);
  expect(written.titles).toEqual(shown.titles);
  expect(written.designPointRings).toBe(shown.designPointRings);
}
