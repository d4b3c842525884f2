import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { caseFromDemo } from '../../src/app/create-case';
import { readCase, requestOf } from '../../src/app/read-case';
import { solveCase } from '../../src/app/solve-case';
import { PLATE } from '../../src/kinds/plate-panel';
import { screenPlate } from '../../src/kinds/plate-panel/screen';
import { parsePlateInput, solvePlate, type PlateResult } from '../../src/physics/plate';
import { decodeCaseLink, encodeCaseLink } from '../../src/share/link';
import { caseFromFileText, caseToFileText } from '../../src/share/file';
import { cautionLines, cautionsFor, CAUTIONS } from '../../src/text/cautions';
import { nodalSegments } from '../../src/ui/plate/nodal-lines';
import { expectClose } from '../helpers/expect-close';

const form = PLATE.form;
const example = parsePlateInput(JSON.parse(readFileSync('examples/plate-marrow-creek-baffle.json', 'utf8')));

function errorsOf(values: Record<string, string>): Record<string, string> {
  const r = form.toInput({ ...form.defaults('si'), ...values }, 'si');
  if (r.ok) throw new Error(`expected messages, got input ${JSON.stringify(r.input)}`);
  return r.errors;
}

describe('the plate-panel form reads what was typed, with messages naming the field', () => {
  it('reads the worked example into exactly the plate of the example file', () => {
    const r = form.toInput(PLATE.demo.values, PLATE.demo.system);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.input).toEqual({ ...example, modes: 6 });
  });

  it('reads US units into the same SI plate', () => {
    const us = form.toInput({ ...form.defaults('us'), width: '6.56168 ft', height: '3.28084 ft', thickness: '0.393701 in', liquidDepth: '6.56168 ft', endWallDistance: '9.84252 ft', liquidDensity: '62.428 lb/ft^3' }, 'us');
    if (!us.ok) throw new Error(JSON.stringify(us.errors));
    // Entry texts keep six figures: 1e-5 relative covers the rounding of each converted value.
    expectClose(us.input.widthM, 2, { rtol: 1e-5, label: 'width' });
    expectClose(us.input.thicknessM, 0.01, { rtol: 1e-5, label: 'thickness' });
    expectClose(us.input.liquid!.depthM!, 2, { rtol: 1e-5, label: 'depth' });
    expectClose(us.input.liquid!.densityKgPerM3, 1000, { rtol: 1e-4, label: 'density' });
  });

  it('says a plate too thick for thin-plate theory beside the thickness field', () => {
    expect(errorsOf({ thickness: '300 mm' }).thickness).toBe('thickness must be at most a fifth of the shorter side (200 mm) for thin-plate theory');
  });

  it('says a plate that is not held beside the top edge field', () => {
    expect(errorsOf({ leftEdge: 'free', rightEdge: 'free', bottomEdge: 'simply-supported', topEdge: 'free' }).topEdge).toBe(
      'with these edges the plate is not held: weld one edge, or bolt or seat two',
    );
  });

  it('says liquid on one side deeper than the plate beside the depth field', () => {
    expect(errorsOf({ liquidSetting: 'across-tank-1', liquidDepth: '1.5 m' }).liquidDepth).toMatch(/^with liquid on one face the depth must be at most the plate height \(1 m\)/);
  });

  it('names an empty or negative field', () => {
    expect(errorsOf({ width: '' }).width).toBeTruthy();
    expect(errorsOf({ height: '-1 m' }).height).toBe('plate height must be more than zero');
  });

  it('leaves out the liquid for a dry plate and gives a wall panel its facing wall', () => {
    const dry = form.toInput({ ...form.defaults('si'), liquidSetting: 'none' }, 'si');
    expect(dry.ok && dry.input.liquid).toBeUndefined();
    const wall = form.toInput({ ...form.defaults('si'), liquidSetting: 'wall-panel-1', facingWallDistance: '0.5 m', endWallDistance: '9 m' }, 'si');
    if (!wall.ok) throw new Error(JSON.stringify(wall.errors));
    expect(wall.input.liquid).toEqual({ setting: 'wall-panel', densityKgPerM3: 1000, sides: 1, reachM: 0.5 });
  });
});

