/** IPC channel names, shared by main and the preload (which must not import main's services). */
export const channelOf = (name: string): string => `flankfilm:${name}`;
export const MENU_CHANNEL = 'flankfilm:menu';
