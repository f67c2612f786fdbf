// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { History } from '../../app/renderer/lib/state/history.svelte';

describe('History', () => {
  it('undoes and redoes in order, and a new step clears the redo line', () => {
    const history = new History('a');
    history.push('b');
    history.push('c');
    expect(history.current).toBe('c');
    expect(history.undo()).toBe(true);
    expect(history.undo()).toBe(true);
    expect(history.current).toBe('a');
    expect(history.canUndo).toBe(false);
    expect(history.undo()).toBe(false);
    expect(history.redo()).toBe(true);
    expect(history.current).toBe('b');
    history.push('x');
    expect(history.canRedo).toBe(false);
    expect(history.redo()).toBe(false);
  });

  it('merges quick pushes with the same key into one step', () => {
    let now = 0;
    const history = new History('', { now: () => now, coalesceMs: 1000 });
    for (const text of ['1', '15', '150', '1500']) {
      now += 100;
      history.push(text, 'speed');
    }
    now += 5000;
    history.push('1600', 'speed');
    history.undo();
    expect(history.current).toBe('1500');
    history.undo();
    expect(history.current).toBe('');
  });

  it('keeps at most the limit of steps, and reset forgets them', () => {
    const history = new History(0, { limit: 3 });
    for (let i = 1; i <= 10; i += 1) history.push(i);
    let undone = 0;
    while (history.undo()) undone += 1;
    expect(undone).toBe(3);
    history.reset(42);
    expect(history.current).toBe(42);
    expect(history.canUndo).toBe(false);
  });
});
