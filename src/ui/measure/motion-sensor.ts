/**
 * The page's side of recording from the tablet's motion sensor: asks for permission where the browser requires it
 * (Safari on iOS and iPadOS: `DeviceMotionEvent.requestPermission()`, which must be called from a tap), listens to
 * `devicemotion` events and copies their numbers into a `MotionRecorder`, and stops after the recorder's set time,
 * on request, or when no event arrives (a desktop browser has the event type but no sensor).
 * Written against a small `MotionHost` interface so it can be tested with a fake window.
 */
import type { MotionRecorder, Triple } from '../../physics/signal';

/** What is read from a motion event (a `DeviceMotionEvent` has these). */
export interface MotionEventLike {
  timeStamp: number;
  acceleration: Triple | null;
  accelerationIncludingGravity: Triple | null;
}

/** The parts of `window` used here; the real window satisfies it. */
export interface MotionHost {
  addEventListener(type: 'devicemotion', listener: (e: MotionEventLike) => void): void;
  removeEventListener(type: 'devicemotion', listener: (e: MotionEventLike) => void): void;
  DeviceMotionEvent?: { requestPermission?: () => Promise<string> } | undefined;
  setTimeout(handler: () => void, ms: number): number;
  clearTimeout(id: number): void;
}

export type PermissionOutcome = { ok: true } | { ok: false; reason: 'unsupported' | 'denied' | 'error'; message: string };

/**
 * Call from the tap that starts a recording (iOS refuses the request outside a user gesture). Browsers without the
 * permission step resolve at once.
 */
export async function requestMotionPermission(host: MotionHost): Promise<PermissionOutcome> {
  const ctor = host.DeviceMotionEvent;
  if (!ctor) return { ok: false, reason: 'unsupported', message: 'this browser has no motion sensor access (no DeviceMotionEvent); import a file from a logger instead' };
  if (typeof ctor.requestPermission !== 'function') return { ok: true };
  try {
    const answer = await ctor.requestPermission();
    return answer === 'granted'
      ? { ok: true }
      : { ok: false, reason: 'denied', message: 'motion sensor access was not allowed; allow "Motion & Orientation Access" for this site in the browser settings and try again' };
  } catch (e) {
    return { ok: false, reason: 'error', message: `motion sensor access could not be asked for (${e instanceof Error ? e.message : String(e)}); start the recording with a tap` };
  }
}

export type StopReason = 'full' | 'stopped' | 'no-data';

export interface SensorHandlers {
  /** After each sample recorded (for redrawing the trace and the rate). */
  onSample?: () => void;
  /** Once, when listening ends. */
  onStop?: (why: StopReason) => void;
}

/** How long to wait for the first event before concluding there is no sensor, ms. */
export const NO_DATA_TIMEOUT_MS = 2000;

/** Starts listening; returns `stop` (idempotent). Permission, where needed, must have been granted first. */
export function startMotionSensor(host: MotionHost, recorder: MotionRecorder, handlers: SensorHandlers = {}): { stop: () => void } {
  let running = true;
  const finish = (why: StopReason) => {
    if (!running) return;
    running = false;
    host.removeEventListener('devicemotion', listener);
    host.clearTimeout(watchdog);
    handlers.onStop?.(why);
  };
  const listener = (e: MotionEventLike) => {
    if (!running) return;
    const outcome = recorder.push({ timeMs: e.timeStamp, withoutGravity: copy(e.acceleration), withGravity: copy(e.accelerationIncludingGravity) });
    if (outcome !== 'skipped') handlers.onSample?.();
    if (outcome === 'full') finish('full');
  };
  host.addEventListener('devicemotion', listener);
  const watchdog = host.setTimeout(() => {
    if (recorder.count === 0) finish('no-data');
  }, NO_DATA_TIMEOUT_MS);
  return { stop: () => finish('stopped') };
}

function copy(v: Triple | null): Triple | null {
  return v ? { x: v.x, y: v.y, z: v.z } : null;
}
