import type { Case } from '../../case';
import type { FieldDef } from '../../forms';
import { readCaseRanges } from '../../app/case-ranges';
import type { AppModel } from '../state/app-model';
import { useState } from 'preact/hooks';
import { RangeRow } from './RangeRow';
import { readWithUnitReader, withUnitReader } from './with-units';
import { rangeDefOf, setRangeEnd, toggleRange } from './ranges-edit';

/** The range under one member field, when the kind offers one on it; null otherwise. */
export function MemberRange({ field, doc, model, disabled }: { field: FieldDef; doc: Case; model: AppModel; disabled: boolean }) {
  const [, redraw] = useState(0);
  const def = rangeDefOf(doc, field.key);
  if (!def || field.type !== 'quantity') return null;
  const range = doc.ranges?.[field.key];
  const read = range?.on ? readWithUnitReader(() => readCaseRanges({ ...doc, ranges: { [field.key]: range } }), null, () => redraw((n) => n + 1)) : null;
  const error = read && !read.ok ? read.errors[field.key] : undefined;
  return (
    <RangeRow
      id={`m-${field.key}`}
      label={field.label}
      unit={field.units[doc.unitSystem]}
      range={range}
      source={def.source}
      error={error}
      disabled={disabled}
      onToggle={(on) => withUnitReader(() => model.edit((d) => toggleRange(d, field.key, on)))}
      onInput={(end, text) => model.edit((d) => setRangeEnd(d, field.key, end, text))}
    />
  );
}
