// @ts-nocheck
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { projectArgument } from '../../app/main/arguments';

// Electron running the built main entry: [electron, out/main/index.js, ...arguments].
const dev = (...args: string[]) => ['/opt/electron/electron', '/opt/lp/out/main/index.js', ...args];
const ext = '.loftpoint';

describe('projectArgument', () => {
  it.each([
    [['--project=plans.loftpoint']],
    [['--project', 'plans.loftpoint']],
    [['plans.loftpoint']],
    // Chromium switches around it (a second instance's command line carries some).
    [['--no-sandbox', '--project', 'plans.loftpoint', '--enable-logging']],
    [['--allow-file-access-from-files', 'plans.loftpoint']],
  ])('finds the project in %j', (args) => {
    expect(projectArgument(dev(...args), 2, '/home/ada/work', ext)).toEqual({ file: resolve('/home/ada/work', 'plans.loftpoint') });
  });

  it('resolves against the launching folder, and keeps absolute names', () => {
    expect(projectArgument(['/opt/Loftpoint/loftpoint', '/data/a.loftpoint'], 1, '/tmp', ext)).toEqual({ file: '/data/a.loftpoint' });
    expect(projectArgument(['/opt/Loftpoint/loftpoint', 'sub/b.LOFTPOINT'], 1, '/srv', ext)).toEqual({ file: '/srv/sub/b.LOFTPOINT' });
  });

  it('names nothing when there is nothing', () => {
    expect(projectArgument(dev(), 2, '/tmp', ext)).toEqual({});
    expect(projectArgument(dev('--enable-logging'), 2, '/tmp', ext)).toEqual({});
  });

  it('says clearly why a file with another extension is not opened', () => {
    for (const args of [['notes.txt'], ['--project=notes.txt'], ['--project', 'concept.json']]) {
      const result = projectArgument(dev(...args), 2, '/tmp', ext);
      expect(result.file).toBeUndefined();
      expect(result.problem).toMatch(/^(notes\.txt|concept\.json): not a Loftpoint project \(project files end in \.loftpoint\)/);
    }
  });

  it('says --project needs a file when none follows', () => {
    expect(projectArgument(dev('--project'), 2, '/tmp', ext).problem).toMatch(/--project needs a file name/);
    expect(projectArgument(dev('--project='), 2, '/tmp', ext).problem).toMatch(/--project needs a file name/);
  });
});
