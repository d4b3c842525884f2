/**
 * Spectrum of a motion record: a 60 s, 200 Hz, three-axis logger record (12 001 samples, three decaying modes and
 * noise), read from CSV text and analysed (resampling, Welch spectra, peaks, free-decay fits). Target: well under a
 * second on a tablet, so the measurement screen answers at once (common practice, no source: 100 ms on a desktop).
 */
import { analyseMotionRecord, parseMotionRecord } from '../../src/physics/signal';
import { jitteredTimes, regularTimes, syntheticRecord, type DecayingMode } from '../physics/signal/synthetic';
import { report, time } from './timing';

const MODES: DecayingMode[] = [
  { frequencyHz: 3.1, dampingRatio: 0.02, amplitude: 1, startS: 2 },
  { frequencyHz: 11.7, dampingRatio: 0.01, amplitude: 0.5, startS: 2, phase: 1 },
  { frequencyHz: 37.4, dampingRatio: 0.005, amplitude: 0.3, startS: 2, phase: 2 },
];

export function run(): void {
  const rec = syntheticRecord(regularTimes(200, 60), [MODES, MODES.map((m) => ({ ...m, amplitude: 0.3 * m.amplitude })), []], 0.01, 1, [0.2, -0.1, 9.81]);
  const csv = ['t,x,y,z', ...Array.from(rec.timeS, (t, i) => [t.toFixed(3), rec.axes[0][i].toFixed(5), rec.axes[1][i].toFixed(5), rec.axes[2][i].toFixed(5)].join(','))].join('\n');
  const a = analyseMotionRecord(rec);
  if (!a.ok) throw new Error(a.message);
  console.log(`60 s at 200 Hz, 3 axes: ${rec.timeS.length} samples, CSV ${csv.length} characters; ${a.segments} segments of ${a.segmentLength}, resolution ${a.resolutionHz.toFixed(4)} Hz, ${a.peaks.length} peaks`);
  report('parseMotionRecord, 60 s 200 Hz three-axis CSV', time(() => parseMotionRecord(csv), 20, 3), 100);
  report('analyseMotionRecord, 60 s 200 Hz three axes', time(() => analyseMotionRecord(rec), 20, 3), 100);
  const tablet = syntheticRecord(jitteredTimes(60, 60, 3), [MODES.slice(0, 2), MODES.slice(0, 2), MODES.slice(0, 2)], 0.01, 2);
  report('analyseMotionRecord, 60 s ~60 Hz jittered three axes', time(() => analyseMotionRecord(tablet), 20, 3), 100);
}
