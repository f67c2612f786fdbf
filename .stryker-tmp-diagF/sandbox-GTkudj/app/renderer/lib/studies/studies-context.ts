/**
 * The window's ranges studies, handed to the Ranges panel, the diagram's
 * study layers and the design-point panel through a context of their own.
 */
// @ts-nocheck

import { getContext, setContext } from 'svelte';
import type { WindowStudies } from './window-studies.svelte';

const KEY = Symbol('loftpoint.studies');

export function provideWindowStudies(studies: WindowStudies): WindowStudies {
  return setContext(KEY, studies);
}

/** The studies, or null outside a window that provides them (a panel shown on its own). */
export function windowStudies(): WindowStudies | null {
  return getContext<WindowStudies | undefined>(KEY) ?? null;
}
