/** What the UI shows inside an empty field. */
import { formatForEntry, type UnitSystem } from '../units';
import { choiceValue, fieldUnit } from './read';
import type { ChoiceField, FieldValues, MemberForm } from './types';

/**
 * Placeholder of a field: for a preset field, the preset value in the field's unit ("210" while carbon steel
 * is chosen); otherwise the field's `emptyMeans` ("6 × outer diameter"), or ''.
 */
export function placeholderOf(form: Pick<MemberForm, 'kind' | 'fields'>, key: string, values: FieldValues, system: UnitSystem): string {
  const field = form.fields.find((f) => f.key === key);
  if (!field) throw new RangeError(`key must be a field of the ${form.kind} form, got ${JSON.stringify(key)}`);
  if (field.type === 'quantity' && field.presetFrom) {
    const source = form.fields.find((f) => f.key === field.presetFrom) as ChoiceField;
    const chosen = source.choices.find((c) => c.value === choiceValue(form.fields, values, source.key));
    const preset = chosen?.presets?.[field.key];
    if (preset !== undefined) return formatForEntry(preset, fieldUnit(field, system));
  }
  return field.emptyMeans ?? '';
}
