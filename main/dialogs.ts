import { dialog, type BrowserWindow } from 'electron';
import type { Dialogs, SaveKind } from './services/types';

const FILTERS: Readonly<Record<SaveKind, Electron.FileFilter[]>> = {
  review: [{ name: 'Flankfilm review', extensions: ['flankfilm.json', 'json'] }],
  record: [{ name: 'PDF record', extensions: ['pdf'] }],
  csv: [{ name: 'CSV', extensions: ['csv'] }],
};
const TITLES: Readonly<Record<SaveKind, string>> = { review: 'Save review', record: 'Export record', csv: 'Export CSV' };

/** The services' questions as native dialogs, modal to the window. */
export function electronDialogs(window: () => BrowserWindow | null, defaultDir: () => string): Dialogs {
  return {
    async openPath() {
      const win = window();
      const options: Electron.OpenDialogOptions = { title: 'Open review', properties: ['openFile'], filters: FILTERS.review, defaultPath: defaultDir() };
      const r = win ? await dialog.showOpenDialog(win, options) : await dialog.showOpenDialog(options);
      return r.canceled ? null : (r.filePaths[0] ?? null);
    },
    async savePath(kind, suggestedName) {
      const win = window();
      const options: Electron.SaveDialogOptions = { title: TITLES[kind], defaultPath: `${defaultDir()}/${suggestedName}`, filters: FILTERS[kind], properties: ['showOverwriteConfirmation', 'createDirectory'] };
      const r = win ? await dialog.showSaveDialog(win, options) : await dialog.showSaveDialog(options);
      return r.canceled || !r.filePath ? null : r.filePath;
    },
    async confirmClose(title) {
      const win = window();
      const options: Electron.MessageBoxOptions = {
        type: 'warning',
        buttons: ['Save', "Don't save", 'Cancel'],
        defaultId: 0,
        cancelId: 2,
        message: `Save the changes to “${title}” before closing?`,
        detail: 'If you do not save, your changes are lost.',
      };
      const r = win ? await dialog.showMessageBox(win, options) : await dialog.showMessageBox(options);
      return (['save', 'discard', 'cancel'] as const)[r.response] ?? 'cancel';
    },
  };
}
