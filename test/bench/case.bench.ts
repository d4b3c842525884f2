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
 *
 * Realistic keystrokes per demo case, against a 10 ms target: one that changes a field which leaves the
 * section alone (a length or a mass: its section outcome comes from the section memo) and one that changes
 * the section or its surroundings (a new value every run, so the memo misses and the section is solved).
 */

import { excitationDefaults } from '../../src/forms/excitation';
import { readCase, requestOf } from '../../src/app/read-case';
import { solveCase } from '../../src/app/solve-case';
import { report, time } from './timing';
import { DEMO_CASES, FORMS, kindOf } from '../../src/kinds/registry';

/** Per kind: a field edit that keeps the section (memo hit) and one that changes it (memo miss); k counts keystrokes. */
const EDITS: Record<string, { hit: [string, (k: number) => string]; miss: [string, (k: number) => string] }> = {
  pile: { hit: ['topMass', (k) => `${12 + (k % 2)} t`], miss: ['growthThickness', (k) => `${75 + 0.001 * k} mm`] },
  riser: { hit: ['length', (k) => `${148 + (k % 2)} ft`], miss: ['caissonOffset', (k) => `${2 + 0.0001 * k} in`] },
  baffle: { hit: ['span', (k) => `${1.6 + 0.1 * (k % 2)} m`], miss: ['wallGap', (k) => `${40 + 0.001 * k} mm`] },
  stem: { hit: ['tipMass', (k) => `${50 + (k % 2)} g`], miss: ['rootDiameter', (k) => `${25 + 0.001 * k} mm`] },
};

export function run(): void {
  for (const demo of DEMO_CASES) {
    const c = {
      kind: demo.kind,
      unitSystem: demo.system,
      inputs: { ...FORMS[demo.kind].defaults(demo.system), ...demo.values } as Record<string, string>,
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
    const edits = EDITS[demo.kind];
    if (!edits) continue;
    for (const [what, [field, value]] of [['non-section field', edits.hit], ['section field', edits.miss]] as const) {
      let k = 0;
      const keystroke = () => {
        const r = readCase({ ...c, inputs: { ...c.inputs, [field]: value(k++) } });
        if (!r.ok) throw new Error(`${demo.kind}: ${field} = ${value(k - 1)}: ${JSON.stringify(r.errors)}`);
        solveCase(requestOf(r));
      };
      report(`${demo.kind}: keystroke, ${what} (${field})`, time(keystroke, 30, 5), 10);
    }
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
