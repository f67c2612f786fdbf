// @ts-nocheck
// @vitest-environment jsdom
/**
 * Browser mode after a restart: the page is served from a new port, a new
 * origin whose storage is empty (HTML Living Standard, "Origin"), yet the
 * unsaved draft of the project is offered again, because the page sends its
 * drafts to the server, which keeps them per project file.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { Connection, DraftMirror } from '../../app/renderer/lib/api/client';
import { setIn } from '../../app/renderer/lib/concept/edit';
import { ProjectState } from '../../app/renderer/lib/state/project.svelte';
import { Workspace } from '../../app/renderer/lib/state/workspace.svelte';
import { invokeService, ProjectService } from '../../app/service';
import { SERVICE_METHODS, type RemoteService } from '../../app/service/contract';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-kept-'));
const file = join(folder, 'study.loftpoint');
const service = new ProjectService({ author: 'tester' });
service.createProject({ file, name: 'Kept drafts', demo: true });
afterAll(() => {
  service.closeProject({});
  rmSync(folder, { recursive: true, force: true });
});
const remote = Object.fromEntries(SERVICE_METHODS.map((method) => [method, (request: never) => invokeService(service, method, request)])) as unknown as RemoteService;

/** What the server keeps for this project file between starts. */
let kept: Record<string, unknown> = {};
const mirror: DraftMirror = {
  load: async () => structuredClone(kept),
  save: async (drafts) => {
    kept = structuredClone(drafts);
  },
};

function page(): { project: ProjectState; workspace: Workspace } {
  const connection: Connection = { mode: 'browser', service: remote, onCommand: () => () => {}, exportFile: async () => null, printPdf: async () => new Uint8Array(), drafts: mirror };
  const workspace = new Workspace({});
  return { project: new ProjectState(connection, workspace), workspace };
}

describe('an unsaved draft in browser mode', () => {
  it('is offered again after a restart on a new origin with empty storage', async () => {
    const first = page();
    await first.project.start();
    const name = first.project.conceptName!;
    first.workspace.edit(setIn(first.workspace.document, ['aircraft', 'takeoffMass'], '777 kg'));
    expect(first.project.dirty).toBe(true);
    first.project.storeDraft();
    await Promise.resolve();
    expect(Object.keys(kept)).toContain(name);

    localStorage.clear();
    const second = page();
    await second.project.start();
    expect(second.project.conceptName).toBe(name);
    expect((second.workspace.document.aircraft as { takeoffMass?: string }).takeoffMass).toBe('777 kg');
    expect(second.project.status?.text).toMatch(/Unsaved changes from last time were restored/);
  });
});
