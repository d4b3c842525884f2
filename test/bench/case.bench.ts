/**
 * Keystroke to answer, without drawing: reading a whole case as typed (units, checks) on the page's thread,
 * then the worker's solve (dry and wet modes with refinement, section solves, resonance screening).
 * Target: the answer within 100 ms of the last keystroke (issue: guided forms), so both together should be
 * a small part of that on this machine.
 *
 * The plate engine memoises its dry shapes and its added mass per unit liquid density between solves, so the
 * plate panel's "both together" above (the same case again and again) hits that memo. Its figures that follow
 * are the honest pair: a keystroke the memo serves (the thickness, which leaves the shapes and the added mass
 * per unit density unchanged, or the machine speed) and one it cannot (a new width every run).
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
  plateKeystrokes();
}

function plateKeystrokes(): void {
  const demo = DEMO_CASES.find((d) => d.kind === 'plate-panel');
  if (!demo) return;
  const base = {
    kind: demo.kind,
    unitSystem: demo.system,
    inputs: { ...FORMS[demo.kind].defaults(demo.system), ...demo.values },
    excitation: { ...excitationDefaults(kindOf(demo.kind).resonance, demo.system), ...(demo.excitation ?? {}) },
  };
  let run = 0;
  // A fresh value every run (never seen before), so each keystroke is a true first solve of that input.
  const keystroke = (edit: (c: typeof base, k: number) => typeof base) => () => {
    const r = readCase(edit(base, ++run));
    if (!r.ok) throw new Error(`plate-panel keystroke: ${JSON.stringify(r.errors)}`);
    solveCase(requestOf(r));
  };
  report(
    'plate-panel keystroke, machine speed (memo hit)',
    time(keystroke((c, k) => ({ ...c, excitation: { ...c.excitation, machineSpeed: `${90 + k * 0.01} rpm` } })), 30, 5),
    10,
  );
  report(
    'plate-panel keystroke, thickness (memo hit: shapes, Ma/ρ)',
    time(keystroke((c, k) => ({ ...c, inputs: { ...c.inputs, thickness: `${10 + k * 1e-4} mm` } })), 30, 5),
    10,
  );
  report(
    'plate-panel keystroke, width (memo miss: everything)',
    time(keystroke((c, k) => ({ ...c, inputs: { ...c.inputs, width: `${2 + k * 1e-4} m` } })), 30, 5),
    10,
  );
}
