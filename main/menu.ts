import type { MenuItemConstructorOptions } from 'electron';
import { basename } from 'node:path';
import type { MenuCommand } from '../app/bridge/contract';

export interface MenuEvent {
  readonly command: MenuCommand;
  readonly path?: string;
}

export interface MenuInput {
  readonly platform: string;
  readonly recent: readonly string[];
  /** DevTools and reload only in development builds. */
  readonly development: boolean;
  readonly send: (event: MenuEvent) => void;
  readonly clearRecent: () => void;
  readonly quit: () => void;
}

/** The native menu. Items that change the document send a MenuCommand to the renderer. */
export function menuTemplate(input: MenuInput): MenuItemConstructorOptions[] {
  const mac = input.platform === 'darwin';
  const cmd = (label: string, command: MenuCommand, accelerator?: string): MenuItemConstructorOptions => ({
    label,
    ...(accelerator ? { accelerator } : {}),
    click: () => input.send({ command }),
  });
  const recent: MenuItemConstructorOptions[] = input.recent.length
    ? [
        ...input.recent.map((path): MenuItemConstructorOptions => ({ label: basename(path), toolTip: path, click: () => input.send({ command: 'open', path }) })),
        { type: 'separator' },
        { label: 'Clear recent', click: input.clearRecent },
      ]
    : [{ label: 'No recent reviews', enabled: false }];

  const file: MenuItemConstructorOptions = {
    label: '&File',
    submenu: [
      cmd('New review…', 'new', 'CmdOrCtrl+N'),
      cmd('Open…', 'open', 'CmdOrCtrl+O'),
      { label: 'Open recent', submenu: recent },
      { type: 'separator' },
      cmd('Save', 'save', 'CmdOrCtrl+S'),
      cmd('Save as…', 'save-as', 'CmdOrCtrl+Shift+S'),
      { type: 'separator' },
      cmd('Sign off…', 'sign'),
      cmd('Compare with…', 'compare'),
      cmd('Export record…', 'export-record', 'CmdOrCtrl+E'),
      cmd('Export CSV…', 'export-csv', 'CmdOrCtrl+Shift+E'),
      cmd('Export summary CSV…', 'export-summary-csv'),
      ...(mac ? [] : [{ type: 'separator' } as const, { label: 'Quit', accelerator: 'Ctrl+Q', click: input.quit }]),
    ],
  };
  const view: MenuItemConstructorOptions = {
    label: '&View',
    submenu: [
      { label: 'SI units', type: 'radio', checked: true, click: () => input.send({ command: 'units-si' }) },
      { label: 'US customary units', type: 'radio', click: () => input.send({ command: 'units-us' }) },
      { type: 'separator' },
      { role: 'resetZoom' },
      { role: 'zoomIn' },
      { role: 'zoomOut' },
      { type: 'separator' },
      { role: 'togglefullscreen' },
      ...(input.development ? [{ type: 'separator' } as const, { role: 'reload' } as const, { role: 'toggleDevTools' } as const] : []),
    ],
  };
  const help: MenuItemConstructorOptions = {
    label: '&Help',
    role: 'help',
    submenu: [cmd('Methods and sources', 'methods', 'F1'), ...(mac ? [] : [cmd('About Flankfilm', 'about')])],
  };
  const appMenu: MenuItemConstructorOptions[] = mac
    ? [
        {
          label: 'Flankfilm',
          submenu: [cmd('About Flankfilm', 'about'), { type: 'separator' }, { role: 'hide' }, { role: 'hideOthers' }, { role: 'unhide' }, { type: 'separator' }, { label: 'Quit Flankfilm', accelerator: 'Cmd+Q', click: input.quit }],
        },
      ]
    : [];
  return [...appMenu, file, { label: '&Edit', role: 'editMenu' }, view, ...(mac ? [{ role: 'windowMenu' } as const] : []), help];
}
