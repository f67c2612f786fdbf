// @ts-nocheck
import type { MenuItemConstructorOptions } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import { menuTemplate, type MenuActions } from '../../app/main/menu';

vi.mock('electron', () => ({}));

function actions(): MenuActions & { sent: string[] } {
  const sent: string[] = [];
  return {
    sent,
    newProject: vi.fn(),
    openProject: vi.fn(),
    openRecent: vi.fn(),
    clearRecent: vi.fn(),
    send: (command) => void sent.push(command),
    about: vi.fn(),
  };
}

function items(template: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return template.flatMap((item) => [item, ...(Array.isArray(item.submenu) ? items(item.submenu) : [])]);
}

function byLabel(template: MenuItemConstructorOptions[], label: string): MenuItemConstructorOptions {
  const found = items(template).find((item) => item.label === label);
  if (!found) throw new Error(`no menu item "${label}"`);
  return found;
}

const click = (item: MenuItemConstructorOptions) => (item.click as () => void)();

describe('menuTemplate', () => {
  const state = { platform: 'linux' as const, recent: ['/p/a.loftpoint', '/p/b.loftpoint'], units: 'si' as const, developer: false };

  // The usual desktop shortcuts (common practice across desktop applications).
  it.each([
    ['New Project…', 'CmdOrCtrl+N'],
    ['Open Project…', 'CmdOrCtrl+O'],
    ['Save Version…', 'CmdOrCtrl+S'],
    ['Undo', 'CmdOrCtrl+Z'],
    ['Redo', 'Ctrl+Y'],
    ['Export Diagram (SVG)…', 'CmdOrCtrl+E'],
    ['Export Design-Review Report (PDF)…', 'CmdOrCtrl+P'],
  ])('%s has the shortcut %s', (label, accelerator) => {
    expect(byLabel(menuTemplate(actions(), state), label).accelerator).toBe(accelerator);
  });

  it('passes page commands to the page and shell actions to the shell', () => {
    const a = actions();
    const template = menuTemplate(a, state);
    for (const label of ['Save Version…', 'Undo', 'Redo', 'Export Diagram (SVG)…', 'Export Concept (JSON)…', 'US Customary Units', 'Reset Diagram View', 'History']) click(byLabel(template, label));
    expect(a.sent).toEqual(['save-version', 'undo', 'redo', 'export-diagram', 'export-concept', 'units-us', 'reset-view', 'show-history']);
    a.sent.length = 0;
    for (const label of ['Export Design-Review Report (PDF)…', 'Export Design-Review Report (HTML)…', 'Export Diagram (PNG)…', 'Export Boundaries (CSV)…']) click(byLabel(template, label));
    expect(a.sent).toEqual(['export-report-pdf', 'export-report-html', 'export-diagram-png', 'export-boundaries']);
    click(byLabel(template, 'New Project…'));
    click(byLabel(template, 'Open Project…'));
    click(byLabel(template, 'b.loftpoint'));
    expect(a.newProject).toHaveBeenCalled();
    expect(a.openProject).toHaveBeenCalled();
    expect(a.openRecent).toHaveBeenCalledWith('/p/b.loftpoint');
  });

  it('shows an empty recent list as such, and developer tools only in development', () => {
    const template = menuTemplate(actions(), { ...state, recent: [] });
    expect(byLabel(template, 'No recent projects').enabled).toBe(false);
    expect(items(template).some((item) => item.role === 'toggleDevTools')).toBe(false);
    expect(items(menuTemplate(actions(), { ...state, developer: true })).some((item) => item.role === 'toggleDevTools')).toBe(true);
  });

  it('uses the application menu and Cmd+Shift+Z for redo on macOS', () => {
    const template = menuTemplate(actions(), { ...state, platform: 'darwin' });
    expect(template[0].role).toBe('appMenu');
    expect(byLabel(template, 'Redo').accelerator).toBe('Cmd+Shift+Z');
  });
});
