// @ts-nocheck
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { projectShell, type ProjectShellDeps } from '../../app/main/projects';
import { createService, invokeService } from '../../app/service';
import { DEMO_CONCEPTS } from '../../core';

vi.mock('electron', () => ({}));

function setup(overrides: Partial<ProjectShellDeps> = {}) {
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-shell-'));
  const service = createService({ author: 'test' });
  const notify = vi.fn();
  const showError = vi.fn();
  const recentChanged = vi.fn();
  const shell = projectShell({
    service,
    dataFolder: join(folder, 'data'),
    recentFile: join(folder, 'data', 'recent.json'),
    askOpenPath: async () => null,
    askNewPath: async () => null,
    notify,
    showError,
    recentChanged,
    ...overrides,
  });
  return { folder, service, shell, notify, showError, recentChanged };
}

describe('projectShell', () => {
  it('on first start creates the demo project in the data folder and remembers it', async () => {
    const { folder, service, shell } = setup();
    const info = await shell.openInitial(undefined);
    expect(info?.file).toBe(join(folder, 'data', 'Demo project.loftpoint'));
    const concepts = await invokeService(service, 'listConcepts', {});
    expect(concepts.ok && concepts.value.length).toBe(DEMO_CONCEPTS.length);
    expect(shell.recent()).toEqual([info?.file]);
    await invokeService(service, 'closeProject', {});
  });

  it('creates a new project from the dialog and tells the page to reload', async () => {
    const target = join(mkdtempSync(join(tmpdir(), 'loftpoint-new-')), 'Wing study.loftpoint');
    const { service, shell, notify, recentChanged } = setup({ askNewPath: async () => target });
    expect(await shell.newWithDialog()).toBe(true);
    expect(existsSync(target)).toBe(true);
    const info = await invokeService(service, 'getProject', {});
    expect(info.ok && info.value.name).toBe('Wing study');
    expect(notify).toHaveBeenCalledWith('project-changed');
    expect(recentChanged).toHaveBeenCalledWith([target]);
    await invokeService(service, 'closeProject', {});
  });

  it('shows an error and keeps the open project when a chosen file is not a project', async () => {
    const { folder, service, shell, notify, showError } = setup();
    await shell.openInitial(undefined);
    const bogus = join(folder, 'bogus.loftpoint');
    writeFileSync(bogus, 'not a database');
    expect(await shell.openFile(bogus)).toBe(false);
    expect(showError).toHaveBeenCalledWith('The project could not be opened', expect.stringContaining('bogus.loftpoint'));
    expect(notify).not.toHaveBeenCalled();
    const info = await invokeService(service, 'getProject', {});
    expect(info.ok && info.value.file).toBe(join(folder, 'data', 'Demo project.loftpoint'));
    await invokeService(service, 'closeProject', {});
  });

  it('does nothing when a dialog is cancelled; clearing empties the recent list', async () => {
    const { shell, notify, recentChanged } = setup();
    expect(await shell.openWithDialog()).toBe(false);
    expect(await shell.newWithDialog()).toBe(false);
    expect(notify).not.toHaveBeenCalled();
    shell.clearRecent();
    expect(recentChanged).toHaveBeenLastCalledWith([]);
    expect(shell.recent()).toEqual([]);
  });
});
