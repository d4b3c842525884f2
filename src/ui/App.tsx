import { useEffect, useState } from 'preact/hooks';
import { NavBar } from './shell/NavBar';
import { CautionLine } from './shell/CautionLine';
import { UpdatePrompt } from './shell/UpdatePrompt';
import { useRoute } from './shell/use-route';
import { applyTheme, loadTheme, type Theme } from './shell/theme';
import { CautionsScreen } from './screens/CautionsScreen';
import { Placeholder } from './screens/Placeholder';
import { MemberScreen } from './member/MemberScreen';
import { AppServicesProvider } from './state/context';
import { useBoot } from './state/use-boot';
import type { Route } from './shell/router';

function Screen({ route }: { route: Route }) {
  switch (route.screen) {
    case 'cases':
      return (
        <Placeholder title="Cases">
          <p>Your saved cases will be listed here, newest first, with name, member kind, tag, date and key result.</p>
          <p>Saving, search, sharing as a link and reports are being built. Nothing is stored yet.</p>
        </Placeholder>
      );
    case 'member':
      return <MemberScreen />;
    case 'results':
      return (
        <Placeholder title="Results">
          <p>Dry and wet natural frequencies, added mass and resonance verdicts will appear here once a member is entered.</p>
        </Placeholder>
      );
    case 'report':
      return (
        <Placeholder title="Report">
          <p>A printable report of the open case will be here.</p>
        </Placeholder>
      );
    case 'section':
      return (
        <Placeholder title="Section">
          <p>The added-mass view of a cross-section will be here.</p>
        </Placeholder>
      );
    case 'cautions':
      return <CautionsScreen />;
    case 'open':
      return (
        <Placeholder title="Shared case">
          <p>Opening shared case links is being built.</p>
        </Placeholder>
      );
  }
}

export function App() {
  const route = useRoute();
  const services = useBoot(route.screen === 'open');
  const [theme, setTheme] = useState<Theme>(loadTheme);
  useEffect(() => applyTheme(theme), [theme]);
  useEffect(() => {
    // Move focus to the new screen's heading so screen readers and keyboards follow navigation.
    document.getElementById('screen-title')?.focus();
  }, [route.screen]);

  return (
    <div class="app">
      <button type="button" class="skip" onClick={() => document.getElementById('main')?.focus()}>Skip to content</button>
      <NavBar current={route.screen} theme={theme} onTheme={setTheme} />
      <CautionLine />
      <main id="main" tabIndex={-1}>
        <AppServicesProvider value={services}>
          <Screen route={route} />
        </AppServicesProvider>
      </main>
      <UpdatePrompt />
    </div>
  );
}
