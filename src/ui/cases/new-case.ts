/** A fresh case of a member kind with the form's defaults, for the four "new case" buttons. */
import { sameCaseContent, type Case, type MemberKind, type UnitSystem } from '../../case';
import { excitationDefaults } from '../../forms/excitation';
import { newCase } from '../../store/new-case';
import { caseFromDemo } from '../state/services';
import { DEMO_CASES, kindOf } from '../../kinds/registry';

export function blankCase(kind: MemberKind, system: UnitSystem): Case {
  return {
    ...newCase({ kind, unitSystem: system }),
    inputs: { ...kindOf(kind).form.defaults(system) },
    excitation: { ...excitationDefaults(kindOf(kind).resonance, system) },
  };
}

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
