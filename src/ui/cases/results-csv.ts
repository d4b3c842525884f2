/**
 * Rows for "Export results as CSV": the case, its inputs as entered, the natural frequencies and the resonance
 * checks, one table after another, for a spreadsheet. Numbers stay numbers (rounded to 6 significant figures,
 * more than any input justifies); `resultsToCsv` (src/share/csv.ts) writes them and defuses formula-like text.
 */
import type { Case } from '../../case';
import { VERDICT_WORDS } from '../../physics/excitation/verdict';
import type { FieldDef } from '../../forms';
import type { CsvCell } from '../../share/csv';
import { caseFileName } from '../../share/file';
import type { CaseAnswer } from '../../app/solve-case';
import { displayName, kindTitle } from './format';
import { kindOf } from '../../kinds/registry';
import { plateCsvRows } from '../plate/plate-csv';

export type CsvRow = CsvCell[];

/** Six significant figures as a number; null (an empty cell) for anything not finite. */
export function csvNumber(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? Number(x.toPrecision(6)) : null;
}

function inputRows(fields: readonly FieldDef[], values: Record<string, string>, system: Case['unitSystem']): CsvRow[] {
  const rows: CsvRow[] = [];
  const known = new Set(fields.map((f) => f.key));
  for (const f of fields) {
    if (!(f.key in values)) continue;
    const typed = values[f.key];
    if (f.type === 'choice') {
      rows.push([f.label, f.choices.find((c) => c.value === typed)?.label ?? typed, '']);
    } else {
      rows.push([f.label, typed, f.units[system]]);
    }
  }
  // Keys the form does not know (a newer or older case) are still exported, under their own names.
  for (const [k, v] of Object.entries(values)) if (!known.has(k)) rows.push([k, v, '']);
  return rows;
}

/** The CSV rows for a case and the answer the solver gave for it. `exportedAt` is an ISO time. */
export function resultCsvRows(doc: Case, answer: CaseAnswer | null, exportedAt: string): CsvRow[] {
  const rows: CsvRow[] = [
    ['Wetmode results'],
    ['Case', displayName(doc)],
    ['Tag', doc.tag],
    ['Member kind', kindTitle(doc.kind)],
    ['Units', doc.unitSystem === 'si' ? 'SI' : 'US customary'],
    ['Exported', exportedAt],
    [],
    ['Input', 'Value as entered', 'Unit of a bare number'],
    ...inputRows(kindOf(doc.kind).form.fields, doc.inputs, doc.unitSystem),
    ...inputRows(kindOf(doc.kind).resonance.fields, doc.excitation, doc.unitSystem),
    [],
  ];
  if (!answer) {
    rows.push(['No results', 'the case has not been computed']);
    return rows;
  }
  if (!answer.ok) {
    rows.push(['No results', answer.message]);
    return rows;
  }
  if (answer.engine === 'plate') {
    rows.push(...plateCsvRows(answer, csvNumber));
    return rows;
  }
  const { member, screening } = answer;
  rows.push(['Mode', 'Dry frequency (Hz)', 'Dry period (s)', 'Wet frequency (Hz)', 'Wet period (s)', 'Wet/dry ratio']);
  member.dry.frequenciesHz.forEach((fDry, i) => {
    const fWet = member.wet?.frequenciesHz[i];
    rows.push([
      i + 1,
      csvNumber(fDry),
      csvNumber(member.dry.periodsS[i]),
      csvNumber(fWet),
      csvNumber(member.wet?.periodsS[i]),
      csvNumber(member.wetToDryRatio?.[i]),
    ]);
  });
  if (!member.wet) rows.push(['Wet frequencies not computed', member.wetOmittedBecause ?? '']);
  rows.push([]);
  if (screening) {
    rows.push(['Resonance verdict', VERDICT_WORDS[screening.verdict]]);
    if (screening.driver) {
      rows.push(['Governed by', screening.driver.label, 'mode', screening.driver.modeIndex + 1, 'margin (%)', csvNumber(screening.driver.marginPercent)]);
    }
    rows.push(['Mode', 'Excitation', 'Frequency compared', 'Frequency (Hz)', 'Verdict', 'Margin (%)', 'Source']);
    for (const m of screening.modes) {
      for (const c of m.checks) {
        rows.push([m.modeIndex + 1, c.label, c.frequencyBasis, csvNumber(c.frequencyHz), VERDICT_WORDS[c.verdict], csvNumber(c.marginPercent), c.source]);
      }
    }
  } else {
    rows.push(['Resonance screening not run', answer.screeningError ?? 'no resonance inputs']);
  }
  for (const w of member.warnings) rows.push(['Warning', w]);
  return rows;
}

/** "pile-p7.wetmode.json" → "pile-p7-results.csv". */
export function csvFileName(doc: Case): string {
  return caseFileName(doc).replace(/\.wetmode\.json$/, '') + '-results.csv';
}
