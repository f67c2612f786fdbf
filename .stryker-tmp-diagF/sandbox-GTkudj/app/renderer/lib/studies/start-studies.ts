/**
 * Starts the window's ranges studies: the state, with the chance study's
 * worker built into the page (an inline worker, so it loads the same way
 * from file:// in the desktop window and over http:// in browser mode), and
 * hands it to the panels through its context.
 */
// @ts-nocheck

import ProbabilityWorker from './probability.worker?worker&inline';
import type { ProjectState } from '../state/project.svelte';
import type { Workspace } from '../state/workspace.svelte';
import type { StudyWorker } from './probability.svelte';
import { provideWindowStudies } from './studies-context';
import { WindowStudies } from './window-studies.svelte';

export function startWindowStudies(workspace: Workspace, project: ProjectState): WindowStudies {
  const worker = () => new ProbabilityWorker({ name: 'loftpoint-chance-study' }) as unknown as StudyWorker;
  const studies = new WindowStudies(workspace, worker, () => project.conceptName);
  return provideWindowStudies(studies);
}
