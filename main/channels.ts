/** IPC channel names, shared by main and the preload (which must not import main's services). */
export const channelOf = (name: string): string => `flankfilm:${name}`;
export const MENU_CHANNEL = 'flankfilm:menu';
/** The preload hands main the path of a dropped file here, and gets a document handle back; the page never sees the path. */
export const DROP_CHANNEL = 'flankfilm:drop';
/** Main → page: record-export progress. */
export const PROGRESS_CHANNEL = 'flankfilm:progress';
