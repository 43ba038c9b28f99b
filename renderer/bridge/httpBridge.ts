import { CALL_NAMES, menuEvent, progressEvent, type Bridge, type CallName } from '../../app/bridge/contract';

/**
 * The contract over HTTP (POST /api/<call> with the JSON argument), as the test harness serves
 * it; menu commands arrive as server-sent events on GET /api/events. Results are validated by
 * the contract's schemas (selectBridge.ts), as the preload's are.
 */
export function httpBridge(base = '/api/', token = new URLSearchParams(location.search).get('token') ?? ''): Bridge {
  // The harness's per-run token, from the page's own URL; sent with every call.
  const call = async (name: CallName, args: unknown): Promise<unknown> => {
    const res = await fetch(`${base}${name}`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-flankfilm-token': token }, body: JSON.stringify(args ?? {}) });
    const body: unknown = await res.json().catch(() => null);
    if (!res.ok) {
      const message = body && typeof body === 'object' && 'error' in body ? String((body as { error: unknown }).error) : `HTTP ${res.status}`;
      throw new Error(`${name}: ${message}`);
    }
    return body;
  };
  const calls = Object.fromEntries(CALL_NAMES.map((name) => [name, (args: unknown) => call(name, args)]));
  return {
    ...(calls as unknown as Omit<Bridge, 'onMenu'>),
    onMenu(listener) {
      const source = new EventSource(`${base}events?token=${encodeURIComponent(token)}`);
      source.onmessage = (e: MessageEvent<string>) => {
        let data: unknown;
        try {
          data = JSON.parse(e.data);
        } catch {
          return;
        }
        const parsed = menuEvent.safeParse(data);
        if (parsed.success) listener(parsed.data);
      };
      return () => source.close();
    },
    onProgress(listener) {
      const source = new EventSource(`${base}events?token=${encodeURIComponent(token)}`);
      source.addEventListener('progress', (e: MessageEvent<string>) => {
        try {
          const parsed = progressEvent.safeParse(JSON.parse(e.data));
          if (parsed.success) listener(parsed.data);
        } catch {
          // not ours
        }
      });
      return () => source.close();
    },
  } as Bridge;
}
