// @ts-nocheck
import { describe, expect, it, vi } from 'vitest';
import { ipcHandlers, registerIpc, senderCheck, type IpcEventLike } from '../../app/main/ipc';
import { SERVICE_METHODS } from '../../app/service/contract';
import { EXPORT_CHANNEL, PRINT_CHANNEL, serviceChannel } from '../../app/shared/transport';

vi.mock('electron', () => ({}));

const ourContents = { id: 1 };
const page = 'file:///opt/loftpoint/out/renderer/index.html';
const trusted = senderCheck(
  (sender) => sender === ourContents,
  (url) => url === page,
);
const fromUs: IpcEventLike = { sender: ourContents, senderFrame: { url: page } };

function handlers() {
  const dispatch = vi.fn(async (method: string, payload: unknown) => ({ ok: true as const, value: { method, payload } }));
  const exportFile = vi.fn(async () => ({ ok: true as const, value: null }));
  const printPdf = vi.fn(async () => ({ ok: true as const, value: new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d]) }));
  return { dispatch, exportFile, printPdf, map: ipcHandlers({ dispatch, exportFile, printPdf, isTrustedSender: trusted }) };
}

describe('ipcHandlers', () => {
  it('answers on one channel per service method, one for export and one for printing', () => {
    const { map } = handlers();
    expect([...map.keys()].sort()).toEqual([...SERVICE_METHODS.map((method) => serviceChannel(method)), EXPORT_CHANNEL, PRINT_CHANNEL].sort());
  });

  it('passes a print request from our window to the printer, with its sender', async () => {
    const { map, printPdf } = handlers();
    const result = await map.get(PRINT_CHANNEL)!(fromUs, { html: '<!DOCTYPE html>' });
    expect(printPdf).toHaveBeenCalledWith(fromUs, { html: '<!DOCTYPE html>' });
    expect(result.ok).toBe(true);
  });

  it('passes a message from our window to the service by method name', async () => {
    const { map, dispatch } = handlers();
    const result = await map.get(serviceChannel('getVersion'))!(fromUs, { version: 2 });
    expect(dispatch).toHaveBeenCalledWith('getVersion', { version: 2 });
    expect(result).toEqual({ ok: true, value: { method: 'getVersion', payload: { version: 2 } } });
  });

  it.each([
    ['another web contents', { sender: { id: 2 }, senderFrame: { url: page } }],
    ['our window showing another page', { sender: ourContents, senderFrame: { url: 'https://evil.example/' } }],
    ['a frame that is gone', { sender: ourContents, senderFrame: null }],
  ])('drops messages from %s before they reach the service', async (_title, event) => {
    const { map, dispatch, exportFile, printPdf } = handlers();
    for (const handler of map.values()) {
      const result = await handler(event as IpcEventLike, {});
      expect(result.ok).toBe(false);
    }
    expect(dispatch).not.toHaveBeenCalled();
    expect(exportFile).not.toHaveBeenCalled();
    expect(printPdf).not.toHaveBeenCalled();
  });
});

describe('registerIpc', () => {
  it('registers every handler and removes them again', async () => {
    const registered = new Map<string, (event: never, payload: unknown) => unknown>();
    const ipcMain = {
      handle: vi.fn((channel: string, listener: (event: never, payload: unknown) => unknown) => void registered.set(channel, listener)),
      removeHandler: vi.fn((channel: string) => void registered.delete(channel)),
    };
    const { map, dispatch } = handlers();
    const remove = registerIpc(ipcMain, map);
    expect(registered.size).toBe(map.size);
    await registered.get(serviceChannel('listConcepts'))!(fromUs as never, {});
    expect(dispatch).toHaveBeenCalledWith('listConcepts', {});
    remove();
    expect(registered.size).toBe(0);
  });
});
