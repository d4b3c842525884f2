import { describe, expect, it } from 'vitest';
import { analyseMotionRecord, MotionRecorder } from '../../../src/physics/signal';
import { expectClose } from '../../helpers/expect-close';
import { dampedHz, decayValue, jitteredTimes, seededGaussian, type DecayingMode } from './synthetic';

describe('the motion recorder for sensor samples', () => {
  it('records a tablet-like stream, reports the rate achieved, and hands over a record whose peak is the mode', () => {
    const mode: DecayingMode = { frequencyHz: 4.4, dampingRatio: 0.015, amplitude: 0.6, startS: 1 };
    const rec = new MotionRecorder(30);
    const g = seededGaussian(5);
    const times = jitteredTimes(60, 40, 5);
    let outcome = '';
    for (const t of times) {
      const v = decayValue([mode], t);
      // Event times from a page clock that started long before (ms); gravity on z only in the "with" reading.
      outcome = rec.push({ timeMs: 81_234.5 + 1000 * t, withoutGravity: { x: 0.3 * v + 0.01 * g(), y: v + 0.01 * g(), z: 0.01 * g() }, withGravity: { x: 0, y: 0, z: 9.81 } });
      if (outcome === 'full') break;
    }
    expect(outcome).toBe('full');
    expect(rec.full).toBe(true);
    expect(rec.source).toBe('without-gravity');
    expect(rec.durationS).toBeGreaterThanOrEqual(30);
    // The stream runs at 60 Hz nominal with about one event in fifty a whole interval late (synthetic.ts).
    expectClose(rec.achievedRateHz as number, 60 / 1.02, { rtol: 0.02, label: 'achieved rate' });
    const r = rec.toRecord();
    if (!r.ok) throw new Error(r.message);
    expect(r.notes[0]).toMatch(/^recorded \d+ samples over 30(\.\d+)? s at 5\d(\.\d)? samples per second, acceleration without gravity$/);
    const a = analyseMotionRecord(r.record);
    if (!a.ok) throw new Error(a.message);
    // Reference: the damped frequency of the synthetic mode (exact); 1 % as for the logger files.
    expectClose(a.peaks[0].frequencyHz, dampedHz(mode), { rtol: 0.01, label: 'recorded peak frequency' });
    expect(a.peaks[0].strongestAxis).toBe('y');
  });

  it('falls back to acceleration with gravity, skips incomplete and repeated samples, and refuses a short recording', () => {
    const rec = new MotionRecorder(10);
    expect(rec.push({ timeMs: 0, withoutGravity: null, withGravity: { x: 0, y: 0, z: 9.8 } })).toBe('recorded');
    expect(rec.source).toBe('with-gravity');
    expect(rec.push({ timeMs: 0, withoutGravity: null, withGravity: { x: 0, y: 0, z: 9.8 } })).toBe('skipped');
    expect(rec.push({ timeMs: 16, withoutGravity: null, withGravity: { x: null, y: 0, z: 9.8 } })).toBe('skipped');
    expect(rec.push({ timeMs: 17, withoutGravity: null, withGravity: { x: 0.1, y: 0, z: 9.8 } })).toBe('recorded');
    expect(rec.skipped).toBe(2);
    const r = rec.toRecord();
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe('too few samples: expected at least 64, got 2');
    expect(() => new MotionRecorder(0)).toThrow('maxDurationS must be a number of seconds > 0 and ≤ 1800, got 0');
  });

  it('thins the trace for drawing to bucket minima and maxima, so no swing is lost', () => {
    const rec = new MotionRecorder(100);
    for (let i = 0; i < 6000; i++) rec.push({ timeMs: 10 * i, withoutGravity: { x: i === 4321 ? 5 : Math.sin(i / 10), y: -1, z: i === 17 ? -7 : 0 }, withGravity: null });
    const tr = rec.trace(200);
    expect(tr.timeS.length).toBe(200);
    expect(Math.max(...tr.axes[0])).toBe(5);
    expect(Math.min(...tr.axes[2])).toBe(-7);
    const last = rec.trace(200, 5);
    expect(last.timeS[0]).toBeGreaterThanOrEqual(59.99 - 5 - 1e-9);
    expect(last.timeS[last.timeS.length - 1]).toBeCloseTo(59.99, 9);
  });
});
