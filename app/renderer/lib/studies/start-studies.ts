/**
 * Starts the window's ranges studies: the state, with the chance study's
 * worker (an inline worker, so it loads the same way from the desktop
 * window's own protocol and over http:// in browser mode), and hands it to
 * the panels through its context. The worker's script is a chunk of its own,
 * fetched when the Ranges panel first opens (which starts the worker and its
 * helper threads ahead of a run) or a study first runs: the first diagram does
 * not wait for it.
 */
import type { ProjectState } from '../state/project.svelte';
import type { Workspace } from '../state/workspace.svelte';
import { lazyWorker, type StartWorker } from './lazy-worker';
import { provideWindowStudies } from './studies-context';
import { WindowStudies } from './window-studies.svelte';

async function loadProbabilityWorker(): Promise<StartWorker> {
  const { default: ProbabilityWorker } = await import('./probability.worker?worker&inline');
  return () => new ProbabilityWorker({ name: 'loftpoint-chance-study' }) as unknown as ReturnType<StartWorker>;
}

export function startWindowStudies(workspace: Workspace, project: ProjectState): WindowStudies {
  const worker = () => lazyWorker(loadProbabilityWorker);
  const studies = new WindowStudies(workspace, worker, () => project.conceptName);
  return provideWindowStudies(studies);
}
