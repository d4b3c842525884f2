/**
 * Keystroke to answer, without drawing: reading a whole case as typed (units, checks) on the page's thread,
 * then the worker's solve (dry and wet modes with refinement, section solves, resonance screening).
 * Target: the answer within 100 ms of the last keystroke (issue: guided forms), so both together should be
 * a small part of that on this machine.
 */

import { excitationDefaults } from '../../src/forms/excitation';
import { readCase, requestOf } from '../../src/app/read-case';
import { solveCase } from '../../src/app/solve-case';
import { report, time } from './timing';
import { DEMO_CASES, FORMS, kindOf } from '../../src/kinds/registry';

export function run(): void {
  for (const demo of DEMO_CASES) {
    const c = {
      kind: demo.kind,
      unitSystem: demo.system,
      inputs: { ...FORMS[demo.kind].defaults(demo.system), ...demo.values },
      excitation: { ...excitationDefaults(kindOf(demo.kind).resonance, demo.system), ...(demo.excitation ?? {}) },
    };
    const reading = readCase(c);
    if (!reading.ok) throw new Error(`${demo.kind}: ${JSON.stringify(reading.errors)}`);
    report(`${demo.kind}: read the form (units, checks, build)`, time(() => readCase(c), 30, 5));
    report(
      `${demo.kind}: solve dry + wet + screening (worker side)`,
      time(() => solveCase(requestOf(reading)), 30, 5),
      16,
    );
    report(
      `${demo.kind}: keystroke to answer, both together`,
      time(() => {
        const r = readCase(c);
        if (r.ok) solveCase(requestOf(r));
      }, 30, 5),
      100,
    );
  }
}
