import { ipcMain } from 'electron';
import type { CallName, CallResult } from '../app/bridge/contract';
import { ArgsRejected, invokeCall, type CallImpl } from './services/dispatch';
import { UserError } from './services/errors';
import { APP_ORIGIN, originOf } from './origin';
import { channelOf, DROP_CHANNEL } from './channels';

export { channelOf, MENU_CHANNEL } from './channels';

/** The parts of Electron's IpcMainInvokeEvent the checks read (so tests can pass a plain object). */
export interface SenderEvent {
  readonly senderFrame: { readonly url: string; readonly parent: unknown } | null;
}

export class SenderRejected extends Error {
  constructor(reason: string) {
    super(`call refused: ${reason}`);
    this.name = 'SenderRejected';
  }
}

/** Only the app's own page, in its top frame, may call main (Electron security checklist §17). */
export function checkSender(event: SenderEvent, appOrigin: string = APP_ORIGIN): void {
  const frame = event.senderFrame;
  if (!frame) throw new SenderRejected('the calling frame is gone');
  const origin = originOf(frame.url);
  if (origin !== appOrigin) throw new SenderRejected(`the caller's origin ${origin ?? `"${frame.url}"`} is not ${appOrigin}`);
  if (frame.parent !== null) throw new SenderRejected('the caller is a subframe, not the main frame');
}

/**
 * The handler `handle` registers: sender check, then the contract's schema on the arguments and
 * the result. Errors go back to the renderer as one message; unexpected ones are logged here.
 */
export function makeHandler<K extends CallName>(name: K, impl: CallImpl<K>, appOrigin: string = APP_ORIGIN) {
  return async (event: SenderEvent, rawArgs: unknown): Promise<CallResult<K>> => {
    checkSender(event, appOrigin);
    try {
      return await invokeCall(name, impl, rawArgs);
    } catch (e) {
      if (!(e instanceof UserError || e instanceof ArgsRejected)) console.error(`flankfilm: ${name} failed:`, e);
      throw e;
    }
  };
}

/** The one way main registers a contract call. */
export function handle<K extends CallName>(name: K, impl: CallImpl<K>, appOrigin: string = APP_ORIGIN): void {
  ipcMain.handle(channelOf(name), makeHandler(name, impl, appOrigin));
}

/** The preload's drop channel: the sender checked like any call, the path a string of sane length, a handle back. */
export function makeDropHandler(register: (path: string) => string, appOrigin: string = APP_ORIGIN) {
  return async (event: SenderEvent, path: unknown): Promise<string | null> => {
    checkSender(event, appOrigin);
    if (typeof path !== 'string' || path.length === 0 || path.length > 4096 || path.includes('\0')) return null;
    return register(path);
  };
}

export function handleDrop(register: (path: string) => string, appOrigin: string = APP_ORIGIN): void {
  ipcMain.handle(DROP_CHANNEL, makeDropHandler(register, appOrigin));
}
