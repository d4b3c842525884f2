import type { Case } from '../../case';
import type { AppModel } from '../state/app-model';

/** Name, tag and note of the open case (data, shown as text). */
export function CaseDetails({ doc, model, readOnly }: { doc: Case; model: AppModel; readOnly: boolean }) {
  return (
    <div class="case-details">
      <div class="field">
        <label for="case-name">Case name</label>
        <input id="case-name" type="text" maxLength={200} value={doc.name} readOnly={readOnly} placeholder="e.g. Berth 3, pile P7" onInput={(e) => model.edit((d) => ({ ...d, name: (e.target as HTMLInputElement).value }))} />
      </div>
      <div class="field">
        <label for="case-tag">Site or asset tag</label>
        <input id="case-tag" type="text" maxLength={100} value={doc.tag} readOnly={readOnly} placeholder="e.g. PH-B3-P7" onInput={(e) => model.edit((d) => ({ ...d, tag: (e.target as HTMLInputElement).value }))} />
      </div>
      <div class="field field-wide">
        <label for="case-note">Note</label>
        <textarea id="case-note" rows={2} maxLength={4000} value={doc.note} readOnly={readOnly} onInput={(e) => model.edit((d) => ({ ...d, note: (e.target as HTMLTextAreaElement).value }))} />
      </div>
    </div>
  );
}
