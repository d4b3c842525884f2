import { useState } from 'preact/hooks';
import type { UnitSystem } from '../../forms';
import { pinFieldUnits } from '../../forms/pin-units';
import type { RangeTexts } from '../../forms/ranges';
import type { FieldDef } from '../../forms';
import type { AppModel, ModelState } from '../state/app-model';
import { useServices } from '../state/context';
import { saveOpenCase } from '../cases/open-case';
import { kindOf } from '../../kinds/registry';
import { isUntouchedStart } from '../cases/new-case';
import { demoOf } from './defaults-in-use';
import { storeOnceOpen } from '../state/early-boot';

/** The low and high of each range with their bare numbers' unit pinned (see pin-units.ts). */
function pinRangeUnits(fields: readonly FieldDef[], texts: RangeTexts, system: UnitSystem): RangeTexts {
  const keys = Object.keys(texts);
  const lows = pinFieldUnits(fields, Object.fromEntries(keys.map((k) => [k, texts[k].low])), system);
  const highs = pinFieldUnits(fields, Object.fromEntries(keys.map((k) => [k, texts[k].high])), system);
  return Object.fromEntries(keys.map((k) => [k, { ...texts[k], low: lows[k], high: highs[k] }]));
}

/** Unit system toggle and Save, with what happened in words. */
export function MemberToolbar({ state, model }: { state: ModelState; model: AppModel }) {
  const { store, storeMessage } = useServices();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const doc = state.doc!;
  const setSystem = (to: UnitSystem) => {
    if (to === doc.unitSystem) return;
    // Display units only: what was typed stays as typed; bare numbers get the unit they were typed in.
    model.edit((d) => ({
      ...d,
      unitSystem: to,
      inputs: pinFieldUnits(kindOf(d.kind).form.fields, d.inputs, d.unitSystem),
      excitation: pinFieldUnits(kindOf(d.kind).resonance.fields, d.excitation, d.unitSystem),
      ...(d.ranges ? { ranges: pinRangeUnits(kindOf(d.kind).form.fields, d.ranges, d.unitSystem) } : {}),
    }));
  };
  const save = async () => {
    // Still opening (a first case opened early is on screen before its store): the save waits for it, and is
    // dropped if the store's own first case (work left from before) replaced the one on screen meanwhile.
    const shown = model.get().doc;
    const opened = store ?? (storeMessage === null ? await storeOnceOpen() : null);
    if (model.get().doc !== shown) return;
    if (!opened) {
      setMessage({ ok: false, text: 'Cases cannot be kept on this device (storage is unavailable). Export the case as a file or copy its link instead.' });
      return;
    }
    const r = await saveOpenCase(opened, model);
    setMessage({ ok: r.ok, text: r.text });
  };
  const unsaved = model.unsaved();
  const demo = state.mode === 'editing' ? demoOf(doc, state.saved !== null) : null;
  // A demo or a new case as it was opened holds nothing to lose: not "unsaved changes" until it is edited.
  const untouched = unsaved && state.mode === 'editing' && state.saved === null && isUntouchedStart(doc);
  const words = !unsaved ? 'Saved on this device' : untouched ? (demo ? 'Not changed' : 'Nothing entered yet') : 'Unsaved changes (kept as a draft)';
  return (
    <div class="toolbar">
      <div class="segmented" role="group" aria-label="Units">
        {(['si', 'us'] as const).map((s) => (
          <button key={s} type="button" class="btn" aria-pressed={doc.unitSystem === s} onClick={() => setSystem(s)}>
            {s === 'si' ? 'SI units' : 'US units'}
          </button>
        ))}
      </div>
      <button type="button" class="btn primary" onClick={save} disabled={state.mode !== 'editing'}>
        Save case
      </button>
      {demo && <span class="demo-badge" data-testid="demo-badge" title={`Worked example: ${demo}`}>Demo case</span>}
      <span class="save-state" data-testid="save-state">{words}</span>
      <p class={message?.ok === false ? 'status error' : 'status'} role="status" aria-live="polite">{message?.text ?? ''}</p>
      {state.storageMessage && <p class="status error" role="alert">{state.storageMessage}</p>}
    </div>
  );
}
