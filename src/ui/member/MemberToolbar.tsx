import { useState } from 'preact/hooks';
import type { UnitSystem } from '../../forms';
import { convertExcitationValues } from '../../forms/excitation';
import { convertRangeTexts } from '../../forms/ranges';
import type { AppModel, ModelState } from '../state/app-model';
import { useServices } from '../state/context';
import { saveOpenCase } from '../cases/open-case';
import { kindOf } from '../../kinds/registry';
import { isUntouchedStart } from '../cases/new-case';
import { demoOf } from './defaults-in-use';

/** Unit system toggle and Save, with what happened in words. */
export function MemberToolbar({ state, model }: { state: ModelState; model: AppModel }) {
  const { store } = useServices();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const doc = state.doc!;
  const setSystem = (to: UnitSystem) => {
    if (to === doc.unitSystem) return;
    model.edit((d) => ({
      ...d,
      unitSystem: to,
      inputs: kindOf(d.kind).form.convertValues(d.inputs, d.unitSystem, to),
      excitation: convertExcitationValues(kindOf(d.kind).resonance, d.excitation, d.unitSystem, to),
      ...(d.ranges ? { ranges: convertRangeTexts(kindOf(d.kind).form.fields, d.ranges, d.unitSystem, to) } : {}),
    }));
  };
  const save = async () => {
    if (!store) {
      setMessage({ ok: false, text: 'Cases cannot be kept on this device (storage is unavailable). Export the case as a file or copy its link instead.' });
      return;
    }
    const r = await saveOpenCase(store, model);
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
