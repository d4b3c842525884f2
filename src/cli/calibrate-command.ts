/**
 * `wetmode calibrate FILE`: back-calculates one unknown input of a member model from a measured frequency.
 * Input: { "member": <member model>, "measured": { "frequencyHz", "uncertaintyHz", "mode", "state" },
 * "unknown": { "path", "low", "high" } } in SI. Prints the value, the interval matching the uncertainty and
 * the re-solved frequencies; no fit (or more than one) prints `"ok": false` with the reason. Bad input throws.
 */
import { parseMemberModel } from '../physics/beam';
import { calibrate, type Measurement, type Unknown } from '../physics/uncertain/calibrate';
import { cautionLines } from '../text/cautions';
import { parseJsonText, toJson } from './json-out';

export function runCalibrateCommand(inputText: string): string {
  const raw = parseJsonText(inputText, 'calibration');
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) throw new Error('the calibration file must be a JSON object { "member", "measured", "unknown" }');
  const o = raw as Record<string, unknown>;
  for (const k of Object.keys(o)) if (!['member', 'measured', 'unknown', 'name', 'description', 'note'].includes(k)) throw new Error(`${k} is not a known field (expected member, measured, unknown)`);
  const model = parseMemberModel(o.member);
  const out = calibrate(model, o.measured as Measurement, o.unknown as Unknown);
  const cautions = [
    ...cautionLines(),
    'A calibrated value makes the model reproduce one measurement; it is only as good as the measurement, the mode it was matched to and the rest of the model.',
  ];
  if (!out.ok) return toJson({ ok: false, reason: out.reason, message: out.message, ...('roots' in out ? { roots: out.roots } : {}), ...('reachableHz' in out ? { reachableHz: out.reachableHz } : {}), cautions });
  const r = out.result;
  const measured = o.measured as Measurement;
  const set = measured.state === 'dry' ? r.dry : r.wet!;
  return toJson({
    ok: true,
    units: 'SI: m, kg, s, N, Hz',
    path: out.path,
    value: out.value,
    interval: out.interval,
    intervalClipped: out.intervalClipped,
    frequenciesHz: set.frequenciesHz,
    modelFrequencyHz: out.modelFrequencyHz,
    reachableHz: out.reachableHz,
    dry: { frequenciesHz: r.dry.frequenciesHz },
    wet: r.wet ? { frequenciesHz: r.wet.frequenciesHz } : null,
    wetToDryRatio: r.wetToDryRatio,
    solves: out.solves,
    warnings: r.warnings,
    cautions,
  });
}
