// @ts-nocheck
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readPlacement, writePlacement } from '../../app/main/window-state';
import { windowTitle } from '../../app/main/title';

const screens = [{ x: 0, y: 0, width: 1920, height: 1040 }];

describe('window placement', () => {
  it('gives back on the next start what the last one kept', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'loftpoint-place-')), 'sub', 'window-state.json');
    writePlacement(file, { bounds: { x: 100, y: 80, width: 1200, height: 800 }, maximized: true });
    expect(readPlacement(file, screens)).toEqual({ bounds: { x: 100, y: 80, width: 1200, height: 800 }, maximized: true });
  });

  it('falls back to the default for a missing or damaged file, or a place on a screen no longer attached', () => {
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-place-'));
    expect(readPlacement(join(folder, 'none.json'), screens)).toBeNull();
    writeFileSync(join(folder, 'bad.json'), '{"bounds": {"x": "left"}');
    expect(readPlacement(join(folder, 'bad.json'), screens)).toBeNull();
    writePlacement(join(folder, 'away.json'), { bounds: { x: 2600, y: 100, width: 1200, height: 800 }, maximized: false });
    expect(readPlacement(join(folder, 'away.json'), screens)).toBeNull();
    expect(JSON.parse(readFileSync(join(folder, 'away.json'), 'utf8')).bounds.x).toBe(2600);
  });

  it('never restores a window smaller than the window allows', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'loftpoint-place-')), 'w.json');
    writePlacement(file, { bounds: { x: 10, y: 10, width: 300, height: 200 }, maximized: false });
    expect(readPlacement(file, screens)?.bounds).toEqual({ x: 10, y: 10, width: 1000, height: 620 });
  });
});

describe('windowTitle', () => {
  it('shows the project and an unsaved mark', () => {
    expect(windowTitle('/home/ada/Trainer study.loftpoint', false)).toBe('Trainer study — Loftpoint');
    expect(windowTitle('/home/ada/Trainer study.loftpoint', true)).toBe('• Trainer study — Loftpoint');
    expect(windowTitle(null, true)).toBe('Loftpoint');
  });
});
