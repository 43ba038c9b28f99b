import { CALL_NAMES, contract, menuEvent, progressEvent, type Bridge, type CallName } from '../../app/bridge/contract';
import { httpBridge } from './httpBridge';

declare global {
  interface Window {
    /** The preload's bridge, present only inside Electron. */
    flankfilm?: Bridge;
  }
}

/** Wrap a transport so every result is checked against the contract before the UI sees it. */
export function validated(raw: Bridge): Bridge {
  const calls = Object.fromEntries(
    CALL_NAMES.map((name: CallName) => [
      name,
      async (args: unknown) => {
        const result: unknown = await (raw[name] as (a: unknown) => Promise<unknown>)(args);
        const parsed = contract[name].result.safeParse(result);
        if (!parsed.success) throw new Error(`${name}: main sent a result outside the contract (${parsed.error.issues[0]?.message ?? 'invalid'})`);
        return parsed.data;
      },
    ]),
  );
  return {
    ...(calls as unknown as Omit<Bridge, 'onMenu'>),
    onMenu: (listener) =>
      raw.onMenu((e) => {
        const parsed = menuEvent.safeParse(e);
        if (parsed.success) listener(parsed.data);
      }),
    onProgress: (listener) =>
      raw.onProgress?.((e) => {
        const parsed = progressEvent.safeParse(e);
        if (parsed.success) listener(parsed.data);
      }) ?? (() => undefined),
  } as Bridge;
}

/** The preload's bridge inside Electron, else the HTTP one (tests, a plain browser). */
export function selectBridge(): Bridge {
  return validated(window.flankfilm ?? httpBridge());
}
