import { describe, expect, it } from 'vitest';
import type { Case, CaseMeasurement } from '../../src/case';
import { decodeCasePayload, encodeCasePayload, linkView } from '../../src/share';
import { caseToWire } from '../../src/share/wire';
import { framed } from './frame';
import { demoCase, measured } from '../case/fixtures';

const utf8 = (s: string) => new TextEncoder().encode(s);

describe('a link carries the measured frequencies and their notes, never a motion record', () => {
  const c: Case = { ...demoCase(), measurements: [measured()] };

  it('round trips the measurements through a link', async () => {
    const r = await decodeCasePayload(await encodeCasePayload(c));
    expect(r).toEqual({ ok: true, value: linkView(c) });
    expect(r.ok && r.value.measurements?.[0].frequencyHz).toBe(1.84);
    expect(r.ok && r.value.measurements?.[0].note).toBe('Calm, low tide.');
  });

  it('leaves a raw record held beside a measurement out of the wire form', () => {
    const samples = Array.from({ length: 500 }, (_, i) => 0.123456 + i * 1e-6);
    const held = { ...c, measurements: [{ ...measured(), record: { timesS: samples, ax: samples } } as CaseMeasurement] };
    const wire = JSON.stringify(caseToWire(held));
    expect(wire).toContain('1.84');
    expect(wire).not.toContain('0.123456');
    expect(wire).not.toContain('timesS');
  });

  it('still opens a schema-2 link of 13 elements, with no measurements', async () => {
    const wire = caseToWire(demoCase()).slice(0, 13);
    wire[0] = 2;
    const r = await decodeCasePayload(framed('j', utf8(JSON.stringify(wire))));
    expect(r).toEqual({ ok: true, value: linkView(demoCase()) });
  });
});
