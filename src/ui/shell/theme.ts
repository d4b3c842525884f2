/** Daylight (default, high contrast for sun) or dark theme, remembered on the device. */
export type Theme = 'daylight' | 'dark';

const KEY = 'wetmode.theme';

export function loadTheme(): Theme {
  try {
    return localStorage.getItem(KEY) === 'dark' ? 'dark' : 'daylight';
  } catch {
    return 'daylight'; // storage blocked (private mode): fall back quietly, the theme is not data
  }
}

export function applyTheme(theme: Theme): void {
  document.documentElement.dataset.theme = theme;
  try {
    localStorage.setItem(KEY, theme);
  } catch {
    /* not data; nothing to lose */
  }
}
