/**
 * The native menus with the usual shortcuts. The template is built from
 * plain actions, so it can be tested without Electron; main turns it into
 * a Menu.
 */
// @ts-nocheck

import type { MenuItemConstructorOptions } from 'electron';
import { basename } from 'node:path';
import type { WindowCommand } from '../shared/desktop-api';

export interface MenuActions {
  newProject(): void;
  openProject(): void;
  openRecent(file: string): void;
  clearRecent(): void;
  /** Passes a command to the page. */
  send(command: WindowCommand): void;
  about(): void;
}

export interface MenuState {
  platform: NodeJS.Platform;
  recent: readonly string[];
  units: 'si' | 'us' | 'kt-ft';
  /** Offer developer tools (unpackaged builds only). */
  developer: boolean;
}

export function menuTemplate(actions: MenuActions, state: MenuState): MenuItemConstructorOptions[] {
  const mac = state.platform === 'darwin';
  const recent: MenuItemConstructorOptions[] =
    state.recent.length > 0
      ? [
          ...state.recent.map((file) => ({ label: basename(file), sublabel: file, click: () => actions.openRecent(file) })),
          { type: 'separator' as const },
          { label: 'Clear Recent', click: () => actions.clearRecent() },
        ]
      : [{ label: 'No recent projects', enabled: false }];
  const template: MenuItemConstructorOptions[] = [
    {
      label: 'File',
      submenu: [
        { label: 'New Project…', accelerator: 'CmdOrCtrl+N', click: () => actions.newProject() },
        { label: 'Open Project…', accelerator: 'CmdOrCtrl+O', click: () => actions.openProject() },
        { label: 'Open Recent', submenu: recent },
        { type: 'separator' },
        { label: 'Save Version…', accelerator: 'CmdOrCtrl+S', click: () => actions.send('save-version') },
        { type: 'separator' },
        { label: 'Export Design-Review Report (PDF)…', accelerator: 'CmdOrCtrl+P', click: () => actions.send('export-report-pdf') },
        { label: 'Export Design-Review Report (HTML)…', click: () => actions.send('export-report-html') },
        { label: 'Export Diagram (SVG)…', accelerator: 'CmdOrCtrl+E', click: () => actions.send('export-diagram') },
        { label: 'Export Diagram (PNG)…', click: () => actions.send('export-diagram-png') },
        { label: 'Export Boundaries (CSV)…', click: () => actions.send('export-boundaries') },
        { label: 'Export Concept (JSON)…', accelerator: 'CmdOrCtrl+Shift+E', click: () => actions.send('export-concept') },
        { type: 'separator' },
        mac ? { role: 'close' } : { role: 'quit' },
      ],
    },
    {
      label: 'Edit',
      submenu: [
        { label: 'Undo', accelerator: 'CmdOrCtrl+Z', click: () => actions.send('undo') },
        { label: 'Redo', accelerator: mac ? 'Cmd+Shift+Z' : 'Ctrl+Y', click: () => actions.send('redo') },
        { type: 'separator' },
        { role: 'cut' },
        { role: 'copy' },
        { role: 'paste' },
        { role: 'selectAll' },
      ],
    },
    {
      label: 'View',
      submenu: [
        { label: 'SI Units', type: 'radio', checked: state.units === 'si', click: () => actions.send('units-si') },
        { label: 'US Customary Units', type: 'radio', checked: state.units === 'us', click: () => actions.send('units-us') },
        { label: 'Knots and Feet', type: 'radio', checked: state.units === 'kt-ft', click: () => actions.send('units-kt-ft') },
        { type: 'separator' },
        { label: 'Reset Diagram View', accelerator: 'CmdOrCtrl+0', click: () => actions.send('reset-view') },
        { label: 'History', accelerator: 'CmdOrCtrl+H', click: () => actions.send('show-history') },
        { type: 'separator' },
        { role: 'zoomIn' },
        { role: 'zoomOut' },
        { role: 'resetZoom', accelerator: 'CmdOrCtrl+Shift+0' },
        { role: 'togglefullscreen' },
        ...(state.developer ? [{ type: 'separator' as const }, { role: 'toggleDevTools' as const }] : []),
      ],
    },
    {
      role: 'help',
      submenu: [{ label: 'About Loftpoint', click: () => actions.about() }],
    },
  ];
  if (mac) template.unshift({ role: 'appMenu' });
  return template;
}
