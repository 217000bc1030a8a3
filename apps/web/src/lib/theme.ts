// Colour theme: dark by default, the system preference on first visit, then the user's choice.
// index.html applies the stored choice before first paint; this module keeps it in sync.
import { useSyncExternalStore } from 'react';

export type Theme = 'dark' | 'light';

const storageKey = 'railyard.theme';
const listeners = new Set<() => void>();

function currentTheme(): Theme {
  return document.documentElement.dataset.theme === 'light' ? 'light' : 'dark';
}

export function setTheme(theme: Theme): void {
  document.documentElement.dataset.theme = theme;
  try {
    localStorage.setItem(storageKey, theme);
  } catch {
    // Private windows may refuse storage; the theme still applies for this visit.
  }
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useTheme(): [Theme, (theme: Theme) => void] {
  const theme = useSyncExternalStore(subscribe, currentTheme, () => 'dark' as const);
  return [theme, setTheme];
}
