/** Edits of the open case's ranges (pure: the Member screen applies them through the open-case model). */
import type { Case } from '../../case';
import { applicableRanges, defaultRangeText, type RangeDef } from '../../forms/ranges';
import { kindOf } from '../../kinds/registry';
import { rangesOf } from '../../kinds/ranges-registry';

/** Switches one range on (with the kind's default when none was typed) or off (keeping what was typed). */
export function toggleRange(doc: Case, key: string, on: boolean): Case {
  const form = kindOf(doc.kind).form;
  const had = doc.ranges?.[key];
  const def = rangesOf(doc.kind).find((d) => d.key === key);
  const next = had && (had.low !== '' || had.high !== '') ? { ...had, on } : on ? (def && defaultRangeText(form.fields, def, doc.inputs, doc.unitSystem)) ?? { low: '', high: '', on } : { low: '', high: '', on };
  return { ...doc, ranges: { ...(doc.ranges ?? {}), [key]: { ...next, on } } };
}

export function setRangeEnd(doc: Case, key: string, end: 'low' | 'high', text: string): Case {
  const had = doc.ranges?.[key] ?? { low: '', high: '', on: true };
  return { ...doc, ranges: { ...(doc.ranges ?? {}), [key]: { ...had, [end]: text } } };
}

/** Every applicable range switched on at the kind's defaults (what was typed is replaced). */
export function withDefaultRanges(doc: Case): Case {
  const form = kindOf(doc.kind).form;
  const ranges = { ...(doc.ranges ?? {}) };
  for (const def of applicableRanges(form.fields, rangesOf(doc.kind), doc.inputs)) {
    const t = defaultRangeText(form.fields, def, doc.inputs, doc.unitSystem);
    if (t) ranges[def.key] = t;
  }
  return { ...doc, ranges };
}

/** Every range switched off (what was typed is kept). */
export function allRangesOff(doc: Case): Case {
  return { ...doc, ranges: Object.fromEntries(Object.entries(doc.ranges ?? {}).map(([k, v]) => [k, { ...v, on: false }])) };
}

export function rangeDefOf(doc: Case, key: string): RangeDef | undefined {
  return rangesOf(doc.kind).find((d) => d.key === key);
}
