/**
 * Keystroke to answer, without drawing: reading a whole case as typed (units, checks) on the page's thread,
 * then the worker's solve (dry and wet modes with refinement, section solves, resonance screening).
 * Target: the answer within 100 ms of the last keystroke (issue: guided forms), so both together should be
 * a small part of that on this machine.
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
  'plate-panel': { hit: ['height', (k) => `${1 + 0.01 * (k % 2)} m`], miss: ['thickness', (k) => `${10 + 0.001 * k} mm`] },
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
}
