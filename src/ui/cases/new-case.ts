/** The new-case choices of this device (units last chosen) and the "untouched start" test; cases come from src/app. */
import { blankCase, caseFromDemo } from '../../app/create-case';
import { sameCaseContent, type Case, type UnitSystem } from '../../case';
import { DEMO_CASES } from '../../kinds/registry';

const UNITS_KEY = 'wetmode.newCaseUnits';

/** The unit system last chosen for new cases on this device ('si' when none, or when storage is off). */
export function loadNewCaseUnits(): UnitSystem {
  try {
    return globalThis.localStorage?.getItem(UNITS_KEY) === 'us' ? 'us' : 'si';
  } catch {
    return 'si';
  }
}

export function storeNewCaseUnits(system: UnitSystem): void {
  try {
    globalThis.localStorage?.setItem(UNITS_KEY, system);
  } catch {
    /* private mode: the choice lasts for this visit only */
  }
}

/**
 * True when the case holds exactly what a "new case" button or a demo put there (any id): closing it loses
 * no work, so opening another case need not ask first (the app opens the demo pile on a first start).
 */
export function isUntouchedStart(doc: Case): boolean {
  // sameCaseContent compares what was entered (not ids or times).
  if (sameCaseContent(doc, blankCase(doc.kind, doc.unitSystem))) return true;
  return DEMO_CASES.some((d) => d.kind === doc.kind && d.system === doc.unitSystem && sameCaseContent(doc, caseFromDemo(d)));
}
