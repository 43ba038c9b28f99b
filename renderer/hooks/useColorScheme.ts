import { useSyncExternalStore } from 'react';

const query = '(prefers-color-scheme: dark)';

/** The OS colour scheme, followed live (the CSS follows it by itself; canvases need telling). */
export function useColorScheme(): 'light' | 'dark' {
  return useSyncExternalStore(
    (notify) => {
      const mq = window.matchMedia(query);
      mq.addEventListener('change', notify);
      return () => mq.removeEventListener('change', notify);
    },
    () => (window.matchMedia(query).matches ? 'dark' : 'light'),
  );
}

/** A CSS custom property of the document, e.g. `--fg`. */
export const cssVar = (name: string): string => getComputedStyle(document.documentElement).getPropertyValue(name).trim();
