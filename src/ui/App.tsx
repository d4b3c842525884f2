import { useEffect, useState } from 'preact/hooks';
import { NavBar } from './shell/NavBar';
import { CautionLine } from './shell/CautionLine';
import { UpdatePrompt } from './shell/UpdatePrompt';
import { useRoute } from './shell/use-route';
import { applyTheme, loadTheme, type Theme } from './shell/theme';
import { CautionsScreen } from './screens/CautionsScreen';
import { SectionScreen } from './section/SectionScreen';
import { MemberScreen } from './member/MemberScreen';
import { ResultsScreen } from './screens/ResultsScreen';
import { OpenLinkScreen } from './screens/OpenLinkScreen';
import { CasesScreen, ConflictPrompt, ReceivedBanner, ShareActions } from './cases';
import { ReportScreen } from './screens/ReportScreen';
import { AppServicesProvider, useModel, useServices } from './state/context';
import { useBoot } from './state/use-boot';
import type { Route } from './shell/router';

function ResultsWithActions() {
  const [state] = useModel();
  return (
    <ResultsScreen
      banner={state.doc ? <ReceivedBanner doc={state.doc} /> : null}
      actions={state.doc ? <ShareActions doc={state.doc} /> : null}
    />
  );
}

function SectionWithModel() {
  return <SectionScreen model={useServices().section} />;
}

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
      return <SectionWithModel />;
    case 'cautions':
      return <CautionsScreen />;
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
      <UpdatePrompt />
      <main id="main" tabIndex={-1}>
        <AppServicesProvider value={services}>
          <ConflictPrompt />
          <Screen route={route} />
        </AppServicesProvider>
      </main>
    </div>
  );
}
