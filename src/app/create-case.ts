/**
 * Case creation for the app and its tests: a blank case of a kind with its form's defaults, and a fresh,
 * unsaved case from a kind's worked example. Each gets a new id, the current time and this app's version
 * (`newCase` in src/store); the inputs and resonance inputs come from the kind's module (src/kinds).
 */
import type { Case, MemberKind, UnitSystem } from '../case';
import { excitationDefaults } from '../forms/excitation';
import type { DemoCase } from '../forms/types';
import { kindOf } from '../kinds/registry';
import { newCase } from '../store/new-case';

/** A fresh case of a member kind with the form's defaults, for the "new case" buttons. */
export function blankCase(kind: MemberKind, system: UnitSystem): Case {
  const k = kindOf(kind);
  return {
    ...newCase({ kind, unitSystem: system }),
    inputs: { ...k.form.defaults(system) },
    excitation: { ...excitationDefaults(k.resonance, system) },
  };
}

/** A fresh, unsaved case from a demo, with its own id. */
export function caseFromDemo(demo: DemoCase): Case {
  const c = newCase({ kind: demo.kind, unitSystem: demo.system, name: demo.name, tag: demo.tag, note: demo.note });
  const k = kindOf(demo.kind);
  return {
    ...c,
    inputs: { ...k.form.defaults(demo.system), ...demo.values },
    excitation: { ...excitationDefaults(k.resonance, demo.system), ...(demo.excitation ?? {}) },
  };
}
