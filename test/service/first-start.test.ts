import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createService, invokeService } from '../../app/service';
import { newProjectName, openOrCreateProject, projectTarget } from '../../app/service/first-start';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-first-start-'));

describe('first start', () => {
  it('names a new project after its file, or the demo project when none is named', () => {
    expect(newProjectName(join(folder, 'Plans.loftpoint'), projectTarget(join(folder, 'Plans.loftpoint'), folder))).toBe('Plans');
    expect(newProjectName(undefined, projectTarget(undefined, folder))).toBe('Demo project');
    expect(projectTarget(undefined, folder)).toBe(join(folder, 'Demo project.loftpoint'));
  });

  it('counts a project made elsewhere after the launch found no file as new, and an existing one as not', { timeout: 60_000 }, async () => {
    const file = join(folder, 'Made meanwhile.loftpoint');
    // Made elsewhere (as browser mode's worker does) before this front end opens it.
    const maker = createService();
    expect((await invokeService(maker, 'createProject', { file, name: 'Made meanwhile', demo: true })).ok).toBe(true);
    await invokeService(maker, 'closeProject', {});
    const service = createService();
    const opened = await openOrCreateProject(service, file, folder, { existed: false, makeElsewhere: async () => true });
    await invokeService(service, 'closeProject', {});
    expect(opened.ok && opened.value.created).toBe(true);
    // Without the launch's own finding, a file that is there opens as an existing project.
    const again = createService();
    const reopened = await openOrCreateProject(again, file, folder);
    await invokeService(again, 'closeProject', {});
    expect(reopened.ok && reopened.value.created).toBe(false);
  });
});
