import { useSyncExternalStore } from 'react';

const query = '(prefers-color-scheme: dark)';
/** One query list for the page: a new one per render (and a new subscription) cost every chart's render a little. */
let mql: MediaQueryList | null = null;
const scheme = (): MediaQueryList => (mql ??= window.matchMedia(query));

const subscribe = (notify: () => void) => {
  const mq = scheme();
  mq.addEventListener('change', notify);
  return () => mq.removeEventListener('change', notify);
};
const dark = () => (scheme().matches ? 'dark' : 'light');

/** The OS colour scheme, followed live (the CSS follows it by itself; canvases need telling). */
export function useColorScheme(): 'light' | 'dark' {
  return useSyncExternalStore(subscribe, dark);
}

/**
 * A CSS custom property of the document, e.g. `--fg`. The sheet's colours change only with the
 * colour scheme, so each is read once per scheme: reading computed style right after React has
 * changed the page (a chart redrawn in the commit) would make the browser recompute styles first.
 */
const read = new Map<string, string>();
export const cssVar = (name: string): string => {
  const key = `${dark()}|${name}`;
  const known = read.get(key);
  if (known !== undefined) return known;
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  // An empty value (the style sheet not applied yet) is not kept.
  if (value) read.set(key, value);
  return value;
};
