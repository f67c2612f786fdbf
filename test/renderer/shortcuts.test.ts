/**
 * One key press, one action: in the desktop window the native menu's
 * accelerators (Ctrl+Z, Ctrl+Y, Ctrl+S) send the command to the page, so the
 * page must not act on the same key as well; in a browser there is no such
 * menu and the page acts itself.
 */
import { describe, expect, it } from 'vitest';
import { pageShortcut } from '../../app/renderer/lib/state/shortcuts';
import { menuTemplate } from '../../app/main/menu';

const key = (k: string, extra: Partial<{ shiftKey: boolean; altKey: boolean; metaKey: boolean }> = {}) => ({ key: k, ctrlKey: true, metaKey: false, altKey: false, shiftKey: false, ...extra });

function accelerators(): string[] {
  const actions = { newProject() {}, openProject() {}, openRecent() {}, clearRecent() {}, send() {}, about() {} };
  const walk = (items: ReturnType<typeof menuTemplate>): string[] =>
    items.flatMap((item) => [...(typeof item.accelerator === 'string' ? [item.accelerator] : []), ...(Array.isArray(item.submenu) ? walk(item.submenu) : [])]);
  return walk(menuTemplate(actions, { platform: 'linux', recent: [], units: 'si', developer: false }));
}

describe('pageShortcut', () => {
  it('leaves every key the desktop menu has an accelerator for to the menu', () => {
    const owned = accelerators();
    expect(owned).toEqual(expect.arrayContaining(['CmdOrCtrl+Z', 'Ctrl+Y', 'CmdOrCtrl+S']));
    for (const press of [key('z'), key('y'), key('s'), key('Z', { shiftKey: true })]) expect(pageShortcut(press, true, false)).toBeNull();
  });

  it('acts on the usual keys in a browser, where there is no native menu', () => {
    expect(pageShortcut(key('s'), false, false)).toBe('save-version');
    expect(pageShortcut(key('z'), false, false)).toBe('undo');
    expect(pageShortcut(key('Z', { shiftKey: true }), false, false)).toBe('redo');
    expect(pageShortcut(key('y'), false, false)).toBe('redo');
    expect(pageShortcut(key('z', { metaKey: true }), false, false)).toBe('undo');
  });

  it('lets a text field undo its own typing, and ignores Alt chords and plain keys', () => {
    expect(pageShortcut(key('z'), false, true)).toBeNull();
    expect(pageShortcut(key('s'), false, true)).toBe('save-version');
    expect(pageShortcut(key('z', { altKey: true }), false, false)).toBeNull();
    expect(pageShortcut({ ...key('z'), ctrlKey: false }, false, false)).toBeNull();
  });
});
