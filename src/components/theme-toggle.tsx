import { useState } from 'react';
import { currentTheme, setTheme, type Theme } from '../lib/theme';

export function ThemeToggle() {
  const [theme, setLocal] = useState<Theme>(currentTheme);
  const next: Theme = theme === 'dark' ? 'light' : 'dark';
  return (
    <button
      type="button"
      onClick={() => {
        setTheme(next);
        setLocal(next);
      }}
      className="min-h-11 rounded-lg px-3 text-sm text-ink-soft hover:bg-sunken"
      aria-label={`Switch to the ${next} theme`}
    >
      {theme === 'dark' ? '☀ Light' : '☾ Dim bench'}
    </button>
  );
}
