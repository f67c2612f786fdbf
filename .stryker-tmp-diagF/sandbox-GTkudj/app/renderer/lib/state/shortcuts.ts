/**
 * The page's own keyboard shortcuts (save a version, undo, redo). In the
 * desktop window the native menu owns some of these keys through its
 * accelerators and sends the command to the page, so the page leaves exactly
 * those alone there: one key press, one action. In a browser there is no
 * such menu and the page acts on all of them.
 */
// @ts-nocheck

export type ShortcutAction = 'save-version' | 'undo' | 'redo';

export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  altKey: boolean;
  shiftKey: boolean;
}

/** A chord as the menu's accelerators name it: 'mod+z', 'mod+shift+z'. */
export type Chord = string;

/** The chords the desktop window's menu owns (app/main/menu.ts: Save Version, Undo, Redo). */
export function menuChords(mac: boolean): Chord[] {
  return mac ? ['mod+s', 'mod+z', 'mod+shift+z'] : ['mod+s', 'mod+z', 'mod+y'];
}

/** The action a key press asks the page for, or null when it is not the page's to take. */
export function pageShortcut(event: KeyLike, menuOwns: readonly Chord[], typing: boolean): ShortcutAction | null {
  if (!(event.ctrlKey || event.metaKey) || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (menuOwns.includes(`mod+${event.shiftKey ? 'shift+' : ''}${key}`)) return null;
  if (key === 's') return 'save-version';
  if (typing) return null;
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y') return 'redo';
  return null;
}
