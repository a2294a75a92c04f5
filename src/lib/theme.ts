import { themeSchema } from '#shared/auth/auth-schemas.ts';
import { readLocal, writeLocal } from './local-store.ts';

export type Theme = 'system' | 'light' | 'dark';

/** Read by public/theme-boot.js before the app loads; keep the two in step. */
export const THEME_STORAGE_KEY = 'pourscope:theme';

const DARK_QUERY = '(prefers-color-scheme: dark)';
const SURFACE = { light: '#FAF7F2', dark: '#1B1916' } as const;

export function storedTheme(): Theme {
  const parsed = themeSchema.safeParse(readLocal(THEME_STORAGE_KEY));
  return parsed.success ? parsed.data : 'system';
}

export function systemPrefersDark(): boolean {
  return typeof window.matchMedia === 'function' && window.matchMedia(DARK_QUERY).matches;
}

/** Sets the `dark` class on <html> and the browser chrome colour; remembers the choice. */
export function applyTheme(theme: Theme): void {
  const dark = theme === 'dark' || (theme === 'system' && systemPrefersDark());
  const root = document.documentElement;
  root.classList.toggle('dark', dark);
  root.style.colorScheme = dark ? 'dark' : 'light';
  for (const meta of document.querySelectorAll<HTMLMetaElement>('meta[name="theme-color"]')) {
    meta.content = theme === 'system' ? (meta.media.includes('dark') ? SURFACE.dark : SURFACE.light) : SURFACE[dark ? 'dark' : 'light'];
  }
  writeLocal(THEME_STORAGE_KEY, theme);
}

/** Calls `onChange` when the system's light/dark setting changes; returns the unsubscribe. */
export function watchSystemTheme(onChange: () => void): () => void {
  if (typeof window.matchMedia !== 'function') return () => {};
  const query = window.matchMedia(DARK_QUERY);
  query.addEventListener('change', onChange);
  return () => query.removeEventListener('change', onChange);
}
