// @ts-nocheck
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { RECENT_LIMIT, readRecent, withRecent, writeRecent } from '../../app/main/recent';

vi.mock('electron', () => ({}));

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-recent-'));

describe('recent projects', () => {
  it('puts the newest first, without repeats, and keeps at most the limit', () => {
    let list: string[] = [];
    for (let i = 0; i < RECENT_LIMIT + 3; i += 1) list = withRecent(list, `/p/${i}.loftpoint`);
    list = withRecent(list, '/p/5.loftpoint');
    expect(list[0]).toBe('/p/5.loftpoint');
    expect(list.length).toBe(RECENT_LIMIT);
    expect(new Set(list).size).toBe(list.length);
  });

  it('reads back what it wrote, leaving out files that are gone', () => {
    const file = join(folder, 'nested', 'recent.json');
    writeRecent(file, ['/p/a.loftpoint', '/p/gone.loftpoint']);
    expect(readRecent(file, (path) => path !== '/p/gone.loftpoint')).toEqual(['/p/a.loftpoint']);
  });

  it('treats a missing or damaged list as empty', () => {
    expect(readRecent(join(folder, 'none.json'))).toEqual([]);
    const damaged = join(folder, 'damaged.json');
    writeFileSync(damaged, '{"not": "a list"');
    expect(readRecent(damaged)).toEqual([]);
    writeFileSync(damaged, '[1, null, "", "/p/x.loftpoint"]');
    expect(readRecent(damaged, () => true)).toEqual(['/p/x.loftpoint']);
  });
});
