/**
 * IPC from the page: one handler per service method, plus export and
 * printing a report to PDF. Each
 * handler first drops messages from any page that is not our window's, then
 * checks the payload from `unknown` before anything touches the project.
 * Handlers are plain functions; registerIpc wires them to ipcMain.
 */
// @ts-nocheck

import type { IpcMainInvokeEvent } from 'electron';
import { SERVICE_METHODS, type ServiceResult } from '../service/contract';
import type { Dispatch } from '../shared/transport';
import { EXPORT_CHANNEL, failure, PRINT_CHANNEL, serviceChannel } from '../shared/transport';

/** The part of an IPC event the handlers look at. */
export interface IpcEventLike {
  sender: unknown;
  senderFrame?: { url: string } | null;
}

export type IpcHandler = (event: IpcEventLike, payload: unknown) => Promise<ServiceResult<unknown>>;

export interface IpcDeps {
  dispatch: Dispatch;
  /** Writes an export through a save dialog owned by the sender's window. */
  exportFile: (event: IpcEventLike, payload: unknown) => Promise<ServiceResult<unknown>>;
  /** Prints a report's HTML to PDF in a hidden window; answers with the bytes. */
  printPdf: (event: IpcEventLike, payload: unknown) => Promise<ServiceResult<unknown>>;
  /** True for messages from our own window showing our own page. */
  isTrustedSender: (event: IpcEventLike) => boolean;
}

const untrusted = () => failure('bad-request', 'refused: the message did not come from the Loftpoint window');

/** Every channel main answers on, with its handler. */
export function ipcHandlers(deps: IpcDeps): Map<string, IpcHandler> {
  const handlers = new Map<string, IpcHandler>();
  for (const method of SERVICE_METHODS) {
    handlers.set(serviceChannel(method), async (event, payload) => (deps.isTrustedSender(event) ? deps.dispatch(method, payload) : untrusted()));
  }
  handlers.set(EXPORT_CHANNEL, async (event, payload) => (deps.isTrustedSender(event) ? deps.exportFile(event, payload) : untrusted()));
  handlers.set(PRINT_CHANNEL, async (event, payload) => (deps.isTrustedSender(event) ? deps.printPdf(event, payload) : untrusted()));
  return handlers;
}

export interface IpcMainLike {
  handle(channel: string, listener: (event: IpcMainInvokeEvent, payload: unknown) => unknown): void;
  removeHandler(channel: string): void;
}

export function registerIpc(ipcMain: IpcMainLike, handlers: Map<string, IpcHandler>): () => void {
  for (const [channel, handler] of handlers) ipcMain.handle(channel, (event, payload) => handler(event, payload));
  return () => {
    for (const channel of handlers.keys()) ipcMain.removeHandler(channel);
  };
}

/** A sender is trusted when it is one of our windows and its frame shows our page. */
export function senderCheck(isOurWindow: (sender: unknown) => boolean, isOwnPage: (url: string) => boolean): (event: IpcEventLike) => boolean {
  return (event) => isOurWindow(event.sender) && !!event.senderFrame && isOwnPage(event.senderFrame.url);
}
