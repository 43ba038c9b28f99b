import { describe, expect, it, vi } from 'vitest';
import { menuTemplate, type MenuEvent } from '../../main/menu';

type MenuItemConstructorOptions = ReturnType<typeof menuTemplate>[number];

function build(platform: string, recent: string[] = []) {
  const sent: MenuEvent[] = [];
  const quit = vi.fn();
  const clearRecent = vi.fn();
  const template = menuTemplate({ platform, recent, development: false, send: (e) => sent.push(e), clearRecent, quit });
  return { template, sent, quit, clearRecent };
}
const submenu = (item: MenuItemConstructorOptions | undefined) => (item?.submenu ?? []) as MenuItemConstructorOptions[];
const find = (items: MenuItemConstructorOptions[], label: string) => items.find((i) => i.label === label);
const click = (item: MenuItemConstructorOptions | undefined) => (item?.click as unknown as () => void)();

describe('the native menu', () => {
  it('has File, Edit, View and Help on Windows and Linux', () => {
    const { template } = build('linux');
    expect(template.map((m) => m.label ?? m.role)).toEqual(['&File', '&Edit', '&View', '&Help']);
  });

  it('File sends the document commands, with the usual accelerators', () => {
    const { template, sent, quit } = build('win32');
    const file = submenu(template[0]);
    const rows: Array<[string, string | undefined, MenuEvent['command'] | null]> = [
      ['New review…', 'CmdOrCtrl+N', 'new'],
      ['Open…', 'CmdOrCtrl+O', 'open'],
      ['Save', 'CmdOrCtrl+S', 'save'],
      ['Save as…', 'CmdOrCtrl+Shift+S', 'save-as'],
      ['Export record…', 'CmdOrCtrl+E', 'export-record'],
      ['Export CSV…', 'CmdOrCtrl+Shift+E', 'export-csv'],
      ['Export summary CSV…', undefined, 'export-summary-csv'],
      ['Sign off…', undefined, 'sign'],
      ['Compare with…', undefined, 'compare'],
    ];
    for (const [label, accelerator, command] of rows) {
      const item = find(file, label);
      expect(item, label).toBeDefined();
      expect(item?.accelerator, label).toBe(accelerator);
      click(item);
      expect(sent.at(-1)).toEqual({ command });
    }
    click(find(file, 'Quit'));
    expect(quit).toHaveBeenCalledOnce();
  });

  it('Open recent opens the file by path, and can be cleared', () => {
    const { template, sent, clearRecent } = build('linux', ['/home/u/crusher.flankfilm.json']);
    const recent = submenu(find(submenu(template[0]), 'Open recent'));
    expect(recent[0]?.label).toBe('crusher.flankfilm.json');
    click(recent[0]);
    expect(sent).toEqual([{ command: 'open', path: '/home/u/crusher.flankfilm.json' }]);
    click(find(recent, 'Clear recent'));
    expect(clearRecent).toHaveBeenCalledOnce();
  });

  it('Help has Methods and sources and About', () => {
    const { template, sent } = build('linux');
    const help = submenu(template[3]);
    click(find(help, 'Methods and sources'));
    click(find(help, 'About Flankfilm'));
    expect(sent).toEqual([{ command: 'methods' }, { command: 'about' }]);
  });

  it('on macOS, About and Quit move to the app menu', () => {
    const { template, sent, quit } = build('darwin');
    expect(template[0]?.label).toBe('Flankfilm');
    const appMenu = submenu(template[0]);
    click(find(appMenu, 'About Flankfilm'));
    click(find(appMenu, 'Quit Flankfilm'));
    expect(sent).toEqual([{ command: 'about' }]);
    expect(quit).toHaveBeenCalledOnce();
    expect(find(submenu(template[1]), 'Quit')).toBeUndefined();
  });

  it('DevTools only in development builds', () => {
    const roles = (dev: boolean) =>
      submenu(menuTemplate({ platform: 'linux', recent: [], development: dev, send: () => undefined, clearRecent: () => undefined, quit: () => undefined })[2]).map((i) => i.role);
    expect(roles(false)).not.toContain('toggleDevTools');
    expect(roles(true)).toContain('toggleDevTools');
  });
});
