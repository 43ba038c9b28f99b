import { useEffect } from 'react';

interface DropActions {
  /** Open a review by the handle main gave for the dropped file (Electron only). */
  readonly openHandle: (handle: string) => void;
  /** Open a review from its text (a plain browser has no path). */
  readonly openText: (text: string) => void;
}

/** The preload adds this to the bridge for drag and drop; the HTTP bridge has none. */
type WithHandleForFile = { handleForFile?: (file: File) => Promise<string | null> };

/** Drop a *.flankfilm.json on the window to open it. */
export function useFileDrop({ openHandle, openText }: DropActions): void {
  useEffect(() => {
    const over = (e: DragEvent) => {
      if (e.dataTransfer?.types.includes('Files')) e.preventDefault();
    };
    const drop = (e: DragEvent) => {
      const file = e.dataTransfer?.files[0];
      if (!file) return;
      e.preventDefault();
      const ask = (window.flankfilm as WithHandleForFile | undefined)?.handleForFile;
      void (ask ? ask(file) : Promise.resolve(null)).then((handle) => (handle ? openHandle(handle) : file.text().then(openText)));
    };
    window.addEventListener('dragover', over);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('dragover', over);
      window.removeEventListener('drop', drop);
    };
  }, [openHandle, openText]);
}
