/**
 * The screens loaded on first use. Those that read or show quantities in any unit also load the full unit
 * reader (mathjs); the Member screen (the first paint) reads plain entries without it, and the Cases list,
 * shown for a moment while a fresh start opens the demo, needs none.
 */
import { useEffect, useState } from 'preact/hooks';
import { loadUnitReader } from '../../units/math-on-demand';
import { lazyScreen } from '../shell/lazy-screen';
import { parseHash } from '../shell/router';
import { useServices } from '../state/context';
import type { SectionModel } from '../section/section-model';

const withUnits = <T,>(chunk: Promise<T>): Promise<T> => Promise.all([chunk, loadUnitReader()]).then(([m]) => m);

const LazyCases = lazyScreen('Cases', () => import('../cases/CasesScreen').then((m) => m.CasesScreen));

/**
 * The Cases list. A start with no route shows it while the app boots, and then, when a draft or the demo opens,
 * moves on to the Member screen: its code is fetched only once the boot is over and the route still asks for it.
 */
export function CasesScreen() {
  const { store, storeMessage } = useServices();
  const booting = store === null && storeMessage === null;
  const movingOn = parseHash(location.hash).screen !== 'cases'; // the boot has set the hash; the route follows
  if (booting || movingOn) return <p class="loading-screen" role="status">Opening the cases on this device…</p>;
  return <LazyCases />;
}
export const ResultsWithActions = lazyScreen('Results', () => withUnits(import('./ResultsWithActions')).then((m) => m.ResultsWithActions));
export const ReportScreen = lazyScreen('Report', () => withUnits(import('./ReportScreen')).then((m) => m.ReportScreen));
const LazySection = lazyScreen<{ model: SectionModel }>('Section', () => withUnits(import('../section/SectionScreen')).then((m) => m.SectionScreen));
/** The Section view on the page's one section model (made on first use; a member may have been handed to it first). */
export function SectionScreen() {
  const { section } = useServices();
  const [model, setModel] = useState(section.current());
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (model) return;
    let live = true;
    section.get().then(
      (m) => live && setModel(m),
      (e: unknown) => live && setError(e instanceof Error ? e.message : String(e)),
    );
    return () => {
      live = false;
    };
  }, [section, model]);
  if (error) return <p class="notice" role="alert">The Section screen could not be loaded ({error}). Reload the page to try again.</p>;
  if (!model) return <p class="loading-screen" role="status">Loading the Section screen…</p>;
  return <LazySection model={model} />;
}
export const OpenLinkScreen = lazyScreen<{ payload: string }>('shared case', () => withUnits(import('./OpenLinkScreen')).then((m) => m.OpenLinkScreen));
/** The Field check: a measured frequency against the predictions, and back-calculation of one unknown. */
export const MeasureScreen = lazyScreen('Field check', () => withUnits(import('../measure/MeasureScreen')).then((m) => m.MeasureScreen));
