/**
 * Which uncertain inputs of a case still hold the form's default (the kinds' uncertain fields are those they
 * offer ranges on, src/kinds/<kind>/ranges.ts), with the source of each default range, so the form can mark
 * them and the verdict can say it rests on them. A field counts as a default when its text is missing or is
 * the text a fresh form has in the case's unit system (a demo's values count as entered).
 */
import type { Case } from '../../case';
import { isShown } from '../../forms';
import { DEMO_CASES, kindOf } from '../../kinds/registry';
import { rangesOf } from '../../kinds/ranges-registry';

export interface DefaultInUse {
  key: string;
  label: string;
  /** Where the default range on this input comes from, in words. */
  source: string;
}

export function defaultsInUse(doc: Case): DefaultInUse[] {
  const form = kindOf(doc.kind).form;
  const fresh = form.defaults(doc.unitSystem);
  const out: DefaultInUse[] = [];
  for (const r of rangesOf(doc.kind)) {
    const f = form.fields.find((x) => x.key === r.key);
    if (!f || !isShown(form.fields, f, doc.inputs)) continue;
    const text = doc.inputs[r.key];
    if (text === undefined || text.trim() === (fresh[r.key] ?? f.default).trim()) out.push({ key: r.key, label: f.label, source: r.source });
  }
  return out;
}

/** The inputs list in words, sentence case kept for the first: "Fixity depth, marine growth thickness". */
export function defaultsWords(list: readonly DefaultInUse[]): string {
  return list.map((d, i) => (i === 0 ? d.label : d.label.charAt(0).toLowerCase() + d.label.slice(1))).join(', ');
}

/** The demo a case was opened from (same kind and name), while it is not saved as the user's own case. */
export function demoOf(doc: Case, saved: boolean): string | null {
  if (saved) return null;
  return DEMO_CASES.find((d) => d.kind === doc.kind && d.name === doc.name)?.name ?? null;
}
