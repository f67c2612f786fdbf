/**
 * One key press, one action: in the desktop window the native menu's
 * accelerators (Ctrl+Z, Ctrl+Y, Ctrl+S) send the command to the page, so the
 * page must not act on the same key as well; in a browser there is no such
 * menu and the page acts itself.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { menuChords, pageShortcut } from '../../app/renderer/lib/state/shortcuts';
import { menuTemplate } from '../../app/main/menu';

const key = (k: string, extra: Partial<{ shiftKey: boolean; altKey: boolean; metaKey: boolean }> = {}) => ({ key: k, ctrlKey: true, metaKey: false, altKey: false, shiftKey: false, ...extra });

/** The page's shortcuts among the menu's accelerators, as chords ('CmdOrCtrl+Shift+Z' -> 'mod+shift+z'). */
function acceleratorChords(platform: 'linux' | 'darwin'): string[] {
  const actions = { newProject() {}, openProject() {}, openRecent() {}, clearRecent() {}, send() {}, about() {} };
  const walk = (items: ReturnType<typeof menuTemplate>): string[] =>
    items.flatMap((item) => [...(typeof item.accelerator === 'string' ? [item.accelerator] : []), ...(Array.isArray(item.submenu) ? walk(item.submenu) : [])]);
  return walk(menuTemplate(actions, { platform, recent: [], units: 'si', developer: false }))
    .map((accelerator) => accelerator.toLowerCase().replace(/^(cmdorctrl|ctrl|cmd)\+/, 'mod+'))
    .filter((chord) => ['mod+s', 'mod+z', 'mod+y', 'mod+shift+z'].includes(chord));
}

describe('pageShortcut', () => {
  it.each([
    ['linux', false],
    ['darwin', true],
  ] as const)('in the desktop window on %s leaves exactly the menu’s accelerators to the menu', (platform, mac) => {
    expect(menuChords(mac).sort()).toEqual(acceleratorChords(platform).sort());
  });

  it('does not act on a key the menu owns (the menu sends the command once)', () => {
    const owned = menuChords(false);
    for (const press of [key('z'), key('y'), key('s')]) expect(pageShortcut(press, owned, false)).toBeNull();
    // Ctrl+Shift+Z has no accelerator off macOS, so the page still redoes with it.
    expect(pageShortcut(key('Z', { shiftKey: true }), owned, false)).toBe('redo');
  });

  it('acts on the usual keys in a browser, where there is no native menu', () => {
    expect(pageShortcut(key('s'), [], false)).toBe('save-version');
    expect(pageShortcut(key('z'), [], false)).toBe('undo');
    expect(pageShortcut(key('Z', { shiftKey: true }), [], false)).toBe('redo');
    expect(pageShortcut(key('y'), [], false)).toBe('redo');
    expect(pageShortcut(key('z', { metaKey: true }), [], false)).toBe('undo');
  });

  it('lets a text field undo its own typing, and ignores Alt chords and plain keys', () => {
    expect(pageShortcut(key('z'), [], true)).toBeNull();
    expect(pageShortcut(key('s'), [], true)).toBe('save-version');
    expect(pageShortcut(key('z', { altKey: true }), [], false)).toBeNull();
    expect(pageShortcut({ ...key('z'), ctrlKey: false }, [], false)).toBeNull();
  });
});