describe('a plate case solved through the application service', () => {
  const doc = caseFromDemo(PLATE.demo);
  const reading = readCase(doc);
  if (!reading.ok) throw new Error(JSON.stringify(reading.errors));
  const answer = solveCase(requestOf(reading), () => 0);
  const direct = solvePlate(example);

  it('gives the same frequencies as solvePlate on the example file (cross-check: same engine, two entries)', () => {
    expect(reading.engine).toBe('plate');
    if (!answer.ok || answer.engine !== 'plate' || !direct.ok) throw new Error('both should solve');
    expect(answer.plate.dry.frequenciesHz).toEqual(direct.result.dry.frequenciesHz);
    expect(answer.plate.wet!.frequenciesHz).toEqual(direct.result.wet!.frequenciesHz);
    expect(answer.plate.sloshing).toEqual(direct.result.sloshing);
  });

  it('screens the demo agitator and the tank sloshing, each with its source', () => {
    if (!answer.ok || answer.engine !== 'plate') throw new Error('should solve');
    const s = answer.screening!;
    const kinds = new Set(s.modes.flatMap((m) => m.checks.map((c) => c.kind)));
    expect([...kinds].sort()).toEqual(['machinery', 'sloshing']);
    for (const m of s.modes) for (const c of m.checks) expect(c.source.length).toBeGreaterThan(0);
    // 90 rpm × 3 blades = 4.5 Hz blade pass (classical); the lowest wet mode is above it by more than 20 %.
    expect(s.modes[0].checks.find((c) => c.label.includes('blade pass'))!.bandHz.lowHz).toBe(4.5);
    expect(s.verdict).toBe('clear');
  });

  it('finds a machine at the lowest wet frequency inside the band, and nothing to screen without machine or tank', () => {
    if (!direct.ok) throw new Error('should solve');
    const r: PlateResult = direct.result;
    const f = r.wet!.frequenciesHz[0];
    // Blade pass f = blades × shaft speed (classical): 2 blades at f/2 Hz put it exactly on the wet mode.
    const s = screenPlate(r, { machinery: [{ label: 'pump', shaftSpeedHz: f / 2, bladeCount: 2, shaftOrders: [], bladePassOrders: [1] }], machineryAgainst: 'wet' });
    expect(s!.verdict).toBe('inside-band');
    expect(s!.driver).toEqual({ modeIndex: 0, checkIndex: 0 });
    expect(screenPlate({ ...r, sloshing: null }, { machinery: [], machineryAgainst: 'wet' })).toBeNull();
  });

  it('is saved to a file and shared by link unchanged, and the kind list includes plates', async () => {
    const file = caseFromFileText(caseToFileText(doc));
    expect(file.ok && file.value).toEqual(doc);
    const link = await encodeCaseLink(doc, 'https://example.invalid/');
    const back = await decodeCaseLink(link);
    expect(back.ok && back.value.inputs).toEqual(doc.inputs);
    expect(back.ok && back.value.kind).toBe('plate-panel');
  });
});

describe('cautions for plates', () => {
  it('replace the beam model-limits wording with the plate wording and keep every other caution', () => {
    const plate = cautionsFor('plate');
    expect(plate.map((c) => c.title)).toEqual(CAUTIONS.map((c) => c.title));
    const limits = plate.find((c) => c.title === 'The model has limits')!;
    expect(limits.text).toMatch(/thin-plate model/);
    expect(limits.text).not.toMatch(/beam model/);
    expect(cautionLines()).toEqual(CAUTIONS.map((c) => `${c.title}: ${c.text}`));
  });
});

describe('nodal lines of a mode shape on the grid', () => {
  it('put the nodal line of the simply supported (1, 2) mode at mid-height', () => {
    // w = sin(πx/a) sin(2πy/b) on a simply supported plate (Navier, classical): zero along y = b/2.
    const nx = 11;
    const ny = 21;
    const w = new Float64Array(nx * ny);
    for (let iy = 0; iy < ny; iy++) for (let ix = 0; ix < nx; ix++) w[iy * nx + ix] = Math.sin((Math.PI * ix) / (nx - 1)) * Math.sin((2 * Math.PI * iy) / (ny - 1));
    const segs = nodalSegments(w, nx, ny);
    expect(segs.length).toBeGreaterThan(0);
    for (const [, y0, , y1] of segs) {
      // Linear interpolation on a sine that is odd about the line: exact to rounding.
      expectClose(y0, 10, { atol: 1e-9, label: 'y0' });
      expectClose(y1, 10, { atol: 1e-9, label: 'y1' });
    }
  });
});
