/**
 * The page's own keyboard shortcuts (save a version, undo, redo). In the
 * desktop window the native menu owns these keys through its accelerators
 * and sends the command to the page, so the page leaves them alone there:
 * one key press, one action.
 */
export type ShortcutAction = 'save-version' | 'undo' | 'redo';

export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  altKey: boolean;
  shiftKey: boolean;
}

/** The action a key press asks the page for, or null. `menuOwnsShortcuts` is true in the desktop window. */
export function pageShortcut(event: KeyLike, menuOwnsShortcuts: boolean, typing: boolean): ShortcutAction | null {
  if (menuOwnsShortcuts) return null;
  if (!(event.ctrlKey || event.metaKey) || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (key === 's') return 'save-version';
  if (typing) return null;
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y') return 'redo';
  return null;
}
