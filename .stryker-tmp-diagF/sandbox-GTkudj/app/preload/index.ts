/**
 * The bridge: the page gets `window.api` with one function per service
 * method, menu commands, export through a save dialog, and printing a report
 * to PDF, and a way to tell the shell its units and unsaved state. Nothing else of
 * Electron or Node reaches the page. Types come from the shared contract.
 */
// @ts-nocheck

import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import { SERVICE_METHODS } from '../service/contract';
import { isWindowCommand, isWindowStateReport, type DesktopApi, type WindowStateReport, type ExportFileRequest, type PrintPdfRequest, type WindowCommand } from '../shared/desktop-api';
import { COMMAND_CHANNEL, EXPORT_CHANNEL, PRINT_CHANNEL, serviceChannel, WINDOW_STATE_CHANNEL } from '../shared/transport';

export function desktopApi(renderer: Pick<typeof ipcRenderer, 'invoke' | 'on' | 'off' | 'send'>): DesktopApi {
  const methods = Object.fromEntries(SERVICE_METHODS.map((method) => [method, (request: unknown) => renderer.invoke(serviceChannel(method), request)]));
  return {
    ...(methods as Omit<DesktopApi, 'onCommand' | 'exportFile' | 'printPdf' | 'reportWindowState'>),
    onCommand(listener: (command: WindowCommand) => void) {
      const handler = (_event: IpcRendererEvent, command: unknown) => {
        if (isWindowCommand(command)) listener(command);
      };
      renderer.on(COMMAND_CHANNEL, handler);
      return () => void renderer.off(COMMAND_CHANNEL, handler);
    },
    exportFile: (request: ExportFileRequest) => renderer.invoke(EXPORT_CHANNEL, request),
    printPdf: (request: PrintPdfRequest) => renderer.invoke(PRINT_CHANNEL, request),
    reportWindowState: (state: WindowStateReport) => {
      if (isWindowStateReport(state)) renderer.send(WINDOW_STATE_CHANNEL, { units: state.units, dirty: state.dirty });
    },
  };
}

contextBridge.exposeInMainWorld('api', desktopApi(ipcRenderer));
