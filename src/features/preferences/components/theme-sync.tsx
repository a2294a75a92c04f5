import { useEffect } from 'react';
import { applyTheme, watchSystemTheme, type Theme } from '#src/lib/theme.ts';

/**
 * Keeps the `dark` class on <html> in step with the chosen theme, and with
 * the device's setting while the choice is "system". Renders nothing; the
 * effect syncs with the DOM and the media query, which live outside React.
 */
export function ThemeSync({ theme }: { theme: Theme }) {
  useEffect(() => {
    applyTheme(theme);
    if (theme !== 'system') return;
    return watchSystemTheme(() => applyTheme('system'));
  }, [theme]);
  return null;
}
