import { describe, expect, it } from 'vitest';
import { LaterPanels } from '../../app/renderer/lib/panels/later-panels.svelte';

describe('the panels loaded after the first diagram', () => {
  it('loads a panel when asked, once, and every other one with loadAll', async () => {
    const panels = new LaterPanels();
    expect(panels.loaded.history).toBeUndefined();
    const first = panels.load('history');
    expect(panels.load('history')).toBe(first);
    await first;
    expect(typeof panels.loaded.history).toBe('function');
    expect(panels.loaded.ranges).toBeUndefined();
    await panels.loadAll();
    for (const name of ['assumptions', 'mission', 'ranges', 'drivers', 'tornado', 'costs', 'history'] as const) {
      expect(typeof panels.loaded[name], name).toBe('function');
    }
  });
});
