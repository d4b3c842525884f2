import { createContext, type ComponentChildren } from 'preact';
import { useContext, useEffect, useState } from 'preact/hooks';
import type { CaseStore } from '../../store';
import type { AppModel, ModelState } from './app-model';
import type { SectionModelOnDemand } from '../section/section-model-on-demand';
import type { SectionSolver } from '../section/section-solves';

/** What the whole app shares: the open-case model and the device store (null until opened, or if unavailable). */
export interface AppServices {
  model: AppModel;
  /** The Section screen's model (kept for the page's life, so a visit to another screen loses nothing). */
  section: SectionModelOnDemand;
  /** The page's section worker, for views that solve a section of their own (the Results screen's panel). */
  sectionSolver: SectionSolver;
  /** The device store once open; null while opening or when storage is unavailable (see storeMessage). */
  store: CaseStore | null;
  /** Why cases cannot be kept on this device, in words (null when the store is fine). */
  storeMessage: string | null;
  /** True when reloading (after closing other Wetmode tabs) may open the store. */
  storeRetryable?: boolean;
}

const Ctx = createContext<AppServices | null>(null);

export function AppServicesProvider({ value, children }: { value: AppServices; children: ComponentChildren }) {
  return <Ctx.Provider value={value}>{children}</Ctx.Provider>;
}

export function useServices(): AppServices {
  const s = useContext(Ctx);
  if (!s) throw new Error('useServices must be used inside AppServicesProvider');
  return s;
}

/** The open-case model's state; re-renders on every change. */
export function useModel(): [ModelState, AppModel] {
  const { model } = useServices();
  const [state, setState] = useState(model.get());
  useEffect(() => {
    setState(model.get());
    return model.subscribe(() => setState(model.get()));
  }, [model]);
  return [state, model];
}
