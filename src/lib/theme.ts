export type Theme = 'light' | 'dark';
const KEY = 'gridleak.theme';

/** Light by default, dark when the system asks for it, or whatever the person picked last. */
export function currentTheme(): Theme {
  const stored = localStorage.getItem(KEY);
  if (stored === 'light' || stored === 'dark') return stored;
  return window.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'light';
}

export function setTheme(theme: Theme): void {
  localStorage.setItem(KEY, theme);
  document.documentElement.dataset.theme = theme;
}

export function applyStoredTheme(): void {
  document.documentElement.dataset.theme = currentTheme();
}
