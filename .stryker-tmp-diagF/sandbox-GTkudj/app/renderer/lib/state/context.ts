/**
 * The window's shared state, handed to every panel through one typed
 * context. Reading it outside the window's tree is a programming mistake and
 * says so by name.
 */
// @ts-nocheck

import { getContext, setContext } from 'svelte';
import type { Preferences } from './preferences.svelte';
import type { ProjectState } from './project.svelte';
import type { Workspace } from './workspace.svelte';
import type { DiagramView } from '../diagram/view.svelte';

export interface WindowState {
  workspace: Workspace;
  project: ProjectState;
  preferences: Preferences;
  view: DiagramView;
}

const KEY = Symbol('loftpoint.window');

export function provideWindowState(state: WindowState): WindowState {
  return setContext(KEY, state);
}

export function windowState(): WindowState {
  const state = getContext<WindowState | undefined>(KEY);
  if (!state) throw new Error('[Loftpoint] windowState() was called outside the designer window; wrap the component in App.svelte.');
  return state;
}
