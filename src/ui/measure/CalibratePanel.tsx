/**
 * Back-calculation on the Field check screen: one uncertain input of the kind, a search range in the field's
 * unit, the value that reproduces the measured frequency and the interval matching its uncertainty; then
 * "Use this value" puts it in the case, which re-runs the results.
 */
import { useMemo, useState } from 'preact/hooks';
import { calibrateField, type FieldCalibration } from '../../app/calibrate-case';
import type { Case, CaseMeasurement } from '../../case';
import { fieldUnit } from '../../forms/read';
import { defaultRangeText } from '../../forms/ranges';
import type { QuantityField } from '../../forms/types';
import { kindOf } from '../../kinds/registry';
import { rangesOf } from '../../kinds/ranges-registry';
import { unitFactor } from '../../units';

type Measured = Pick<CaseMeasurement, 'frequencyHz' | 'uncertaintyHz' | 'mode' | 'state' | 'takenAt'>;

const num = (s: string) => Number(s.trim().replace(',', '.'));
const fmt = (x: number) => String(Number(x.toPrecision(4)));

export function CalibratePanel({ doc, measured, onUse }: { doc: Case; measured: Measured; onUse: (c: Extract<FieldCalibration, { ok: true }>, label: string, unit: string) => void }) {
  const form = kindOf(doc.kind).form;
  const choices = useMemo(
    () =>
      rangesOf(doc.kind)
        .map((def) => ({ def, field: form.fields.find((f) => f.key === def.key) }))
        .filter((c): c is { def: (typeof c)['def']; field: QuantityField } => c.field?.type === 'quantity'),
    [doc.kind],
  );
  const [key, setKey] = useState(choices[0]?.def.key ?? '');
  const choice = choices.find((c) => c.def.key === key);
  const unit = choice ? fieldUnit(choice.field, doc.unitSystem) : '';
  const initial = choice ? defaultRangeText(form.fields, choice.def, doc.inputs, doc.unitSystem) : null;
  const [low, setLow] = useState<string | null>(null);
  const [high, setHigh] = useState<string | null>(null);
  const [answer, setAnswer] = useState<FieldCalibration | null>(null);
  if (!choice) return <p class="notice">This kind of member has no uncertain inputs listed for back-calculation yet.</p>;
  const lowText = low ?? initial?.low ?? '';
  const highText = high ?? initial?.high ?? '';

  const run = () => {
    const f = unitFactor(unit);
    const lo = num(lowText.replace(/[^0-9.,eE+-]/g, ''));
    const hi = num(highText.replace(/[^0-9.,eE+-]/g, ''));
    if (!Number.isFinite(lo) || !Number.isFinite(hi) || !(lo < hi)) {
      return setAnswer({ ok: false, reason: 'invalid-input', message: `give the search range of ${choice.field.label} as two numbers in ${unit}, low below high` });
    }
    setAnswer(calibrateField(doc, measured, { key, low: lo * f, high: hi * f }));
  };
  const f = unitFactor(unit);
  return (
    <div class="panel" data-testid="calibrate-panel">
      <h2>Back-calculate one unknown</h2>
      <div class="field-grid">
        <label class="field">
          <span>Unknown input</span>
          <select value={key} onChange={(e) => { setKey((e.currentTarget as HTMLSelectElement).value); setLow(null); setHigh(null); setAnswer(null); }} data-testid="calibrate-unknown">
            {choices.map((c) => <option key={c.def.key} value={c.def.key}>{c.field.label}</option>)}
          </select>
        </label>
        <label class="field">
          <span>Search from, {unit}</span>
          <input type="text" inputMode="decimal" value={lowText} onInput={(e) => setLow((e.currentTarget as HTMLInputElement).value)} data-testid="calibrate-low" />
        </label>
        <label class="field">
          <span>to, {unit}</span>
          <input type="text" inputMode="decimal" value={highText} onInput={(e) => setHigh((e.currentTarget as HTMLInputElement).value)} data-testid="calibrate-high" />
        </label>
      </div>
      <div class="toolbar">
        <button type="button" class="btn" onClick={run} data-testid="calibrate-run">Find the value</button>
      </div>
      {answer && answer.ok && (
        <div data-testid="calibrate-answer">
          <p>
            <strong>{choice.field.label} = {fmt(answer.value / f)} {unit}</strong> reproduces {fmt(measured.frequencyHz)} Hz ({measured.state}, mode {measured.mode});
            values from {answer.clipped.low ? 'the range end ' : ''}{fmt(answer.interval[0] / f)} to {fmt(answer.interval[1] / f)}{answer.clipped.high ? ' (the range end)' : ''} {unit} match
            the ± {fmt(measured.uncertaintyHz)} Hz of the measurement.
          </p>
          <button type="button" class="btn" onClick={() => onUse(answer, choice.field.label, unit)} data-testid="calibrate-use">Use this value</button>
        </div>
      )}
      {answer && !answer.ok && (
        <p class="field-error" role="alert" data-testid="calibrate-refused">
          {answer.reason === 'no-fit' ? `No value in the range fits. ${answer.message}` : answer.reason === 'more-than-one-fits' ? `More than one value fits. ${answer.message}` : answer.message}
        </p>
      )}
    </div>
  );
}
