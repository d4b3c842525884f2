import { useEffect, useState } from 'preact/hooks';
import { NavBar } from './shell/NavBar';
import { CautionLine } from './shell/CautionLine';
import { UpdatePromptLater } from './shell/UpdatePromptLater';
import { useRoute } from './shell/use-route';
import { applyTheme, loadTheme, type Theme } from './shell/theme';
import { CautionsScreen } from './screens/CautionsScreen';
import { MemberScreen } from './member/MemberScreen';
import { CasesScreen, MeasureScreen, OpenLinkScreen, ReportScreen, ResultsWithActions, SectionScreen } from './screens/lazy-screens';
import { AppServicesProvider } from './state/context';
import { ConflictPrompt } from './cases/ConflictPrompt';
import { useBoot } from './state/use-boot';
import type { Route } from './shell/router';

function Screen({ route }: { route: Route }) {
  switch (route.screen) {
    case 'cases':
      return <CasesScreen />;
    case 'member':
      return <MemberScreen />;
    case 'results':
      return <ResultsWithActions />;
    case 'report':
      return <ReportScreen />;
    case 'section':
      return <SectionScreen />;
    case 'cautions':
      return <CautionsScreen />;
    case 'measure':
      return <MeasureScreen />;
    case 'open':
      return <OpenLinkScreen payload={route.payload} />;
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
      <UpdatePromptLater model={services.model} />
      <main id="main" tabIndex={-1}>
        <AppServicesProvider value={services}>
          <ConflictPrompt />
          <Screen route={route} />
        </AppServicesProvider>
      </main>
    </div>
  );
}
