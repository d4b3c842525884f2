import { MAIN_SCREENS, hashFor, type ScreenId } from './router';
import type { Theme } from './theme';

interface Props {
  current: ScreenId | 'open';
  theme: Theme;
  onTheme: (t: Theme) => void;
}

/** App name and the four screens; large targets for gloved fingers. */
export function NavBar({ current, theme, onTheme }: Props) {
  return (
    <header class="topbar">
      <a class="brand" href={hashFor('cases')} aria-label="Wetmode, go to Cases">
        <img src="/icons/wetmode.svg" alt="" width="32" height="32" />
        <span>Wetmode</span>
      </a>
      <nav aria-label="Screens">
        <ul class="tabs">
          {MAIN_SCREENS.map((s) => (
            <li key={s.id}>
              <a href={hashFor(s.id)} class="tab" aria-current={current === s.id ? 'page' : undefined}>{s.label}</a>
            </li>
          ))}
        </ul>
      </nav>
      <button
        type="button"
        class="btn theme-toggle"
        aria-pressed={theme === 'dark'}
        onClick={() => onTheme(theme === 'dark' ? 'daylight' : 'dark')}
      >
        {theme === 'dark' ? 'Daylight' : 'Dark'}
      </button>
    </header>
  );
}
