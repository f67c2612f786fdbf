/**
 * @vitest-environment node
 */
// @ts-nocheck

import { describe, expect, it, vi } from 'vitest';
import { SERVICE_METHODS } from '../../app/service/contract';
import { COMMAND_CHANNEL, EXPORT_CHANNEL, PRINT_CHANNEL, serviceChannel, WINDOW_STATE_CHANNEL } from '../../app/shared/transport';

const exposed: Record<string, unknown> = {};
vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: (key: string, value: unknown) => void (exposed[key] = value) },
  ipcRenderer: { invoke: vi.fn(), on: vi.fn(), off: vi.fn() },
}));

const { desktopApi } = await import('../../app/preload/index');

function fakeRenderer() {
  const listeners = new Map<string, (event: unknown, value: unknown) => void>();
  return {
    listeners,
    invoke: vi.fn(async (channel: string, payload: unknown) => ({ channel, payload })),
    send: vi.fn(),
    on: vi.fn((channel: string, listener: (event: unknown, value: unknown) => void) => void listeners.set(channel, listener)),
    off: vi.fn((channel: string) => void listeners.delete(channel)),
  };
}

describe('preload', () => {
  it('exposes exactly the service methods, menu commands, export and printing as window.api', () => {
    expect(Object.keys(exposed)).toEqual(['api']);
    expect(Object.keys(exposed.api as object).sort()).toEqual([...SERVICE_METHODS, 'exportFile', 'onCommand', 'printPdf', 'reportWindowState'].sort());
  });

  it('sends each method on its own channel with the request as given', async () => {
    const renderer = fakeRenderer();
    const api = desktopApi(renderer as never);
    expect(await api.getVersion({ version: 4 })).toEqual({ channel: serviceChannel('getVersion'), payload: { version: 4 } });
    await api.exportFile({ kind: 'svg', suggestedName: 'a.svg', content: '<svg/>' });
    expect(renderer.invoke).toHaveBeenLastCalledWith(EXPORT_CHANNEL, { kind: 'svg', suggestedName: 'a.svg', content: '<svg/>' });
    await api.printPdf({ html: '<!DOCTYPE html>' });
    expect(renderer.invoke).toHaveBeenLastCalledWith(PRINT_CHANNEL, { html: '<!DOCTYPE html>' });
  });

  it('passes on known menu commands only, and stops listening when asked', () => {
    const renderer = fakeRenderer();
    const api = desktopApi(renderer as never);
    const heard: string[] = [];
    const stop = api.onCommand((command) => heard.push(command));
    const emit = renderer.listeners.get(COMMAND_CHANNEL)!;
    emit({}, 'undo');
    emit({}, 'rm -rf');
    emit({}, { command: 'undo' });
    emit({}, 'project-changed');
    expect(heard).toEqual(['undo', 'project-changed']);
    stop();
    expect(renderer.listeners.has(COMMAND_CHANNEL)).toBe(false);
  });

  it('tells main the page’s units and unsaved state, and nothing else', () => {
    const renderer = fakeRenderer();
    const api = desktopApi(renderer as never);
    api.reportWindowState({ units: 'us', dirty: true });
    api.reportWindowState({ units: 'metric', dirty: true } as never);
    api.reportWindowState({ units: 'si', dirty: false, extra: 'x' } as never);
    expect(renderer.send.mock.calls).toEqual([[WINDOW_STATE_CHANNEL, { units: 'us', dirty: true }]]);
  });
});
