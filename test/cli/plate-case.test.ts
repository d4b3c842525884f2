import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { caseFromDemo } from '../../src/app/create-case';
import { runCaseCommand } from '../../src/cli/case-command';
import { runPlateCommand } from '../../src/cli/plate-command';
import { PLATE } from '../../src/kinds/plate-panel';
import { caseToFileText } from '../../src/share/file';

describe('wetmode case on a plate-panel case', () => {
  it('gives the same frequencies as wetmode plate on the example file, with the plate cautions and the screening', () => {
    const out = JSON.parse(runCaseCommand(caseToFileText(caseFromDemo(PLATE.demo))));
    const plate = JSON.parse(runPlateCommand(readFileSync('examples/plate-marrow-creek-baffle.json', 'utf8')));
    expect(out.ok).toBe(true);
    expect(out.case.kind).toBe('plate-panel');
    // Same engine, same input, same JSON rounding: identical (a cross-check of the two entries).
    expect(out.dry.frequenciesHz).toEqual(plate.dry.frequenciesHz);
    expect(out.wet.frequenciesHz).toEqual(plate.wet.frequenciesHz);
    expect(out.cautions).toEqual(plate.cautions);
    expect(out.cautions.join(' ')).toContain('thin-plate model');
    expect(out.resonance.verdict).toBe('clear');
    expect(out.resonance.checks.some((k: { excitation: string }) => k.excitation.startsWith('sloshing'))).toBe(true);
  });
});
