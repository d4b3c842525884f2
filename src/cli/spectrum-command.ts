/**
 * `wetmode spectrum FILE`: reads a motion record (CSV or text: a time column in seconds and one to three
 * acceleration columns) and prints its sample rate, resolution, Nyquist limit and peaks, strongest first, with a
 * damping estimate for each. A file that does not read throws an Error whose message names the line.
 */
import { analyseMotionRecord, parseMotionRecord } from '../physics/signal';
import { cautionLines } from '../text/cautions';
import { measurementCautionLines } from '../text/measurement-cautions';
import { toJson } from './json-out';

export function runSpectrumCommand(inputText: string): string {
  const read = parseMotionRecord(inputText);
  if (!read.ok) throw new Error(`the motion record does not read: ${read.message}`);
  const a = analyseMotionRecord(read.record);
  if (!a.ok) throw new Error(`the motion record cannot be analysed: ${a.message}`);
  return toJson({
    ok: true,
    units: 'Hz, s; spectral density in (the file\'s acceleration unit)² per Hz',
    sampleRateHz: a.sampleRateHz,
    meanRateHz: a.meanRateHz,
    intervalJitter: a.intervalJitter,
    durationS: a.durationS,
    resolutionHz: a.resolutionHz,
    nyquistHz: a.nyquistHz,
    lowestFrequencyHz: a.lowestFrequencyHz,
    segments: a.segments,
    segmentLength: a.segmentLength,
    axes: a.axisNames,
    peaks: a.peaks.map((p) => ({
      frequencyHz: p.frequencyHz,
      dampingRatio: p.dampingRatio,
      dampingMethod: p.dampingMethod,
      qualityDb: p.qualityDb,
      strongestAxis: p.strongestAxis,
      halfPower: p.halfPower,
      freeDecay: p.freeDecay,
    })),
    notes: [...read.notes, ...a.notes],
    cautions: [...cautionLines(), ...measurementCautionLines()],
  });
}
