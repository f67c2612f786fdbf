// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { KNOT_MPS } from '../../../core/units/factors';
import { Workspace } from '../../../app/renderer/lib/state/workspace.svelte';
import { WindowStudies } from '../../../app/renderer/lib/studies/window-studies.svelte';
import type { StudyWorker } from '../../../app/renderer/lib/studies/probability.svelte';
import { StudyRunner } from '../../../app/renderer/lib/studies/probability-runner';
import type { StudyReply, StudyRequest } from '../../../app/renderer/lib/studies/probability-protocol';
import { setIn } from '../../../app/renderer/lib/concept/edit';
import { demoDocument, stallOnly } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const Q_STALL = 0.5 * RHO0 * (45 * KNOT_MPS) ** 2; // dynamic pressure at 45 kt EAS (1 kt = 1852/3600 m/s, NIST SP 811)

/** A stand-in for the worker: the same runner, answering on later turns of the event loop as a worker does. */
function fakeWorker(): StudyWorker & { terminated: boolean } {
  const worker = {
    onmessage: null as ((event: MessageEvent<StudyReply>) => void) | null,
    onerror: null as ((event: ErrorEvent) => void) | null,
    terminated: false,
    runner: null as StudyRunner | null,
    postMessage(message: StudyRequest) {
      setTimeout(() => worker.runner!.handle(structuredClone(message)), 0);
    },
    terminate() {
      worker.terminated = true;
    },
  };
  worker.runner = new StudyRunner({
    post: (reply) => setTimeout(() => worker.onmessage?.({ data: reply } as MessageEvent<StudyReply>), 0),
    defer: (next) => setTimeout(next, 0),
    now: () => performance.now(),
  }, 5);
  return worker;
}

async function settle(studies: WindowStudies): Promise<void> {
  for (let i = 0; i < 2000 && studies.probability.running; i++) await new Promise((resolve) => setTimeout(resolve, 1));
}

describe('WindowStudies', () => {
  it('draws the stall band between the limits of the CLmax range: w = q CLmax at each end', () => {
    const workspace = new Workspace(stallOnly(650, 1.6, 2.8));
    const studies = new WindowStudies(workspace, fakeWorker);
    expect(studies.bands).toBeNull();
    studies.showBands = true;
    const bands = studies.bands;
    if (!bands?.ok) throw new Error('bands expected');
    expect(bands.whose).toBe('concept');
    const stall = bands.bands.find((band) => band.id === 'stall');
    if (stall?.type !== 'limit') throw new Error('a limit band expected');
    // Stall limit W/S = 1/2 rho0 V^2 CLmax (stalling speed; Anderson, Introduction to Flight); at 45 kt
    // calibrated and equivalent airspeed differ by under one part in a million (compressibility).
    expect(stall.limits[0] / (Q_STALL * 1.6) - 1).toBeCloseTo(0, 6);
    expect(stall.limits[1] / (Q_STALL * 2.8) - 1).toBeCloseTo(0, 6);
  });

  it('runs the study through the worker, then marks the result out of date when the concept changes', async () => {
    const workspace = new Workspace(stallOnly(650, 1.6, 2.8, 2000));
    const studies = new WindowStudies(workspace, fakeWorker);
    expect(studies.blocked).toBeNull();
    studies.run('si');
    expect(studies.probability.running).toBe(true);
    await settle(studies);
    expect(studies.probability.phase).toBe('done');
    const result = studies.probability.result!;
    expect(result.map.samples).toBe(2000);
    expect(result.map.designPoint?.probability).toBeGreaterThan(0);
    expect(studies.stale).toBe(false);
    expect(studies.pointStale).toBe(false);

    // Moving the design point leaves the contours good but not the numbers at the point.
    workspace.movePoint({ wingLoadingPa: 700, loading: 200 });
    expect(studies.stale).toBe(false);
    expect(studies.pointStale).toBe(true);

    // Any other change of the concept makes the whole result out of date; undoing it makes it current again.
    workspace.edit(setIn(workspace.document, ['uncertainty', 'seed'], 9));
    expect(studies.stale).toBe(true);
    workspace.undo();
    workspace.undo();
    expect(studies.stale).toBe(false);
    expect(studies.pointStale).toBe(false);
  });

  it('cancels a long run and keeps the earlier result', async () => {
    const workspace = new Workspace(stallOnly(650, 1.6, 2.8, 1000));
    const studies = new WindowStudies(workspace, fakeWorker);
    studies.run('si');
    await settle(studies);
    const first = studies.probability.result;
    workspace.edit(setIn(workspace.document, ['uncertainty', 'samples'], 1_000_000));
    studies.run('si');
    await new Promise((resolve) => setTimeout(resolve, 30));
    studies.probability.cancel();
    await settle(studies);
    expect(studies.probability.phase).toBe('cancelled');
    expect(studies.probability.message).toMatch(/^Cancelled after [\d,]+ of 1,000,000 samples\.$/);
    expect(studies.probability.result).toBe(first);
    expect(studies.stale).toBe(true);
  });

  it('draws a result only on the concept it ran on', async () => {
    const workspace = new Workspace(stallOnly(650, 1.6, 2.8, 500));
    let concept = $state('first');
    const studies = new WindowStudies(workspace, fakeWorker, () => concept);
    studies.run('si');
    await settle(studies);
    expect(studies.result?.concept).toBe('first');
    concept = 'second';
    workspace.load(demoDocument('trainer'), false);
    expect(studies.result).toBeNull();
    expect(studies.stale).toBe(false);
  });

  it('will not run a concept with a problem, and says why', () => {
    const workspace = new Workspace(demoDocument('trainer'));
    const studies = new WindowStudies(workspace, fakeWorker);
    // The trainer ranges nothing of its own: the typical ranges stand in.
    expect(studies.parameters?.ok && studies.parameters.whose).toBe('typical');
    expect(studies.blocked).toBeNull();
    workspace.edit(setIn(workspace.document, ['aircraft', 'takeoffMass'], '-5 kg'));
    expect(studies.blocked).toBe('The concept has problems to fix first.');
    studies.run('si');
    expect(studies.probability.phase).toBe('idle');
  });

  it('reports a worker that cannot start instead of throwing', () => {
    const workspace = new Workspace(stallOnly(650));
    const studies = new WindowStudies(workspace, () => {
      throw new Error('workers are not allowed here');
    });
    studies.run('si');
    expect(studies.probability.phase).toBe('failed');
    expect(studies.probability.message).toBe('the study could not start: workers are not allowed here');
  });
});
