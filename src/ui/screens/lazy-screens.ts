/**
 * The screens loaded on first use. Those that read or show quantities in any unit also load the full unit
 * reader (mathjs); the Member screen (the first paint) reads plain entries without it, and the Cases list,
 * shown for a moment while a fresh start opens the demo, needs none.
 */
import { loadUnitReader } from '../../units/math-on-demand';
import { lazyScreen } from '../shell/lazy-screen';

const withUnits = <T,>(chunk: Promise<T>): Promise<T> => Promise.all([chunk, loadUnitReader()]).then(([m]) => m);

export const CasesScreen = lazyScreen('Cases', () => import('../cases/CasesScreen').then((m) => m.CasesScreen));
export const ResultsWithActions = lazyScreen('Results', () => withUnits(import('./ResultsWithActions')).then((m) => m.ResultsWithActions));
export const ReportScreen = lazyScreen('Report', () => withUnits(import('./ReportScreen')).then((m) => m.ReportScreen));
export const SectionScreen = lazyScreen('Section', () => withUnits(import('../section/SectionScreen')).then((m) => m.SectionScreen));
export const OpenLinkScreen = lazyScreen<{ payload: string }>('shared case', () => withUnits(import('./OpenLinkScreen')).then((m) => m.OpenLinkScreen));
