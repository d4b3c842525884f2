/**
 * A motion record: sample times and one to three acceleration axes, as read from a logger file or gathered from
 * a tablet's motion sensor. Units of acceleration are those of the source (m/s² for a browser motion sensor, often
 * g or m/s² for a logger); the spectrum is reported in the same units squared per hertz.
 */
export interface MotionRecord {
  /** Sample times, s, strictly increasing (not necessarily evenly spaced). */
  timeS: Float64Array;
  /** Acceleration axes: 1 to 3 arrays, each the same length as `timeS`. */
  axes: Float64Array[];
  /** A name per axis (from the file's header when it has one, else "axis 1", "axis 2", ...). */
  axisNames: string[];
}

/**
 * Bounds that keep the work of one analysis small enough for a tablet (all checked before any heavy work).
 * 400 000 rows is 33 minutes at 200 Hz or 1.8 hours at 60 Hz; a tap test needs well under a minute.
 */
export const RECORD_LIMITS = {
  /** Largest text accepted, characters (about 13 MB; a 400 000-row, four-column file is about 12 MB). */
  maxChars: 13_000_000,
  /** Most samples (rows) accepted. */
  maxRows: 400_000,
  /** Fewest samples: below this no averaged spectrum can be formed (two 32-sample segments). */
  minSamples: 64,
  /** Shortest record, s: a shorter one cannot resolve the low modes of a pile or riser (resolution about 1/T). */
  minDurationS: 2,
} as const;

/** Why a record could not be read or analysed (the message says which line, what was expected and what was got). */
export type RecordFailureReason =
  | 'too-large'
  | 'no-data'
  | 'bad-rows'
  | 'one-column'
  | 'too-many-columns'
  | 'time-not-increasing'
  | 'too-few-samples'
  | 'too-short';

export type RecordResult = { ok: true; record: MotionRecord; notes: string[] } | { ok: false; reason: RecordFailureReason; message: string };

/** Checks sample count and duration, shared by the file reader and the live recorder. Returns null when fine. */
export function checkRecordSize(timeS: Float64Array): { reason: RecordFailureReason; message: string } | null {
  const n = timeS.length;
  if (n < RECORD_LIMITS.minSamples) {
    return { reason: 'too-few-samples', message: `too few samples: expected at least ${RECORD_LIMITS.minSamples}, got ${n}` };
  }
  const durationS = timeS[n - 1] - timeS[0];
  if (!(durationS >= RECORD_LIMITS.minDurationS)) {
    return {
      reason: 'too-short',
      message: `record too short: expected at least ${RECORD_LIMITS.minDurationS} s from first to last sample, got ${formatS(durationS)} s (is the time column in seconds?)`,
    };
  }
  if (n > RECORD_LIMITS.maxRows) {
    return { reason: 'too-large', message: `too many samples: expected at most ${RECORD_LIMITS.maxRows}, got ${n}; cut the record to the part of interest` };
  }
  return null;
}

function formatS(s: number): string {
  return Number.isFinite(s) ? String(Number(s.toPrecision(4))) : String(s);
}
