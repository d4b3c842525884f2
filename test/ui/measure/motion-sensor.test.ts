import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { MotionRecorder } from '../../../src/physics/signal';
import { NO_DATA_TIMEOUT_MS, requestMotionPermission, startMotionSensor, type MotionEventLike, type MotionHost, type StopReason } from '../../../src/ui/measure/motion-sensor';

// The real window must fit the interface the glue is written against (a compile-time check).
export const windowFits: (w: Window) => MotionHost = (w) => w;

/** A fake window: keeps the devicemotion listeners, lets the test fire events, uses Vitest's fake timers. */
function fakeHost(permission?: () => Promise<string>) {
  const listeners = new Set<(e: MotionEventLike) => void>();
  const host: MotionHost = {
    addEventListener: (_t, l) => void listeners.add(l),
    removeEventListener: (_t, l) => void listeners.delete(l),
    DeviceMotionEvent: permission ? { requestPermission: permission } : {},
    setTimeout: (h, ms) => setTimeout(h, ms) as unknown as number,
    clearTimeout: (id) => clearTimeout(id),
  };
  const fire = (timeStamp: number, x: number) => listeners.forEach((l) => l({ timeStamp, acceleration: { x, y: 0, z: 0 }, accelerationIncludingGravity: { x, y: 0, z: 9.81 } }));
  return { host, listeners, fire };
}

describe('the motion sensor glue', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('asks for permission where the browser requires it and reports a refusal in words', async () => {
    expect(await requestMotionPermission(fakeHost(async () => 'granted').host)).toEqual({ ok: true });
    expect(await requestMotionPermission(fakeHost().host)).toEqual({ ok: true });
    const denied = await requestMotionPermission(fakeHost(async () => 'denied').host);
    expect(denied.ok).toBe(false);
    if (!denied.ok) expect(denied.message).toMatch(/^motion sensor access was not allowed/);
    const thrown = await requestMotionPermission(fakeHost(async () => { throw new Error('requires a user gesture'); }).host);
    if (!thrown.ok) expect(thrown.message).toContain('(requires a user gesture); start the recording with a tap');
    const none = await requestMotionPermission({ ...fakeHost().host, DeviceMotionEvent: undefined });
    if (!none.ok) expect(none.reason).toBe('unsupported');
  });

  it('records events until the set time, then stops listening by itself', () => {
    const { host, listeners, fire } = fakeHost();
    const rec = new MotionRecorder(2);
    const stops: StopReason[] = [];
    let samples = 0;
    startMotionSensor(host, rec, { onSample: () => samples++, onStop: (w) => stops.push(w) });
    for (let i = 0; i < 300; i++) fire(1000 + i * 16, Math.sin(i));
    expect(stops).toEqual(['full']);
    expect(listeners.size).toBe(0);
    expect(rec.count).toBe(126); // 0, 16, ..., 2000 ms: the sample at 2.000 s fills the 2 s recording
    expect(samples).toBe(126);
  });

  it('stops on request, once, and says when no event arrives at all', () => {
    const a = fakeHost();
    const stopsA: StopReason[] = [];
    const runA = startMotionSensor(a.host, new MotionRecorder(60), { onStop: (w) => stopsA.push(w) });
    a.fire(5, 0.1);
    runA.stop();
    runA.stop();
    vi.advanceTimersByTime(NO_DATA_TIMEOUT_MS * 2);
    expect(stopsA).toEqual(['stopped']);
    expect(a.listeners.size).toBe(0);

    const b = fakeHost();
    const stopsB: StopReason[] = [];
    startMotionSensor(b.host, new MotionRecorder(60), { onStop: (w) => stopsB.push(w) });
    vi.advanceTimersByTime(NO_DATA_TIMEOUT_MS + 1);
    expect(stopsB).toEqual(['no-data']);
    expect(b.listeners.size).toBe(0);
  });
});
