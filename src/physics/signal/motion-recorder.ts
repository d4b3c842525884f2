/**
 * A buffer for motion-sensor samples as a browser delivers them (time in ms, acceleration x, y, z with and without
 * gravity, any of which may be missing): keeps one source for the whole recording, drops samples that cannot be
 * used, reports the rate actually achieved, gives a thinned trace for drawing, and hands over a `MotionRecord`.
 * No DOM types: the page's event glue copies the numbers in.
 *
 * Storage: `timeS` and the three axes are flat `Float64Array`s of `capacity` entries, the first `count` in use,
 * grown by doubling.
 */
import { checkRecordSize, RECORD_LIMITS, type MotionRecord, type RecordResult } from './record';

/** Three components as delivered; any may be null (the device does not give it). */
export interface Triple {
  x: number | null;
  y: number | null;
  z: number | null;
}

export interface MotionSample {
  /** Event time, ms, from a monotonic clock (the event's time stamp). */
  timeMs: number;
  /** Acceleration without gravity (the device's own estimate), or null. */
  withoutGravity: Triple | null;
  /** Acceleration including gravity, or null. */
  withGravity: Triple | null;
}

/** Which of the two accelerations the recording holds: the first sample that has a complete one decides. */
export type MotionSource = 'without-gravity' | 'with-gravity';

/** 'full' once the set duration (or the sample limit) is reached: stop listening then. */
export type PushOutcome = 'recorded' | 'skipped' | 'full';

/** A trace for drawing: at most about `maxPoints` points per axis, keeping each bucket's lowest and highest value. */
export interface MotionTrace {
  timeS: Float64Array;
  axes: [Float64Array, Float64Array, Float64Array];
}

export class MotionRecorder {
  readonly maxDurationS: number;
  private t = new Float64Array(1024);
  private a: [Float64Array, Float64Array, Float64Array] = [new Float64Array(1024), new Float64Array(1024), new Float64Array(1024)];
  private n = 0;
  private t0Ms = 0;
  private src: MotionSource | null = null;
  private dropped = 0;
  private done = false;

  /** `maxDurationS`: the recording stops itself after this long (a positive number of seconds, at most 1800). */
  constructor(maxDurationS: number) {
    if (!(Number.isFinite(maxDurationS) && maxDurationS > 0 && maxDurationS <= 1800)) {
      throw new RangeError(`maxDurationS must be a number of seconds > 0 and ≤ 1800, got ${String(maxDurationS)}`);
    }
    this.maxDurationS = maxDurationS;
  }

  get count(): number { return this.n; }
  get skipped(): number { return this.dropped; }
  get source(): MotionSource | null { return this.src; }
  get full(): boolean { return this.done; }
  /** Seconds from the first to the last sample. */
  get durationS(): number { return this.n < 2 ? 0 : this.t[this.n - 1] - this.t[0]; }
  /** Samples per second achieved so far, (n − 1) / duration; null before two samples. */
  get achievedRateHz(): number | null { return this.n < 2 ? null : (this.n - 1) / this.durationS; }

  push(s: MotionSample): PushOutcome {
    if (this.done) return 'full';
    if (this.src === null) this.src = complete(s.withoutGravity) ? 'without-gravity' : complete(s.withGravity) ? 'with-gravity' : null;
    const v = this.src === 'without-gravity' ? s.withoutGravity : this.src === 'with-gravity' ? s.withGravity : null;
    if (!v || !complete(v) || !Number.isFinite(s.timeMs)) return this.skip();
    if (this.n === 0) this.t0Ms = s.timeMs;
    const tS = (s.timeMs - this.t0Ms) / 1000;
    if (this.n > 0 && !(tS > this.t[this.n - 1])) return this.skip(); // repeated or out-of-order time stamp
    if (this.n === this.t.length) this.grow();
    this.t[this.n] = tS;
    this.a[0][this.n] = v.x as number;
    this.a[1][this.n] = v.y as number;
    this.a[2][this.n] = v.z as number;
    this.n++;
    if (tS >= this.maxDurationS || this.n >= RECORD_LIMITS.maxRows) {
      this.done = true;
      return 'full';
    }
    return 'recorded';
  }

  /** The last `lastS` seconds (all when omitted), thinned to min/max pairs in about `maxPoints` buckets. */
  trace(maxPoints: number, lastS?: number): MotionTrace {
    const end = this.n;
    let start = 0;
    if (lastS !== undefined && end > 0) {
      // First sample at or after (last time − lastS), by bisection: the trace is redrawn many times a second.
      const from = this.t[end - 1] - lastS;
      let hi = end - 1;
      while (start < hi) {
        const mid = (start + hi) >> 1;
        if (this.t[mid] < from) start = mid + 1;
        else hi = mid;
      }
    }
    const count = end - start;
    const buckets = Math.max(1, Math.floor(maxPoints / 2));
    if (count <= 2 * buckets) return { timeS: this.t.slice(start, end), axes: [this.a[0].slice(start, end), this.a[1].slice(start, end), this.a[2].slice(start, end)] };
    const size = count / buckets;
    const timeS = new Float64Array(2 * buckets);
    const axes: [Float64Array, Float64Array, Float64Array] = [new Float64Array(2 * buckets), new Float64Array(2 * buckets), new Float64Array(2 * buckets)];
    for (let b = 0; b < buckets; b++) {
      const i0 = start + Math.floor(b * size);
      const i1 = start + Math.floor((b + 1) * size);
      timeS[2 * b] = this.t[i0];
      timeS[2 * b + 1] = this.t[i1 - 1];
      for (let k = 0; k < 3; k++) {
        let lo = Infinity;
        let hi = -Infinity;
        for (let i = i0; i < i1; i++) {
          const v = this.a[k][i];
          if (v < lo) lo = v;
          if (v > hi) hi = v;
        }
        axes[k][2 * b] = lo;
        axes[k][2 * b + 1] = hi;
      }
    }
    return { timeS, axes };
  }

  /** The recording as a record for `analyseMotionRecord`, or why it cannot be analysed (too few samples, too short). */
  toRecord(): RecordResult {
    const timeS = this.t.slice(0, this.n);
    const size = checkRecordSize(timeS);
    if (size) return { ok: false, ...size };
    const record: MotionRecord = { timeS, axes: this.a.map((x) => x.slice(0, this.n)), axisNames: ['x', 'y', 'z'] };
    const gravity = this.src === 'with-gravity' ? 'including gravity (removed in the analysis)' : 'without gravity';
    const notes = [`recorded ${this.n} samples over ${round(this.durationS)} s at ${round(this.achievedRateHz ?? 0)} samples per second, acceleration ${gravity}`];
    if (this.dropped > 0) notes.push(`${this.dropped} sensor event${this.dropped === 1 ? ' was' : 's were'} skipped (missing values or a repeated time)`);
    return { ok: true, record, notes };
  }

  private skip(): PushOutcome {
    this.dropped++;
    return 'skipped';
  }

  private grow(): void {
    const cap = this.t.length * 2;
    const t = new Float64Array(cap);
    t.set(this.t);
    this.t = t;
    this.a = this.a.map((x) => {
      const y = new Float64Array(cap);
      y.set(x);
      return y;
    }) as [Float64Array, Float64Array, Float64Array];
  }
}

function complete(v: Triple | null): boolean {
  return v !== null && Number.isFinite(v.x) && Number.isFinite(v.y) && Number.isFinite(v.z);
}

function round(v: number): number {
  return Number(v.toPrecision(3));
}
