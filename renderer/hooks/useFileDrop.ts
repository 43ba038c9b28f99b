import { useEffect } from 'react';

interface DropActions {
  /** Open a review by its path (Electron gives dropped files a path). */
  readonly openPath: (path: string) => void;
  /** Open a review from its text (a plain browser has no path). */
  readonly openText: (text: string) => void;
}

/** The preload adds this to the bridge for drag and drop; the HTTP bridge has none. */
type WithPathForFile = { pathForFile?: (file: File) => string };

/** Drop a *.flankfilm.json on the window to open it. */
export function useFileDrop({ openPath, openText }: DropActions): void {
  useEffect(() => {
    const over = (e: DragEvent) => {
      if (e.dataTransfer?.types.includes('Files')) e.preventDefault();
    };
    const drop = (e: DragEvent) => {
      const file = e.dataTransfer?.files[0];
      if (!file) return;
      e.preventDefault();
      const path = (window.flankfilm as WithPathForFile | undefined)?.pathForFile?.(file) ?? '';
      if (path) openPath(path);
      else void file.text().then(openText);
    };
    window.addEventListener('dragover', over);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('dragover', over);
      window.removeEventListener('drop', drop);
    };
  }, [openPath, openText]);
}
