import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { keepRecord, loadRecord, recordIds } from '../../../src/ui/measure/record-store';

describe('motion records kept on this device', () => {
  it('keeps a record by measurement id and gives it back sample for sample', async () => {
    const timeS = Float64Array.from({ length: 100 }, (_, i) => i / 60);
    const ax = Float64Array.from(timeS, (t) => Math.sin(2 * Math.PI * 0.6 * t));
    const kept = await keepRecord('0b9e4c7a-1f2d-4e3b-8a6c-5d7e9f1a2b3c', { timeS, axes: [ax], axisNames: ['x'] });
    expect(kept).toEqual({ ok: true, value: null });
    const back = await loadRecord('0b9e4c7a-1f2d-4e3b-8a6c-5d7e9f1a2b3c');
    if (!back.ok || !back.value) throw new Error('not found');
    expect(Array.from(back.value.timeS)).toEqual(Array.from(timeS));
    expect(Array.from(back.value.axes[0])).toEqual(Array.from(ax));
    expect(back.value.axisNames).toEqual(['x']);
    expect((await recordIds()).has('0b9e4c7a-1f2d-4e3b-8a6c-5d7e9f1a2b3c')).toBe(true);
  });

  it('answers null for a measurement recorded on another device', async () => {
    expect(await loadRecord('1c0f5d8b-2a3e-4f4c-9b7d-6e8fa0b1c2d4')).toEqual({ ok: true, value: null });
  });
});
