/**
 * After File > New Project the History panel lists the new project's
 * versions, none of the old one's: a real service on two real project files.
 */
// @ts-nocheck

import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import type { Connection } from '../../app/renderer/lib/api/client';
import { ProjectState } from '../../app/renderer/lib/state/project.svelte';
import { Workspace } from '../../app/renderer/lib/state/workspace.svelte';
import { invokeService, ProjectService } from '../../app/service';
import { SERVICE_METHODS, type RemoteService } from '../../app/service/contract';
import { freshFolder } from '../store/helpers';

const services: ProjectService[] = [];
afterEach(() => {
  for (const service of services.splice(0)) service.closeProject({});
});

function memoryStorage(): Storage {
  const map = new Map<string, string>();
  return {
    get length() {
      return map.size;
    },
    clear: () => map.clear(),
    getItem: (key) => map.get(key) ?? null,
    key: (index) => [...map.keys()][index] ?? null,
    removeItem: (key) => void map.delete(key),
    setItem: (key, value) => void map.set(key, value),
  };
}

describe('ProjectState.reload after the shell opened another project', () => {
  it('forgets the previous project’s versions when the new project has none', async () => {
    globalThis.localStorage ??= memoryStorage();
    const folder = freshFolder();
    const service = new ProjectService({ author: 'tester' });
    services.push(service);
    service.createProject({ file: join(folder, 'first.loftpoint'), name: 'First', demo: true });
    const remote = Object.fromEntries(SERVICE_METHODS.map((method) => [method, (request: never) => invokeService(service, method, request)])) as unknown as RemoteService;
    const connection: Connection = { mode: 'desktop', service: remote, onCommand: () => () => {}, exportFile: async () => null, printPdf: async () => new Uint8Array() };
    const state = new ProjectState(connection, new Workspace({}));
    await state.start();
    expect(state.versions.length).toBeGreaterThan(0);

    // What File > New Project does in the shell: a new, empty project file, then "project-changed".
    service.createProject({ file: join(folder, 'second.loftpoint'), name: 'Second' });
    await state.reload();
    expect(state.project?.name).toBe('Second');
    expect(state.concepts).toEqual([]);
    expect(state.versions).toEqual([]);
    expect(state.parent).toBeNull();
  });
});
